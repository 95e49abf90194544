package limen.signal.designs;

import limen.core.extension.Settings;
import limen.signal.Sound;
import limen.signal.StimulusDesign;

/** Intensity discrimination, {@code limen.intensity-discrimination}: standard tone at L, target at L + v dB. */
public final class IntensityDiscriminationDesign implements StimulusDesign {

    @Override
    public String id() {
        return "limen.intensity-discrimination";
    }

    @Override
    public String title() {
        return "Intensity discrimination";
    }

    @Override
    public IntervalSounds design(Settings s, Presentation p) {
        double f0 = s.real("standardFrequencyHz");
        double ramp = s.real("rampDurationSeconds");
        double d = p.intervalSeconds();
        return new IntervalSounds(new Sound.Tone(f0, p.standardLevelDbSpl(), d, ramp),
                new Sound.Tone(f0, p.standardLevelDbSpl() + p.value(), d, ramp), null, 0);
    }
}
