package limen.procedure;

import limen.psychometric.PsychometricFunction;

/**
 * The point of the psychometric function a procedure estimates: either a level of the
 * performance ψ (staircases converge to such a point, e.g. ψ = 0.7071 for 2-down/1-up after Levitt
 * 1971), or a level of the underlying sigmoid F, independent of guess and lapse (the Psi method
 * estimates the location of F).
 *
 * @param level      PSI or SIGMOID
 * @param proportion the proportion, strictly between 0 and 1
 */
public record Target(Level level, double proportion) {

    /** Which function the proportion refers to. */
    public enum Level {
        /** ψ(x) = proportion */
        PSI,
        /** F(x) = proportion */
        SIGMOID
    }

    /** @throws IllegalArgumentException unless 0 &lt; proportion &lt; 1 */
    public Target {
        java.util.Objects.requireNonNull(level, "level");
        if (!(proportion > 0 && proportion < 1)) {
            throw new IllegalArgumentException("target proportion must be in (0, 1), was " + proportion);
        }
    }

    /** @return the target ψ(x) = p */
    public static Target psi(double p) {
        return new Target(Level.PSI, p);
    }

    /** @return the target F(x) = p */
    public static Target sigmoid(double p) {
        return new Target(Level.SIGMOID, p);
    }

    /**
     * @param f a (model listener's) psychometric function
     * @return the x at which f meets this target: f.inversePsi(p) or f.inverseF(p)
     * @throws IllegalArgumentException when a PSI target lies outside f's range (γ, 1 − λ)
     */
    public double valueOn(PsychometricFunction f) {
        return level == Level.PSI ? f.inversePsi(proportion) : f.inverseF(proportion);
    }

    @Override
    public String toString() {
        return (level == Level.PSI ? "psi=" : "F=") + String.format(java.util.Locale.ROOT, "%.4f", proportion);
    }
}
