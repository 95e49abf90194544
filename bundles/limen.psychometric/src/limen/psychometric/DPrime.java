package limen.psychometric;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Sensitivity d' and proportion correct Pc in unbiased m-alternative forced choice, for the
 * equal-variance Gaussian observer who picks the interval with the largest observation
 * (Green &amp; Swets 1966, Signal Detection Theory and Psychophysics, ch. 2 and 4):
 * <pre>
 *   Pc(d', m) = ∫ φ(x − d') Φ(x)^(m−1) dx  =  ∫ φ(t) Φ(t + d')^(m−1) dt
 * </pre>
 * with φ and Φ the standard normal density and distribution. For m = 2 this reduces to
 * Pc = Φ(d'/√2). Tables of this function: Hacker &amp; Ratcliff (1979), Perception &amp;
 * Psychophysics 26(2), 168-170; Macmillan &amp; Creelman (2005), Detection Theory: A User's Guide.
 * <p>
 * The integral is evaluated numerically (iterative Gauss-Legendre on t ∈ [−12, 12], where φ
 * outside is below 1e-31) for every m, to an absolute accuracy of about 1e-13; d' is limited to
 * [−{@value #MAX_ABS_DPRIME}, {@value #MAX_ABS_DPRIME}].
 */
public final class DPrime {

    /** Largest |d'| handled; Pc(10, 2) = Φ(7.07) differs from 1 by less than 1e-12. */
    public static final double MAX_ABS_DPRIME = 10.0;

    private static final double T_LIMIT = 12.0;
    private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2.0 * Math.PI);

    private DPrime() {
    }

    /**
     * @param dPrime       sensitivity d', |d'| &le; {@value #MAX_ABS_DPRIME}
     * @param alternatives m &ge; 2, the number of intervals or alternatives
     * @return Pc(d', m); Pc(0, m) = 1/m
     * @throws IllegalArgumentException for m &lt; 2 or d' out of range
     */
    public static double proportionCorrect(double dPrime, int alternatives) {
        checkAlternatives(alternatives);
        if (!(Math.abs(dPrime) <= MAX_ABS_DPRIME)) {
            throw new IllegalArgumentException("d' must be within +-" + MAX_ABS_DPRIME + ", was " + dPrime);
        }
        final int power = alternatives - 1;
        UnivariateFunction integrand = t -> INV_SQRT_2PI * Math.exp(-0.5 * t * t)
                * Math.pow(NormalSigmoid.phi(t + dPrime), power);
        IterativeLegendreGaussIntegrator integrator = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15, 3, 64);
        // Split at the peak region so that the iteration starts with well-placed nodes.
        double a = integrator.integrate(Integer.MAX_VALUE, integrand, -T_LIMIT, 0.0);
        integrator = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15, 3, 64);
        double b = integrator.integrate(Integer.MAX_VALUE, integrand, 0.0, T_LIMIT);
        return Math.min(1.0, Math.max(0.0, a + b));
    }

    /**
     * Inverse of {@link #proportionCorrect}: d' with Pc(d', m) = pc, found by Brent's method.
     *
     * @param proportionCorrect pc with Pc(−10, m) &lt; pc &lt; Pc(10, m); pc &lt; 1/m gives a negative d'
     * @param alternatives      m &ge; 2
     * @return d', accurate to about 1e-10
     * @throws IllegalArgumentException for m &lt; 2 or pc outside the attainable range
     */
    public static double dPrime(double proportionCorrect, int alternatives) {
        checkAlternatives(alternatives);
        double lo = proportionCorrect(-MAX_ABS_DPRIME, alternatives);
        double hi = proportionCorrect(MAX_ABS_DPRIME, alternatives);
        if (!(proportionCorrect > lo && proportionCorrect < hi)) {
            throw new IllegalArgumentException("proportion correct " + proportionCorrect + " is outside the range ("
                    + lo + ", " + hi + ") covered for " + alternatives + " alternatives (|d'| <= " + MAX_ABS_DPRIME + ")");
        }
        if (proportionCorrect == 1.0 / alternatives) {
            return 0.0;
        }
        BrentSolver solver = new BrentSolver(1e-15, 1e-12, 1e-15);
        return solver.solve(200, d -> proportionCorrect(d, alternatives) - proportionCorrect,
                -MAX_ABS_DPRIME, MAX_ABS_DPRIME, 0.0);
    }

    private static void checkAlternatives(int alternatives) {
        if (alternatives < 2) {
            throw new IllegalArgumentException("forced choice needs at least 2 alternatives, was " + alternatives);
        }
    }
}
