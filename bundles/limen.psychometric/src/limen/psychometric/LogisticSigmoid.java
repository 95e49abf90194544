package limen.psychometric;

/**
 * F(x) = 1 / (1 + exp(−(x − M)/S)); see {@link Sigmoids#LOGISTIC}.
 * <p>
 * Public with a public no-argument constructor only so that ServiceLoader and Declarative Services can
 * contribute it like any lab's family (see {@link Sigmoids#byName}); code uses the constant.
 */
public final class LogisticSigmoid implements Sigmoid {

    @Override
    public String name() {
        return "logistic";
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
        double z = (x - location) / spread;
        // Written so that neither branch overflows: exp of a non-positive number only.
        if (z >= 0) {
            return 1.0 / (1.0 + Math.exp(-z));
        }
        double e = Math.exp(z);
        return e / (1.0 + e);
    }

    @Override
    public double complementValue(double x, double location, double spread) {
        checkParameters(location, spread);
        return value(-x, -location, spread); // 1 − F(z) = F(−z) by symmetry
    }

    @Override
    public double derivative(double x, double location, double spread) {
        checkParameters(location, spread);
        double e = Math.exp(-Math.abs((x - location) / spread));
        // F(1 − F)/S, symmetric in z; computed from exp(−|z|) to stay finite in the tails.
        return e / ((1.0 + e) * (1.0 + e) * spread);
    }

    /** F'' = F'(1 − 2F)/S. */
    @Override
    public double secondDerivative(double x, double location, double spread) {
        double f = value(x, location, spread);
        return derivative(x, location, spread) * (1 - 2 * f) / spread;
    }

    @Override
    public void evaluate(double x, double location, double spread, double[] out) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        double e = Math.exp(-Math.abs(z)); // one exponential serves all four
        double big = 1.0 / (1.0 + e);
        double small = e / (1.0 + e);
        out[0] = z >= 0 ? big : small;
        out[1] = z >= 0 ? small : big;
        out[2] = big * small / spread;
        out[3] = out[2] * (out[1] - out[0]) / spread;
    }

    @Override
    public double inverse(double p, double location, double spread) {
        checkParameters(location, spread);
        Sigmoids.checkProportion(this, p);
        return location + spread * Math.log(p / (1.0 - p));
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
