package limen.procedure;

/**
 * Which summary of a posterior a Bayesian procedure uses to place the next stimulus or to report
 * its estimate.
 */
public enum Placement {
    /** the posterior mode (QUEST, Watson &amp; Pelli 1983) */
    MODE,
    /** the posterior mean (ZEST-style, King-Smith et al. 1994, Vision Research 34(7), 885-912) */
    MEAN
}
