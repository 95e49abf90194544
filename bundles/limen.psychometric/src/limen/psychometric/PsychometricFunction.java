package limen.psychometric;

import java.util.Objects;

/**
 * An immutable psychometric function ψ(x) = γ + (1 − γ − λ) F(x; location, spread), with F a
 * {@link Sigmoid}, γ the guess rate (the floor: 1/n in n-alternative forced choice, the false-alarm
 * rate in yes/no) and λ the lapse rate (1 − λ is the ceiling), after Wichmann &amp; Hill (2001a),
 * Perception &amp; Psychophysics 63(8), 1293-1313, eq. 1.
 * <p>
 * Constraints, checked in the constructor: the sigmoid's parameter domain
 * ({@link Sigmoid#checkParameters}), 0 &le; γ &lt; 1, 0 &le; λ &lt; 1 and γ + λ &lt; 1.
 */
public final class PsychometricFunction {

    private final Sigmoid sigmoid;
    private final double location;
    private final double spread;
    private final double guess;
    private final double lapse;
    private final double range;

    /**
     * @param sigmoid  the family F
     * @param location F's location parameter ({@link Sigmoid#locationName()})
     * @param spread   F's spread parameter ({@link Sigmoid#spreadName()})
     * @param guess    γ, 0 &le; γ &lt; 1
     * @param lapse    λ, 0 &le; λ &lt; 1, γ + λ &lt; 1
     * @throws IllegalArgumentException for any value out of range, naming it
     */
    public PsychometricFunction(Sigmoid sigmoid, double location, double spread, double guess, double lapse) {
        this.sigmoid = Objects.requireNonNull(sigmoid, "sigmoid");
        sigmoid.checkParameters(location, spread);
        if (!(guess >= 0 && guess < 1)) {
            throw new IllegalArgumentException("guess rate must be in [0, 1), was " + guess);
        }
        if (!(lapse >= 0 && lapse < 1)) {
            throw new IllegalArgumentException("lapse rate must be in [0, 1), was " + lapse);
        }
        if (!(guess + lapse < 1)) {
            throw new IllegalArgumentException("guess + lapse must be < 1, was " + guess + " + " + lapse);
        }
        this.location = location;
        this.spread = spread;
        this.guess = guess;
        this.lapse = lapse;
        this.range = 1.0 - guess - lapse;
    }

    /** @return ψ(x) = γ + (1 − γ − λ) F(x) */
    public double psi(double x) {
        return guess + range * sigmoid.value(x, location, spread);
    }

    /** @return dψ/dx = (1 − γ − λ) dF/dx */
    public double psiDerivative(double x) {
        return range * sigmoid.derivative(x, location, spread);
    }

    /**
     * @param p a proportion with γ &lt; p &lt; 1 − λ
     * @return x with ψ(x) = p, that is F⁻¹((p − γ)/(1 − γ − λ))
     * @throws IllegalArgumentException unless γ &lt; p &lt; 1 − λ
     */
    public double inversePsi(double p) {
        if (!(p > guess && p < 1.0 - lapse)) {
            throw new IllegalArgumentException("inverse of psi needs guess < p < 1 - lapse, i.e. " + guess + " < p < "
                    + (1.0 - lapse) + ", was " + p);
        }
        double f = (p - guess) / range;
        // Rounding can push f to the closed ends for p a hair inside the open interval.
        f = Math.min(Math.max(f, Double.MIN_NORMAL), Math.nextDown(1.0));
        return sigmoid.inverse(f, location, spread);
    }

    /**
     * @param p a proportion with 0 &lt; p &lt; 1
     * @return x with F(x) = p (the guess and lapse rates play no part)
     */
    public double inverseF(double p) {
        return sigmoid.inverse(p, location, spread);
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    public double location() {
        return location;
    }

    public double spread() {
        return spread;
    }

    public double guess() {
        return guess;
    }

    public double lapse() {
        return lapse;
    }

    /** @return a copy with guess rate γ = g */
    public PsychometricFunction withGuess(double g) {
        return new PsychometricFunction(sigmoid, location, spread, g, lapse);
    }

    /** @return a copy with lapse rate λ = l */
    public PsychometricFunction withLapse(double l) {
        return new PsychometricFunction(sigmoid, location, spread, guess, l);
    }

    /** @return a copy with location m */
    public PsychometricFunction withLocation(double m) {
        return new PsychometricFunction(sigmoid, m, spread, guess, lapse);
    }

    /** @return a copy with spread s */
    public PsychometricFunction withSpread(double s) {
        return new PsychometricFunction(sigmoid, location, s, guess, lapse);
    }

    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof PsychometricFunction)) {
            return false;
        }
        PsychometricFunction f = (PsychometricFunction) o;
        return sigmoid.equals(f.sigmoid) && Double.compare(location, f.location) == 0
                && Double.compare(spread, f.spread) == 0 && Double.compare(guess, f.guess) == 0
                && Double.compare(lapse, f.lapse) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(sigmoid, location, spread, guess, lapse);
    }

    /** @return the listener spec form with the guess rate appended, e.g. {@code logistic:mid=0,scale=1 (guess=0.5)} */
    @Override
    public String toString() {
        return ListenerSpec.format(this) + " (guess=" + ListenerSpec.number(guess) + ")";
    }
}
