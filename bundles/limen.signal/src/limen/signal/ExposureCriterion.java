package limen.signal;

/**
 * A noise-exposure rule: criterion level {@code Lc} for {@code Tc} hours with exchange rate {@code q}, so the
 * allowed time at level {@code L} is {@code T(L) = Tc / 2^((L - Lc)/q)} and the dose of exposures
 * {@code C_i} hours at {@code L_i} is {@code D = 100·Σ C_i/T(L_i)} percent (OSHA 29 CFR 1910.95(b) and
 * Appendix A; NIOSH 1998, DHHS (NIOSH) Publication 98-126, chapter 1). The time-weighted average equivalent to
 * a dose is {@code TWA = Lc + q·log2(D/100)} (for OSHA {@code 16.61·log10(D/100) + 90}, Appendix A).
 * <p>
 * Levels are in dB(A). Levels below {@code thresholdLevelDbA} add nothing to the dose.
 *
 * @param name e.g. {@code NIOSH 1998 REL}
 * @param criterionLevelDbA {@code Lc}
 * @param exchangeRateDb {@code q > 0}
 * @param criterionHours {@code Tc > 0}
 * @param thresholdLevelDbA levels below it are not counted ({@code -Infinity} to count all)
 */
public record ExposureCriterion(String name, double criterionLevelDbA, double exchangeRateDb, double criterionHours,
        double thresholdLevelDbA) {

    /** NIOSH 1998 recommended exposure limit: 85 dBA for 8 h, 3-dB exchange rate, all levels counted. */
    public static final ExposureCriterion NIOSH_1998 =
            new ExposureCriterion("NIOSH 1998 REL", 85, 3, 8, Double.NEGATIVE_INFINITY);

    /**
     * OSHA 29 CFR 1910.95 permissible exposure limit: 90 dBA for 8 h, 5-dB exchange rate; levels below 80 dBA
     * not counted (Appendix A integrates 80 to 130 dB; from memory).
     */
    public static final ExposureCriterion OSHA_1910_95 = new ExposureCriterion("OSHA 29 CFR 1910.95 PEL", 90, 5, 8, 80);

    /** Validates the values. */
    public ExposureCriterion {
        if (name == null || !Double.isFinite(criterionLevelDbA) || !(exchangeRateDb > 0) || !(criterionHours > 0)
                || Double.isNaN(thresholdLevelDbA)) {
            throw new IllegalArgumentException("bad exposure criterion " + name + ": " + criterionLevelDbA + " dBA, q "
                    + exchangeRateDb + " dB, " + criterionHours + " h, threshold " + thresholdLevelDbA);
        }
    }

    /** {@code T(L) = Tc / 2^((L - Lc)/q)} hours; infinite below the threshold. */
    public double allowedHours(double levelDbA) {
        if (levelDbA < thresholdLevelDbA) {
            return Double.POSITIVE_INFINITY;
        }
        return criterionHours / Math.pow(2, (levelDbA - criterionLevelDbA) / exchangeRateDb);
    }

    /** Dose in percent of {@code hours} at {@code levelDbA}: {@code 100·C/T(L)}. */
    public double dosePercent(double levelDbA, double hours) {
        if (!(hours >= 0)) {
            throw new IllegalArgumentException("hours must be >= 0: " + hours);
        }
        double t = allowedHours(levelDbA);
        return Double.isInfinite(t) ? 0 : 100 * hours / t;
    }

    /** The 8-hour time-weighted average equivalent to a dose: {@code Lc + q·log2(D/100)} dB(A). */
    public double twaDbA(double dosePercent) {
        return criterionLevelDbA + exchangeRateDb * Math.log(dosePercent / 100) / Math.log(2);
    }
}
