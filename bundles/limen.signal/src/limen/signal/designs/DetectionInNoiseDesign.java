package limen.signal.designs;

import limen.core.extension.Settings;
import limen.signal.NoiseSpectrum;
import limen.signal.Sound;
import limen.signal.StimulusDesign;
import limen.signal.TrialSpec;

/**
 * Detection in noise, {@code limen.detection-noise}: as in quiet, over a masker for the whole trial. Settings
 * besides the common ones: maskerSpectrum (WHITE or PINK), maskerLowCutoffHz, maskerHighCutoffHz and
 * [maskerLevelDbSpl] (the standard level when not given). The masker's cos² ramps last max(ramp, 20 ms) and sit
 * in a lead-in of ramp + 0.1 s, so the intervals fall in its steady part.
 */
public final class DetectionInNoiseDesign implements StimulusDesign {

    @Override
    public String id() {
        return "limen.detection-noise";
    }

    @Override
    public String title() {
        return "Detection in noise";
    }

    @Override
    public IntervalSounds design(Settings s, Presentation p) {
        double d = p.intervalSeconds();
        double ramp = s.real("rampDurationSeconds");
        String spectrum = s.text("maskerSpectrum", "WHITE");
        NoiseSpectrum.Shape shape = spectrum.equals("PINK") ? NoiseSpectrum.Shape.PINK : NoiseSpectrum.Shape.FLAT;
        double maskerRamp = Math.max(ramp, 0.02);
        double level = s.real("maskerLevelDbSpl", p.standardLevelDbSpl());
        TrialSpec.Background background = new TrialSpec.Background(new NoiseSpectrum(shape, s.real("maskerLowCutoffHz"),
                s.real("maskerHighCutoffHz"), Double.NaN, Double.NaN), level, maskerRamp);
        return new IntervalSounds(new Sound.Silence(d), new Sound.Tone(s.real("standardFrequencyHz"), p.value(), d, ramp),
                background, maskerRamp + 0.1);
    }
}
