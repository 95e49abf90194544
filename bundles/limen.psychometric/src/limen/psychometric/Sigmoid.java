package limen.psychometric;

/**
 * A two-parameter sigmoid F(x; location, spread) rising from 0 to 1: the core of a psychometric
 * function ψ(x) = γ + (1 − γ − λ) F(x) (see {@link PsychometricFunction}).
 * <p>
 * Implementations are stateless and thread-safe. The meaning of the two parameters is family
 * specific and is named by {@link #locationName()} and {@link #spreadName()}; the built-in
 * families, with their exact forms, are the constants of {@link Sigmoids}.
 * <p>
 * Every method throws {@link IllegalArgumentException} for parameters outside the family's domain
 * (for example a non-positive spread), with the offending value in the message.
 */
public interface Sigmoid {

    /** @return the family name used in specs and CSV files, e.g. {@code "logistic"} */
    String name();

    /** @return the name of the location parameter in specs, e.g. {@code "mid"} or {@code "alpha"} */
    String locationName();

    /** @return the name of the spread parameter in specs, e.g. {@code "scale"}, {@code "sd"}, {@code "beta"} */
    String spreadName();

    /**
     * @param x        the stimulus value, in the unit of the varied quantity
     * @param location the location parameter
     * @param spread   the spread (or, for the Weibull, shape) parameter
     * @return F(x), in [0, 1]
     */
    double value(double x, double location, double spread);

    /**
     * @return 1 − F(x), computed without cancellation where F is close to 1 (the default subtracts; the
     *         built-in families override it)
     */
    default double complementValue(double x, double location, double spread) {
        return 1.0 - value(x, location, spread);
    }

    /**
     * @return dF/dx at x, non-negative
     */
    double derivative(double x, double location, double spread);

    /**
     * @return d²F/dx² at x (the built-in families give it in closed form; the default is a central
     *         difference of {@link #derivative}, step 1e-5 of max(|x|, spread))
     */
    default double secondDerivative(double x, double location, double spread) {
        double h = 1e-5 * Math.max(Math.abs(x), spread);
        return (derivative(x + h, location, spread) - derivative(x - h, location, spread)) / (2 * h);
    }

    /**
     * All four of F, 1 − F, dF/dx and d²F/dx² at once, for fitters that need them together (the built-in
     * families share their exponentials between them; the default calls the single methods).
     *
     * @param out filled with {F, 1 − F, F', F''} (length &ge; 4)
     */
    default void evaluate(double x, double location, double spread, double[] out) {
        out[0] = value(x, location, spread);
        out[1] = complementValue(x, location, spread);
        out[2] = derivative(x, location, spread);
        out[3] = secondDerivative(x, location, spread);
    }

    /**
     * @param p a proportion with 0 &lt; p &lt; 1
     * @return x with F(x) = p
     * @throws IllegalArgumentException unless 0 &lt; p &lt; 1
     */
    double inverse(double p, double location, double spread);

    /**
     * @return true when F is defined only for x &gt; 0 and is 0 for x &le; 0 (the Weibull); a
     *         fitter must then reject non-positive stimulus values or treat them as F = 0
     */
    boolean positiveDomainOnly();

    /**
     * Checks that (location, spread) lie in this family's parameter domain.
     *
     * @throws IllegalArgumentException naming the bad parameter and its value
     */
    default void checkParameters(double location, double spread) {
        if (!Double.isFinite(location)) {
            throw new IllegalArgumentException(name() + ": " + locationName() + " must be finite, was " + location);
        }
        if (!(spread > 0) || !Double.isFinite(spread)) {
            throw new IllegalArgumentException(name() + ": " + spreadName() + " must be finite and > 0, was " + spread);
        }
    }
}
