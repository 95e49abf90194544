package limen.fit;

import java.util.Objects;

import limen.psychometric.Sigmoid;

/**
 * Immutable settings of a maximum-likelihood fit of ψ(x) = γ + (1 − γ − λ) F(x): the family F, how the
 * guess rate γ and the lapse rate λ are treated, and the targets at which thresholds are reported.
 * Configure by {@code withX} copies, e.g.
 * {@code FitOptions.of(Sigmoids.WEIBULL).withGuess(0.5).withLapseMax(0.06)}.
 * <ul>
 * <li>γ is either fixed ({@link #withGuess}, e.g. 1/n for n-alternative forced choice; the default is 0)
 * or free in [0, γmax] ({@link #withFreeGuess}, yes/no tasks).</li>
 * <li>λ is either fixed ({@link #withLapse}) or free in [0, λmax] ({@link #withLapseMax}); λmax = 0 fixes λ
 * at 0. The default is free in [0, {@value #DEFAULT_LAPSE_MAX}], the bound used by Wichmann &amp; Hill (2001a,
 * Perception &amp; Psychophysics 63(8), 1293-1313) (from memory).</li>
 * <li>The threshold is reported at ψ = {@link #targetPsi()}; NaN (the default) means the midpoint
 * (γ + 1 − λ)/2 of the fitted function, i.e. F = 1/2. Optionally also at F = {@link #targetF()}.</li>
 * </ul>
 */
public final class FitOptions {

    /** Default upper bound of a free lapse rate: 0.06, Wichmann &amp; Hill (2001a) (from memory). */
    public static final double DEFAULT_LAPSE_MAX = 0.06;
    /**
     * Default upper bound of a free guess rate: 0.5. Our choice: a floor above one half leaves the function
     * less room to rise than the chance floor of 2AFC and is not a plausible yes/no false-alarm rate.
     */
    public static final double DEFAULT_GUESS_MAX = 0.5;

    private final Sigmoid sigmoid;
    private final boolean guessFree;
    private final double guess;
    private final double guessMax;
    private final boolean lapseFree;
    private final double lapse;
    private final double lapseMax;
    private final double targetPsi;
    private final double targetF;

    private FitOptions(Sigmoid sigmoid, boolean guessFree, double guess, double guessMax, boolean lapseFree,
            double lapse, double lapseMax, double targetPsi, double targetF) {
        Objects.requireNonNull(sigmoid, "sigmoid");
        if (!(guess >= 0 && guess < 1)) {
            throw new IllegalArgumentException("guess rate must be in [0, 1), was " + guess);
        }
        if (!(guessMax > 0 && guessMax < 1)) {
            throw new IllegalArgumentException("upper bound of a free guess rate must be in (0, 1), was " + guessMax);
        }
        if (!(lapse >= 0 && lapse < 1)) {
            throw new IllegalArgumentException("lapse rate must be in [0, 1), was " + lapse);
        }
        if (!(lapseMax >= 0 && lapseMax < 1)) {
            throw new IllegalArgumentException("lapse bound must be in [0, 1), was " + lapseMax);
        }
        double g = guessFree ? guessMax : guess;
        double l = lapseFree ? lapseMax : lapse;
        if (!(g + l < 1)) {
            throw new IllegalArgumentException("guess " + g + " plus lapse " + l + " must stay below 1");
        }
        if (!Double.isNaN(targetPsi) && !(targetPsi > 0 && targetPsi < 1)) {
            throw new IllegalArgumentException("target proportion must be in (0, 1), was " + targetPsi);
        }
        if (!Double.isNaN(targetF) && !(targetF > 0 && targetF < 1)) {
            throw new IllegalArgumentException("target F must be in (0, 1), was " + targetF);
        }
        this.sigmoid = sigmoid;
        this.guessFree = guessFree;
        this.guess = guess;
        this.guessMax = guessMax;
        this.lapseFree = lapseFree;
        this.lapse = lapse;
        this.lapseMax = lapseMax;
        this.targetPsi = targetPsi;
        this.targetF = targetF;
    }

    /** @return options for family F with γ fixed at 0, λ free in [0, {@value #DEFAULT_LAPSE_MAX}], default targets */
    public static FitOptions of(Sigmoid sigmoid) {
        return new FitOptions(sigmoid, false, 0.0, DEFAULT_GUESS_MAX, true, 0.0, DEFAULT_LAPSE_MAX, Double.NaN, Double.NaN);
    }

    /** @return a copy with family F */
    public FitOptions withSigmoid(Sigmoid s) {
        return new FitOptions(s, guessFree, guess, guessMax, lapseFree, lapse, lapseMax, targetPsi, targetF);
    }

    /** @return a copy with γ fixed at g (1/n for n-alternative forced choice) */
    public FitOptions withGuess(double g) {
        return new FitOptions(sigmoid, false, g, guessMax, lapseFree, lapse, lapseMax, targetPsi, targetF);
    }

    /** @return a copy with γ free in [0, max] (yes/no tasks) */
    public FitOptions withFreeGuess(double max) {
        return new FitOptions(sigmoid, true, 0.0, max, lapseFree, lapse, lapseMax, targetPsi, targetF);
    }

    /** @return a copy with λ free in [0, max]; max = 0 fixes λ at 0 */
    public FitOptions withLapseMax(double max) {
        return new FitOptions(sigmoid, guessFree, guess, guessMax, max > 0, 0.0, max, targetPsi, targetF);
    }

    /** @return a copy with λ fixed at l */
    public FitOptions withLapse(double l) {
        return new FitOptions(sigmoid, guessFree, guess, guessMax, false, l, lapseMax, targetPsi, targetF);
    }

    /** @return a copy reporting the threshold at ψ = p; NaN restores the default midpoint */
    public FitOptions withTargetPsi(double p) {
        return new FitOptions(sigmoid, guessFree, guess, guessMax, lapseFree, lapse, lapseMax, p, targetF);
    }

    /** @return a copy also reporting the value where F = p; NaN for none */
    public FitOptions withTargetF(double p) {
        return new FitOptions(sigmoid, guessFree, guess, guessMax, lapseFree, lapse, lapseMax, targetPsi, p);
    }

    public Sigmoid sigmoid() {
        return sigmoid;
    }

    /** @return true when γ is estimated */
    public boolean guessFree() {
        return guessFree;
    }

    /** @return the fixed γ (meaningless when {@link #guessFree()}) */
    public double guess() {
        return guess;
    }

    /** @return the upper bound of a free γ */
    public double guessMax() {
        return guessMax;
    }

    /** @return true when λ is estimated in [0, {@link #lapseMax()}] */
    public boolean lapseFree() {
        return lapseFree;
    }

    /** @return the fixed λ (meaningless when {@link #lapseFree()}) */
    public double lapse() {
        return lapse;
    }

    /** @return the upper bound of a free λ */
    public double lapseMax() {
        return lapseMax;
    }

    /** @return the target ψ of the threshold, NaN for the midpoint between γ and 1 − λ */
    public double targetPsi() {
        return targetPsi;
    }

    /** @return the target F of the second threshold, NaN for none */
    public double targetF() {
        return targetF;
    }

    /** @return the number of estimated parameters: 2 plus one each for a free γ and a free λ */
    public int freeParameters() {
        return 2 + (guessFree ? 1 : 0) + (lapseFree ? 1 : 0);
    }

    @Override
    public String toString() {
        return sigmoid.name() + ", guess " + (guessFree ? "free in [0, " + guessMax + "]" : "= " + guess) + ", lapse "
                + (lapseFree ? "free in [0, " + lapseMax + "]" : "= " + lapse)
                + (Double.isNaN(targetPsi) ? "" : ", target psi " + targetPsi)
                + (Double.isNaN(targetF) ? "" : ", target F " + targetF);
    }
}
