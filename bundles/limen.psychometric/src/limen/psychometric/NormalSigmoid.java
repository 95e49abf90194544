package limen.psychometric;

import org.apache.commons.math3.special.Erf;

/**
 * F(x) = Φ((x − M)/S) = erfc(−(x − M)/(S√2)) / 2; see {@link Sigmoids#NORMAL}. Uses Commons Math's
 * {@link Erf} (erfc through the regularised incomplete gamma function, so the lower tail keeps
 * its relative accuracy; the inverse through Giles' erfInv approximation).
 * <p>
 * Public with a public no-argument constructor only so that ServiceLoader and Declarative Services can
 * contribute it like any lab's family (see {@link Sigmoids#byName}); code uses the constant.
 */
public final class NormalSigmoid implements Sigmoid {

    private static final double SQRT2 = Math.sqrt(2.0);
    private static final double INV_SQRT_2PI = 1.0 / Math.sqrt(2.0 * Math.PI);

    @Override
    public String name() {
        return "normal";
    }

    @Override
    public String locationName() {
        return "mid";
    }

    @Override
    public String spreadName() {
        return "sd";
    }

    @Override
    public double value(double x, double location, double spread) {
        checkParameters(location, spread);
        return phi((x - location) / spread);
    }

    @Override
    public double complementValue(double x, double location, double spread) {
        checkParameters(location, spread);
        return phi(-(x - location) / spread); // 1 − Φ(z) = Φ(−z)
    }

    @Override
    public double derivative(double x, double location, double spread) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        return INV_SQRT_2PI * Math.exp(-0.5 * z * z) / spread;
    }

    /** F'' = −z φ(z)/S², z = (x − M)/S. */
    @Override
    public double secondDerivative(double x, double location, double spread) {
        double z = (x - location) / spread;
        return -z * derivative(x, location, spread) / spread;
    }

    @Override
    public void evaluate(double x, double location, double spread, double[] out) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        // one erfc, on the side where it keeps relative accuracy; the other side by subtraction from 1
        if (z < 0) {
            out[0] = phi(z);
            out[1] = 1 - out[0];
        } else {
            out[1] = phi(-z);
            out[0] = 1 - out[1];
        }
        out[2] = INV_SQRT_2PI * Math.exp(-0.5 * z * z) / spread;
        out[3] = -z * out[2] / spread;
    }

    @Override
    public double inverse(double p, double location, double spread) {
        checkParameters(location, spread);
        Sigmoids.checkProportion(this, p);
        return location + spread * phiInverse(p);
    }

    @Override
    public boolean positiveDomainOnly() {
        return false;
    }

    /** Standard normal cumulative distribution Φ(z). */
    static double phi(double z) {
        if (z < -38.5) {
            return 0.0; // below the smallest positive double
        }
        if (z > 8.5) {
            return 1.0; // 1 − Φ(8.5) < 2^-53
        }
        return 0.5 * Erf.erfc(-z / SQRT2);
    }

    /** Standard normal quantile Φ⁻¹(p), 0 &lt; p &lt; 1. */
    static double phiInverse(double p) {
        // erfcInv keeps accuracy for small p where 2p − 1 would cancel.
        return p < 0.5 ? -SQRT2 * Erf.erfcInv(2.0 * p) : SQRT2 * Erf.erfInv(2.0 * p - 1.0);
    }

    @Override
    public String toString() {
        return name();
    }
}
