package limen.procedure.sim;

import limen.procedure.Target;

/**
 * Summary of one track over all runs.
 * <p>
 * Bias = mean estimate − true value, the true value being the listener's x at the procedure's
 * target (e.g. ψ = 0.7071 for 2-down/1-up). Efficiency follows the sweat factor of Taylor &amp;
 * Creelman (1967, JASA 41, 782-787): K = σ²·N with σ² the variance of the estimates and N the mean
 * number of trials; the ideal K_ideal = p(1 − p)/ψ'(x)², the variance times trials of an estimate
 * of x from N binomial trials placed at the true value x (Fisher information N ψ'(x)²/(p(1 − p))),
 * p = ψ(x); efficiency = K_ideal / K.
 *
 * @param step          step name
 * @param track         track name
 * @param target        the procedure's target
 * @param runs          runs summarised (those with an estimate)
 * @param missing       runs without an estimate
 * @param capped        runs that hit the trial cap
 * @param trueValue     the listener's x at the target
 * @param meanEstimate  mean of the estimates
 * @param bias          meanEstimate − trueValue
 * @param sd            sample SD of the estimates
 * @param meanTrials    mean trials per run
 * @param sweatFactor   K = sd²·meanTrials
 * @param idealSweat    K_ideal
 * @param efficiency    K_ideal / K
 */
public record TrackSummary(String step, String track, Target target, int runs, int missing, int capped, double trueValue,
        double meanEstimate, double bias, double sd, double meanTrials, double sweatFactor, double idealSweat,
        double efficiency) {
}
