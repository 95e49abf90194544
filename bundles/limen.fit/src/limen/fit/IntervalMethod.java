package limen.fit;

/** How a bootstrap confidence interval is read from the replicate distribution. */
public enum IntervalMethod {
    /** The α/2 and 1 − α/2 quantiles of the replicates (Efron &amp; Tibshirani 1993, ch. 13). */
    PERCENTILE,
    /**
     * Bias-corrected and accelerated quantiles (Efron 1987, JASA 82(397), 171-185; Efron &amp; Tibshirani 1993,
     * ch. 14), as recommended for psychometric functions by Wichmann &amp; Hill (2001b).
     */
    BCA
}
