package limen.audio;

import java.util.SplittableRandom;

import limen.signal.Calibration;
import limen.signal.CheckedStimulus;
import limen.signal.Ear;
import limen.signal.SafetyGuard;
import limen.signal.Sound;
import limen.signal.StimulusRenderer;

/** Checked test trials of the invented Harbourside Auditory Lab's bench calibration. */
final class Trials {

    static final Calibration BENCH = Calibration.flat("Harbourside bench (flat)", 100, 90, 48000);

    private Trials() {
    }

    /** A tone of {@code seconds} (10 ms ramps) at {@code levelDbSpl}, to both ears, no lead or trail. */
    static CheckedStimulus tone(double frequencyHz, double levelDbSpl, double seconds, long seed) {
        return new SafetyGuard(BENCH).check(new StimulusRenderer(BENCH).render(
                new Sound.Tone(frequencyHz, levelDbSpl, seconds, 0.01), Ear.BOTH, 0, 0, new SplittableRandom(seed)));
    }

    /** A tone on the left only, with 50 ms of silence before and after. */
    static CheckedStimulus leftTone(double frequencyHz, double levelDbSpl, double seconds) {
        return new SafetyGuard(BENCH).check(new StimulusRenderer(BENCH).render(
                new Sound.Tone(frequencyHz, levelDbSpl, seconds, 0.01), Ear.LEFT, 0.05, 0.05, new SplittableRandom(5)));
    }
}
