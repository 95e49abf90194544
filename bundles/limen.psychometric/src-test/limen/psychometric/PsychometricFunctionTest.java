package limen.psychometric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PsychometricFunctionTest {

    private final PsychometricFunction f = new PsychometricFunction(Sigmoids.WEIBULL, 2.0, 3.0, 0.5, 0.04);

    /** ψ = γ + (1 − γ − λ)F, Wichmann & Hill (2001a) eq. 1. */
    @Test
    void psiScalesTheSigmoidBetweenGuessAndOneMinusLapse() {
        assertEquals(0.5, f.psi(0.0), 1e-15);
        assertEquals(0.96, f.psi(1e9), 1e-15);
        double fAtAlpha = 1 - Math.exp(-1);
        assertEquals(0.5 + 0.46 * fAtAlpha, f.psi(2.0), 1e-15);
        assertEquals(0.46 * Sigmoids.WEIBULL.derivative(1.7, 2, 3), f.psiDerivative(1.7), 1e-15);
    }

    @Test
    void inversePsiAndInverseF() {
        for (double p : new double[] { 0.51, 0.6, 0.73, 0.9, 0.959 }) {
            assertEquals(p, f.psi(f.inversePsi(p)), 1e-12);
        }
        assertEquals(2.0, f.inverseF(1 - Math.exp(-1)), 1e-14);
        assertEquals(f.inverseF(0.5), f.inversePsi(0.5 + 0.46 * 0.5), 1e-14);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.inversePsi(0.5));
        assertTrue(e.getMessage().contains("0.5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> f.inversePsi(0.96));
        assertThrows(IllegalArgumentException.class, () -> f.inversePsi(0.3));
    }

    @Test
    void validatedInConstructor() {
        assertThrows(IllegalArgumentException.class, () -> new PsychometricFunction(Sigmoids.LOGISTIC, 0, 1, -0.1, 0));
        assertThrows(IllegalArgumentException.class, () -> new PsychometricFunction(Sigmoids.LOGISTIC, 0, 1, 0.5, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new PsychometricFunction(Sigmoids.LOGISTIC, 0, 1, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> new PsychometricFunction(Sigmoids.LOGISTIC, 0, 0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new PsychometricFunction(Sigmoids.WEIBULL, -1, 2, 0, 0));
        assertThrows(NullPointerException.class, () -> new PsychometricFunction(null, 0, 1, 0, 0));
    }

    @Test
    void copiesAndEquality() {
        PsychometricFunction g = f.withGuess(0.25).withLapse(0.0).withLocation(3.0).withSpread(1.5);
        assertEquals(0.25, g.guess());
        assertEquals(0.0, g.lapse());
        assertEquals(3.0, g.location());
        assertEquals(1.5, g.spread());
        assertEquals(0.5, f.guess()); // original unchanged
        assertEquals(new PsychometricFunction(Sigmoids.WEIBULL, 2.0, 3.0, 0.5, 0.04), f);
        assertEquals(new PsychometricFunction(Sigmoids.WEIBULL, 2.0, 3.0, 0.5, 0.04).hashCode(), f.hashCode());
        assertNotEquals(f, f.withLapse(0.03));
        assertEquals("weibull:alpha=2,beta=3,lapse=0.04 (guess=0.5)", f.toString());
    }
}
