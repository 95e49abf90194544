package limen.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/** nAFC trials in one buffer: layout, interval marks against detected onsets, target placement, masker, ears. */
class TrialRenderingTest {

    private final Calibration cal = Calibration.flat("bench", 100, 48000);
    private final StimulusRenderer renderer = new StimulusRenderer(cal);

    @Test
    void intervalMarksMatchTheSoundAndTheLayout() {
        for (int target = 0; target < 4; target++) {
            TrialSpec spec = new TrialSpec(4, target, new Sound.Tone(1000, 60, 0.25, 0.01),
                    new Sound.Tone(1100, 60, 0.25, 0.01), 0.1, 0.3, 0.2, Ear.BOTH, null);
            Stimulus s = renderer.renderTrial(spec, new SplittableRandom(1));
            // 0.1 + 4·0.25 + 3·0.3 + 0.2 = 2.2 s
            assertEquals(Math.round(2.2 * 48000), s.length());
            List<IntervalMark> marks = s.intervals();
            assertEquals(4, marks.size());
            for (int i = 0; i < 4; i++) {
                IntervalMark m = marks.get(i);
                assertEquals(4800 + i * (12000 + 14400), m.onsetSample());
                assertEquals(m.onsetSample() + 12000, m.offsetSample());
                assertEquals(i == target, m.target());
            }
            // onsets detected in the samples: the first sample of each interval is 0 (cos² ramp), so the detected
            // sound starts one sample later and ends one sample before the offset
            List<Onsets.Span> spans = Onsets.segments(s.channel(0), -200, 100);
            assertEquals(4, spans.size());
            for (int i = 0; i < 4; i++) {
                assertEquals(marks.get(i).onsetSample() + 1, spans.get(i).onsetSample());
                assertEquals(marks.get(i).offsetSample() - 1, spans.get(i).offsetSample());
            }
            // the target interval holds the 1100 Hz tone
            IntervalMark t = marks.get(target);
            double[] seg = java.util.Arrays.copyOfRange(s.channel(1), t.onsetSample(), t.offsetSample());
            assertEquals(1100, Spectrum.of(seg, 48000).dominantFrequencyHz(), 0.01);
        }
    }

    @Test
    void detectionInNoise() {
        // 2AFC: tone in interval 1, silence standard; background noise across the trial
        TrialSpec spec = new TrialSpec(2, 1, new Sound.Silence(0.3), new Sound.Tone(2000, 55, 0.3, 0.01), 0.2, 0.4, 0.3,
                Ear.LEFT, new TrialSpec.Background(NoiseSpectrum.band(1000, 4000), 50, 0.05));
        Stimulus s = renderer.renderTrial(spec, new SplittableRandom(2));
        double[] left = s.channel(0);
        IntervalMark last = s.intervals().get(1);
        int maskerEnd = last.offsetSample() + 9600;
        assertEquals(maskerEnd + 14400, s.length());
        // masker from sample 0 to 0.2 s after the last interval, then silence
        List<Onsets.Span> spans = Onsets.segments(left, -200, 100);
        assertEquals(1, spans.size());
        assertEquals(maskerEnd - 1, spans.get(0).offsetSample());
        for (int n = maskerEnd; n < s.length(); n++) {
            assertEquals(0.0, left[n], 0);
        }
        assertEquals(0.0, Levels.rms(s.channel(1)), 0); // left ear only
        // components: the masker and one tone
        assertEquals(2, s.components().size());
        // the steady masker level between the intervals: 50 dB SPL = -50 dBFS (flat calibration)
        int gapFrom = s.intervals().get(0).offsetSample();
        int gapTo = s.intervals().get(1).onsetSample();
        assertEquals(-50.0, Levels.rmsDbfs(left, gapFrom, gapTo), 1.0);
        new SafetyGuard(cal).check(s);
    }

    @Test
    void toneSequencesAndEars() {
        Sound pair = Sound.Sequence.pair(new Sound.Tone(500, 60, 0.1, 0.01), new Sound.Tone(600, 60, 0.1, 0.01), 0.05);
        Stimulus s = renderer.render(pair, Ear.RIGHT, 0, 0, new SplittableRandom(1));
        assertEquals(12000, s.length());
        assertEquals(0.0, Levels.rms(s.channel(0)), 0);
        List<Onsets.Span> spans = Onsets.segments(s.channel(1), -200, 50);
        assertEquals(2, spans.size());
        assertEquals(4800 + 2400 + 1, spans.get(1).onsetSample());
        Stimulus both = renderer.render(pair, Ear.BOTH, 0, 0, new SplittableRandom(1));
        assertArrayEquals(both.channel(0), both.channel(1));
        assertArrayEquals(s.channel(1), both.channel(1));
    }

    @Test
    void seededTrialsReplayAndValidation() {
        TrialSpec spec = new TrialSpec(3, 2, new Sound.NoiseBurst(NoiseSpectrum.band(500, 1000), 50, 0.2, 0.01),
                new Sound.NoiseBurst(NoiseSpectrum.band(500, 1000), 55, 0.2, 0.01), 0.05, 0.2, 0.05, Ear.BOTH, null);
        assertArrayEquals(renderer.renderTrial(spec, new SplittableRandom(9)).channel(0),
                renderer.renderTrial(spec, new SplittableRandom(9)).channel(0));
        assertThrows(IllegalArgumentException.class, () -> spec.withTargetInterval(3));
        assertThrows(IllegalArgumentException.class, () -> new TrialSpec(2, 0, new Sound.Silence(0.1),
                new Sound.Silence(0.1), 0.01, 0.1, 0, Ear.BOTH,
                new TrialSpec.Background(NoiseSpectrum.band(500, 1000), 40, 0.05)));
        Calibration narrow = new Calibration("narrow", -20, new double[] {250, 4000}, new double[] {70, 70}, 90, 48000);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new StimulusRenderer(narrow).render(new Sound.Tone(8000, 60, 0.1, 0.01), Ear.BOTH, 0, 0,
                        new SplittableRandom(1)));
        assertTrue(e.getMessage().contains("outside the calibrated range"), e.getMessage());
    }
}
