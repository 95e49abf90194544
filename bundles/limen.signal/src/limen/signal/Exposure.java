package limen.signal;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Sound exposure of a trial or a session, per ear, for the session log and the cautions.
 * <p>
 * From the checked stimulus's declared components, each A-weighted per IEC 61672-1 ({@link AWeighting}; a
 * noise's A-weighted level is its power-weighted over its bins through the calibration):
 * <ul>
 * <li>the A-weighted sound exposure {@code E = Σ 10^(L_A/10)·t_e} (in units of (20 µPa)²·s), {@code t_e} the
 *     component's energy duration (ramps count for the energy they carry), so the equivalent continuous level
 *     over {@code T} seconds is {@code L_Aeq,T = 10·log10(E/T)};</li>
 * <li>the time at each combined level: between consecutive component boundaries the components sounding add in
 *     power, and that level is held for the whole stretch (ramps counted as steady: errs loud), for the dose of
 *     any {@link ExposureCriterion}.</li>
 * </ul>
 * Immutable; {@link #plus} adds a trial to a session. The estimate covers only what Limen itself presents.
 */
public final class Exposure {

    private final double durationSeconds;
    private final double[] soundExposure;
    private final List<Map<Double, Double>> secondsAtLevel;

    private Exposure(double durationSeconds, double[] soundExposure, List<Map<Double, Double>> secondsAtLevel) {
        this.durationSeconds = durationSeconds;
        this.soundExposure = soundExposure;
        this.secondsAtLevel = secondsAtLevel;
    }

    /** No exposure (an empty session). */
    public static Exposure none() {
        return new Exposure(0, new double[2], List.of(Map.of(), Map.of()));
    }

    /** The exposure of one checked stimulus (a trial). */
    public static Exposure of(CheckedStimulus stimulus) {
        double fs = stimulus.sampleRateHz();
        double[] energy = new double[2];
        List<Map<Double, Double>> levels = new ArrayList<>();
        for (int ear = 0; ear < 2; ear++) {
            List<Component> in = new ArrayList<>();
            for (Component c : stimulus.components()) {
                if (c.ear().drives(ear)) {
                    in.add(c);
                    energy[ear] += Math.pow(10, c.aWeightedLevelDb() / 10) * c.energySeconds();
                }
            }
            TreeMap<Integer, Integer> edges = new TreeMap<>();
            for (Component c : in) {
                edges.put(c.startSample(), 0);
                edges.put(c.endSample(), 0);
            }
            Map<Double, Double> atLevel = new TreeMap<>();
            Integer from = edges.isEmpty() ? null : edges.firstKey();
            while (from != null) {
                Integer to = edges.higherKey(from);
                if (to == null) {
                    break;
                }
                double power = 0;
                for (Component c : in) {
                    if (c.activeAt(from)) {
                        power += Math.pow(10, c.aWeightedLevelDb() / 10);
                    }
                }
                if (power > 0) {
                    atLevel.merge(10 * Math.log10(power), (to - from) / fs, Double::sum);
                }
                from = to;
            }
            levels.add(Collections.unmodifiableMap(atLevel));
        }
        return new Exposure(stimulus.durationSeconds(), energy, List.copyOf(levels));
    }

    /** This exposure followed by another (trials of a session). */
    public Exposure plus(Exposure other) {
        double[] e = {soundExposure[0] + other.soundExposure[0], soundExposure[1] + other.soundExposure[1]};
        List<Map<Double, Double>> levels = new ArrayList<>();
        for (int ear = 0; ear < 2; ear++) {
            Map<Double, Double> m = new TreeMap<>(secondsAtLevel.get(ear));
            other.secondsAtLevel.get(ear).forEach((l, s) -> m.merge(l, s, Double::sum));
            levels.add(Collections.unmodifiableMap(m));
        }
        return new Exposure(durationSeconds + other.durationSeconds, e, List.copyOf(levels));
    }

    /** Total duration of the buffers counted, seconds. */
    public double durationSeconds() {
        return durationSeconds;
    }

    /** A-weighted sound exposure of one ear (0 left, 1 right), (20 µPa)²·s. */
    public double soundExposure(int ear) {
        return soundExposure[ear];
    }

    /** {@code L_Aeq} over the counted duration, dB(A); {@code -Infinity} for silence. */
    public double leqDbA(int ear) {
        return leqDbA(ear, durationSeconds);
    }

    /** {@code L_Aeq,T = 10·log10(E/T)} over {@code overSeconds} (e.g. the session's wall-clock length), dB(A). */
    public double leqDbA(int ear, double overSeconds) {
        if (!(overSeconds > 0)) {
            throw new IllegalArgumentException("averaging time must be > 0: " + overSeconds + " s");
        }
        return 10 * Math.log10(soundExposure[ear] / overSeconds);
    }

    /** Seconds spent at each combined A-weighted level, dB(A) to seconds (unmodifiable). */
    public Map<Double, Double> secondsAtLevel(int ear) {
        return secondsAtLevel.get(ear);
    }

    /** The dose of one ear under a criterion, percent: {@code 100·Σ C_i/T(L_i)}. */
    public double dosePercent(ExposureCriterion criterion, int ear) {
        double d = 0;
        for (Map.Entry<Double, Double> e : secondsAtLevel.get(ear).entrySet()) {
            d += criterion.dosePercent(e.getKey(), e.getValue() / 3600.0);
        }
        return d;
    }

    /** The larger of the two ears' doses, percent. */
    public double worstEarDosePercent(ExposureCriterion criterion) {
        return Math.max(dosePercent(criterion, 0), dosePercent(criterion, 1));
    }
}
