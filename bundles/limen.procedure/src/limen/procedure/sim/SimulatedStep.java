package limen.procedure.sim;

import java.util.List;
import java.util.Objects;

/**
 * One step of a battery to simulate: its tracks, randomly interleaved trial by trial.
 *
 * @param name   the step's name
 * @param tracks one or more tracks
 */
public record SimulatedStep(String name, List<SimulatedTrack> tracks) {

    public SimulatedStep {
        Objects.requireNonNull(name, "name");
        tracks = List.copyOf(tracks);
        if (tracks.isEmpty()) {
            throw new IllegalArgumentException("step " + name + " has no tracks");
        }
    }
}
