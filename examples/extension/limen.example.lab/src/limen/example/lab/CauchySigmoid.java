package limen.example.lab;

import limen.psychometric.Sigmoid;

/**
 * The Cauchy (arctangent) sigmoid, a heavy-tailed family contributed by the example lab, spec
 * {@code cauchy:mid=M,scale=S}. With z = (x − M)/S:
 * <pre>
 *   F(x)   = 1/2 + atan(z)/π              (the Cauchy distribution function, median M, half-width S)
 *   1 − F  = atan(1/z)/π for z &gt; 0       (no cancellation in the upper tail)
 *   F'(x)  = 1 / (π S (1 + z²))
 *   F''(x) = −2z / (π S² (1 + z²)²)
 *   F⁻¹(p) = M + S tan(π (p − 1/2))
 * </pre>
 * Its tails fall as 1/|z|, far slower than the logistic's, so it models a listener who now and then answers
 * correctly far below threshold.
 */
public final class CauchySigmoid implements Sigmoid {

    @Override
    public String name() {
        return "cauchy";
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
        return z < 0 ? Math.atan(-1 / z) / Math.PI : 0.5 + Math.atan(z) / Math.PI;
    }

    @Override
    public double complementValue(double x, double location, double spread) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        return z > 0 ? Math.atan(1 / z) / Math.PI : 0.5 - Math.atan(z) / Math.PI;
    }

    @Override
    public double derivative(double x, double location, double spread) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        return 1 / (Math.PI * spread * (1 + z * z));
    }

    @Override
    public double secondDerivative(double x, double location, double spread) {
        checkParameters(location, spread);
        double z = (x - location) / spread;
        double q = 1 + z * z;
        return -2 * z / (Math.PI * spread * spread * q * q);
    }

    @Override
    public double inverse(double p, double location, double spread) {
        checkParameters(location, spread);
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("cauchy: inverse needs 0 < p < 1, was " + p);
        }
        return location + spread * Math.tan(Math.PI * (p - 0.5));
    }

    @Override
    public boolean positiveDomainOnly() {
        return false;
    }
}
