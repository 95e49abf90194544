package limen.procedure;

import java.util.List;
import java.util.Objects;
import java.util.random.RandomGenerator;

/**
 * Random interleaving of the tracks of one step: each trial comes from a track drawn uniformly
 * among the unfinished ones (seeded), so listeners cannot follow any one track. Deterministic
 * given the generator and the answers. Not thread-safe.
 */
public final class Interleaver {

    private final List<AdaptiveTrack> tracks;
    private final RandomGenerator rng;
    private int pending = -1;

    public Interleaver(List<AdaptiveTrack> tracks, RandomGenerator rng) {
        if (tracks.isEmpty()) {
            throw new IllegalArgumentException("an interleaver needs at least one track");
        }
        this.tracks = List.copyOf(tracks);
        this.rng = Objects.requireNonNull(rng, "rng");
    }

    public List<AdaptiveTrack> tracks() {
        return tracks;
    }

    /** @return true when every track is finished */
    public boolean finished() {
        for (AdaptiveTrack t : tracks) {
            if (!t.finished()) {
                return false;
            }
        }
        return true;
    }

    /**
     * @return the index of the track that gives the next trial; the same until that trial is answered
     * @throws IllegalStateException when all tracks are finished
     */
    public int nextTrack() {
        if (pending < 0) {
            int open = 0;
            for (AdaptiveTrack t : tracks) {
                if (!t.finished()) {
                    open++;
                }
            }
            if (open == 0) {
                throw new IllegalStateException("all " + tracks.size() + " tracks are finished");
            }
            int pick = open == 1 ? 0 : rng.nextInt(open);
            for (int i = 0; i < tracks.size(); i++) {
                if (!tracks.get(i).finished() && pick-- == 0) {
                    pending = i;
                    break;
                }
            }
        }
        return pending;
    }

    /** @return the plan of the next trial of {@link #nextTrack()} */
    public TrialPlan nextTrial() {
        return tracks.get(nextTrack()).nextTrial();
    }

    /** Answers the pending trial of the chosen track. */
    public TrialOutcome answer(Answer answer) {
        int i = nextTrack();
        TrialOutcome o = tracks.get(i).answer(answer);
        pending = -1;
        return o;
    }
}
