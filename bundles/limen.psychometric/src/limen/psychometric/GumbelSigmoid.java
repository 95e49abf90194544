package limen.psychometric;

/**
 * F(x) = 1 − exp(−exp((x − M)/S)), the log-Weibull; see {@link Sigmoids#GUMBEL}.
 * <p>
 * Public with a public no-argument constructor only so that ServiceLoader and Declarative Services can
 * contribute it like any lab's family (see {@link Sigmoids#byName}); code uses the constant.
 */
public final class GumbelSigmoid implements Sigmoid {

    @Override
    public String name() {
        return "gumbel";
    }

    @Override
    public String locationName() {
        return "mid";
    }

    @Override
    public String spreadName() {
        return "scale";
    }

    @Override
    public double value(double x, double location, double spread) {
        checkParameters(location, spread);
        return -Math.expm1(-Math.exp((x - location) / spread));
    }

    @Override
    public double complementValue(double x, double location, double spread) {
        checkParameters(location, spread);
        return Math.exp(-Math.exp((x - location) / spread));
    }

    @Override
    public double derivative(double x, double location, double spread) {
        checkParameters(location, spread);
        double e = Math.exp((x - location) / spread);
        return e == Double.POSITIVE_INFINITY ? 0.0 : e * Math.exp(-e) / spread;
    }

    /** F'' = F' (1 − e^z)/S, z = (x − M)/S. */
    @Override
    public double secondDerivative(double x, double location, double spread) {
        double e = Math.exp((x - location) / spread);
        return e == Double.POSITIVE_INFINITY ? 0.0 : derivative(x, location, spread) * (1 - e) / spread;
    }

    @Override
    public void evaluate(double x, double location, double spread, double[] out) {
        checkParameters(location, spread);
        double ez = Math.exp((x - location) / spread);
        double t = Math.exp(-ez);
        out[0] = -Math.expm1(-ez);
        out[1] = t;
        out[2] = ez == Double.POSITIVE_INFINITY ? 0.0 : ez * t / spread;
        out[3] = ez == Double.POSITIVE_INFINITY ? 0.0 : out[2] * (1 - ez) / spread;
    }

    @Override
    public double inverse(double p, double location, double spread) {
        checkParameters(location, spread);
        Sigmoids.checkProportion(this, p);
        return location + spread * Math.log(-Math.log1p(-p));
    }

    @Override
    public boolean positiveDomainOnly() {
        return false;
    }

    @Override
    public String toString() {
        return name();
    }
}
