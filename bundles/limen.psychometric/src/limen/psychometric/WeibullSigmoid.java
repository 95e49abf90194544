package limen.psychometric;

/**
 * F(x) = 1 − exp(−(x/A)^B) for x &gt; 0, 0 for x &le; 0; see {@link Sigmoids#WEIBULL}. The location
 * is the scale A (alpha, F(A) = 1 − 1/e) and the "spread" slot holds the shape B (beta), which
 * grows as the function steepens.
 * <p>
 * Public with a public no-argument constructor only so that ServiceLoader and Declarative Services can
 * contribute it like any lab's family (see {@link Sigmoids#byName}); code uses the constant.
 */
public final class WeibullSigmoid implements Sigmoid {

    @Override
    public String name() {
        return "weibull";
    }

    @Override
    public String locationName() {
        return "alpha";
    }

    @Override
    public String spreadName() {
        return "beta";
    }

    @Override
    public void checkParameters(double location, double spread) {
        if (!(location > 0) || !Double.isFinite(location)) {
            throw new IllegalArgumentException("weibull: alpha must be finite and > 0, was " + location);
        }
        if (!(spread > 0) || !Double.isFinite(spread)) {
            throw new IllegalArgumentException("weibull: beta must be finite and > 0, was " + spread);
        }
    }

    @Override
    public double value(double x, double location, double spread) {
        checkParameters(location, spread);
        if (!(x > 0)) {
            return 0.0;
        }
        // −expm1 keeps relative accuracy where F is tiny.
        return -Math.expm1(-Math.pow(x / location, spread));
    }

    @Override
    public double complementValue(double x, double location, double spread) {
        checkParameters(location, spread);
        return x > 0 ? Math.exp(-Math.pow(x / location, spread)) : 1.0;
    }

    @Override
    public double derivative(double x, double location, double spread) {
        checkParameters(location, spread);
        if (!(x > 0)) {
            return 0.0;
        }
        double u = Math.pow(x / location, spread);
        return spread * u / x * Math.exp(-u);
    }

    /** F'' = F' ((B − 1) − B (x/A)^B) / x for x &gt; 0, else 0. */
    @Override
    public double secondDerivative(double x, double location, double spread) {
        if (!(x > 0)) {
            checkParameters(location, spread);
            return 0.0;
        }
        double u = Math.pow(x / location, spread);
        return derivative(x, location, spread) * ((spread - 1) - spread * u) / x;
    }

    @Override
    public void evaluate(double x, double location, double spread, double[] out) {
        checkParameters(location, spread);
        if (!(x > 0)) {
            out[0] = 0;
            out[1] = 1;
            out[2] = 0;
            out[3] = 0;
            return;
        }
        double t = Math.pow(x / location, spread);
        double e = Math.exp(-t);
        out[0] = -Math.expm1(-t);
        out[1] = e;
        out[2] = spread * t / x * e;
        out[3] = out[2] * ((spread - 1) - spread * t) / x;
    }

    @Override
    public double inverse(double p, double location, double spread) {
        checkParameters(location, spread);
        Sigmoids.checkProportion(this, p);
        return location * Math.pow(-Math.log1p(-p), 1.0 / spread);
    }

    @Override
    public boolean positiveDomainOnly() {
        return true;
    }

    @Override
    public String toString() {
        return name();
    }
}
