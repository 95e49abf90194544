package limen.signal.designs;

import limen.core.extension.Settings;
import limen.signal.Sound;
import limen.signal.StimulusDesign;

/**
 * Frequency discrimination, {@code limen.frequency-discrimination}: standard tone f0, target f0 + Δf, both at
 * the standard level; Δf from the value v and its unit (HZ: f0 + v; PERCENT: f0 (1 + v/100); CENTS:
 * f0 · 2^(v/1200), 1200 cents to the octave).
 */
public final class FrequencyDiscriminationDesign implements StimulusDesign {

    @Override
    public String id() {
        return "limen.frequency-discrimination";
    }

    @Override
    public String title() {
        return "Frequency discrimination";
    }

    @Override
    public IntervalSounds design(Settings s, Presentation p) {
        double f0 = s.real("standardFrequencyHz");
        double ramp = s.real("rampDurationSeconds");
        double d = p.intervalSeconds();
        return new IntervalSounds(new Sound.Tone(f0, p.standardLevelDbSpl(), d, ramp),
                new Sound.Tone(comparisonFrequency(f0, s.text("unit"), p.value()), p.standardLevelDbSpl(), d, ramp), null, 0);
    }

    /**
     * @param unit HZ, PERCENT or CENTS
     * @return the comparison frequency at value {@code v}, Hz
     */
    public static double comparisonFrequency(double f0, String unit, double v) {
        return switch (unit) {
            case "HZ" -> f0 + v;
            case "PERCENT" -> f0 * (1 + v / 100.0);
            case "CENTS" -> f0 * Math.pow(2, v / 1200.0);
            default -> throw new IllegalArgumentException("frequency discrimination varies Hz, percent or cents, not " + unit);
        };
    }
}
