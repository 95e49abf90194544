package limen.example.lab.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.distribution.CauchyDistribution;
import org.junit.jupiter.api.Test;

import limen.example.lab.CauchySigmoid;

/** The example family against Commons Math's Cauchy distribution (an independent implementation). */
class CauchySigmoidTest {

    private final CauchySigmoid f = new CauchySigmoid();
    private final CauchyDistribution reference = new CauchyDistribution(3.0, 1.5);

    @Test
    void valueDensityAndInverseEqualTheCauchyDistribution() {
        for (double x = -40; x <= 40; x += 0.37) {
            assertEquals(reference.cumulativeProbability(x), f.value(x, 3.0, 1.5), 1e-12, "F at " + x);
            assertEquals(1 - reference.cumulativeProbability(x), f.complementValue(x, 3.0, 1.5), 1e-12, "1 - F at " + x);
            assertEquals(reference.density(x), f.derivative(x, 3.0, 1.5), 1e-12, "F' at " + x);
        }
        for (double p = 0.01; p < 1; p += 0.01) {
            assertEquals(reference.inverseCumulativeProbability(p), f.inverse(p, 3.0, 1.5), 1e-9, "inverse at " + p);
        }
    }

    @Test
    void secondDerivativeIsTheSlopeOfTheDensity() {
        double h = 1e-5;
        for (double x = -10; x <= 10; x += 0.5) {
            double numeric = (reference.density(x + h) - reference.density(x - h)) / (2 * h);
            assertEquals(numeric, f.secondDerivative(x, 3.0, 1.5), 1e-7, "F'' at " + x);
        }
    }

    @Test
    void upperTailKeepsItsRelativeAccuracy() {
        // 1 - F(x) = atan(S/(x - M))/pi ~ S/(pi (x - M)) far out; the subtraction 1 - F would return 0 at 1e17
        assertEquals(1.5 / (Math.PI * 1e17), f.complementValue(3 + 1e17, 3.0, 1.5), 1e-30);
    }

    @Test
    void badParametersAreRefusedWithTheirValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.value(0, 0, -1));
        assertEquals("cauchy: scale must be finite and > 0, was -1.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> f.inverse(1.0, 0, 1));
    }
}
