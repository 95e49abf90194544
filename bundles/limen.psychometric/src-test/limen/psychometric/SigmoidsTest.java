package limen.psychometric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class SigmoidsTest {

    private static final double[][] PARAMS = { { 40.0, 2.5 }, { 1.3, 0.2 }, { 0.05, 4.0 } };

    @Test
    void namesAndLookup() {
        assertEquals(List.of("logistic", "normal", "weibull", "gumbel"),
                Sigmoids.builtIns().stream().map(Sigmoid::name).toList());
        assertEquals("mid", Sigmoids.LOGISTIC.locationName());
        assertEquals("scale", Sigmoids.LOGISTIC.spreadName());
        assertEquals("sd", Sigmoids.NORMAL.spreadName());
        assertEquals("alpha", Sigmoids.WEIBULL.locationName());
        assertEquals("beta", Sigmoids.WEIBULL.spreadName());
        assertEquals("scale", Sigmoids.GUMBEL.spreadName());
        assertSame(Sigmoids.WEIBULL, Sigmoids.byName(" Weibull "));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Sigmoids.byName("cauchy"));
        assertTrue(e.getMessage().contains("cauchy"), e.getMessage());
    }

    /** Identities that follow from the definitions (see SOURCES.md, "need no source beyond the definition"). */
    @Test
    void valuesAtTheLocationFollowFromTheForms() {
        double oneMinusInvE = 1.0 - Math.exp(-1.0);
        assertEquals(0.5, Sigmoids.LOGISTIC.value(40.0, 40.0, 2.5), 1e-16);
        assertEquals(0.5, Sigmoids.NORMAL.value(40.0, 40.0, 2.5), 1e-16);
        assertEquals(oneMinusInvE, Sigmoids.WEIBULL.value(2.5, 2.5, 3.0), 1e-15);
        assertEquals(oneMinusInvE, Sigmoids.GUMBEL.value(-1.0, -1.0, 0.7), 1e-15);
        // logistic slope at the midpoint is 1/(4S)
        assertEquals(1.0 / (4 * 2.5), Sigmoids.LOGISTIC.derivative(40.0, 40.0, 2.5), 1e-16);
        // logistic at one scale above: 1/(1+e^-1)
        assertEquals(1.0 / (1.0 + Math.exp(-1.0)), Sigmoids.LOGISTIC.value(42.5, 40.0, 2.5), 1e-15);
    }

    /**
     * Φ against an independent computation in the test: 0.5 + Simpson's rule on the normal density
     * from 0 to z (2000 panels, error well below 1e-12).
     */
    @Test
    void normalMatchesIndependentQuadratureOfTheDensity() {
        for (double z : new double[] { -3.7, -2.0, -1.0, -0.25, 0.0, 0.6, 1.0, 1.959963984540054, 3.1 }) {
            assertEquals(simpsonPhi(z), Sigmoids.NORMAL.value(z, 0.0, 1.0), 1e-12, "z=" + z);
        }
        // Φ(1.959963984540054) = 0.975, the familiar two-sided 95% point (from memory)
        assertEquals(0.975, Sigmoids.NORMAL.value(1.959963984540054, 0, 1), 1e-12);
        // deep lower tail keeps relative accuracy: Φ(−10) = 7.6198530241605e-24 (from memory, cf. Abramowitz & Stegun 26.2.12 asymptotics)
        assertEquals(7.6198530241605e-24, Sigmoids.NORMAL.value(-10, 0, 1), 1e-34);
    }

    private static double simpsonPhi(double z) {
        int n = 2000;
        double h = z / n;
        double sum = density(0) + density(z);
        for (int i = 1; i < n; i++) {
            sum += (i % 2 == 1 ? 4 : 2) * density(i * h);
        }
        return 0.5 + sum * h / 3.0;
    }

    private static double density(double t) {
        return Math.exp(-0.5 * t * t) / Math.sqrt(2 * Math.PI);
    }

    @Test
    void derivativeMatchesCentralDifference() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            for (double[] p : PARAMS) {
                for (double q : new double[] { 0.02, 0.3, 0.5, 0.77, 0.97 }) {
                    double x = s.inverse(q, p[0], p[1]);
                    double h = 1e-5 * Math.abs(x);
                    double fd = (s.value(x + h, p[0], p[1]) - s.value(x - h, p[0], p[1])) / (2 * h);
                    assertEquals(fd, s.derivative(x, p[0], p[1]), 1e-6 * Math.abs(fd) + 1e-12, s + " q=" + q);
                }
            }
        }
    }

    @Test
    void secondDerivativeMatchesCentralDifferenceOfTheFirst() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            for (double[] p : PARAMS) {
                for (double q : new double[] { 0.02, 0.3, 0.5, 0.77, 0.97 }) {
                    double x = s.inverse(q, p[0], p[1]);
                    double h = 1e-5 * Math.abs(x);
                    double fd = (s.derivative(x + h, p[0], p[1]) - s.derivative(x - h, p[0], p[1])) / (2 * h);
                    double scale = s.derivative(x, p[0], p[1]) / Math.abs(x);
                    assertEquals(fd, s.secondDerivative(x, p[0], p[1]), 1e-5 * (Math.abs(fd) + scale), s + " q=" + q);
                }
            }
        }
    }

    @Test
    void evaluateAgreesWithTheSingleMethods() {
        double[] out = new double[4];
        for (Sigmoid s : Sigmoids.builtIns()) {
            for (double[] p : PARAMS) {
                for (double q : new double[] { 1e-6, 0.02, 0.3, 0.5, 0.77, 0.97, 1 - 1e-9 }) {
                    double x = s.inverse(q, p[0], p[1]);
                    s.evaluate(x, p[0], p[1], out);
                    assertEquals(s.value(x, p[0], p[1]), out[0], 1e-15 * Math.max(1e-300, out[0]) + 1e-300, s + " F q=" + q);
                    assertEquals(s.complementValue(x, p[0], p[1]), out[1], 2e-15 * out[1] + 1e-300, s + " 1-F q=" + q);
                    assertEquals(s.derivative(x, p[0], p[1]), out[2], 1e-13 * out[2], s + " F' q=" + q);
                    assertEquals(s.secondDerivative(x, p[0], p[1]), out[3], 1e-12 * Math.abs(out[3]) + 1e-300, s + " F'' q=" + q);
                }
            }
        }
        Sigmoids.WEIBULL.evaluate(-1, 1, 2, out);
        assertEquals(0.0, out[0]);
        assertEquals(1.0, out[1]);
    }

    @Test
    void inverseRoundTrips() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            for (double[] p : PARAMS) {
                for (double q : new double[] { 1e-9, 0.01, 0.25, 0.5, 0.8, 0.999, 1 - 1e-9 }) {
                    double x = s.inverse(q, p[0], p[1]);
                    assertEquals(q, s.value(x, p[0], p[1]), 1e-12 * Math.max(1, q / (1 - q)) + 1e-15 * 0, s + " q=" + q);
                }
                assertThrows(IllegalArgumentException.class, () -> s.inverse(0.0, p[0], p[1]));
                assertThrows(IllegalArgumentException.class, () -> s.inverse(1.0, p[0], p[1]));
            }
        }
    }

    @Test
    void complementIsOneMinusValueAndKeepsTheUpperTail() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            for (double x : new double[] { 0.3, 1.0, 2.0, 4.0 }) {
                assertEquals(1 - s.value(x, 2.0, 0.5), s.complementValue(x, 2.0, 0.5), 1e-15, s.name());
            }
        }
        // far upper tail: 1 − F is representable even where F rounds to 1
        assertEquals(Math.exp(-40) / (1 + Math.exp(-40)), Sigmoids.LOGISTIC.complementValue(40, 0, 1), 1e-30);
        assertEquals(Sigmoids.NORMAL.value(-12, 0, 1), Sigmoids.NORMAL.complementValue(12, 0, 1), 0.0);
        assertEquals(Math.exp(-Math.pow(5, 3)), Sigmoids.WEIBULL.complementValue(5, 1, 3), 1e-70);
    }

    @Test
    void monotoneFromZeroToOne() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            double prev = -1;
            for (int i = 0; i <= 400; i++) {
                double x = 0.001 + i * 0.02;
                double v = s.value(x, 3.0, 1.5);
                assertTrue(v >= prev && v >= 0 && v <= 1, s + " at " + x);
                prev = v;
            }
            assertTrue(s.value(1e6, 3.0, 1.5) > 1 - 1e-12, s.name());
        }
        assertEquals(0.0, Sigmoids.LOGISTIC.value(-1e6, 3.0, 1.5));
        assertEquals(0.0, Sigmoids.NORMAL.value(-1e6, 3.0, 1.5));
        assertEquals(0.0, Sigmoids.GUMBEL.value(-1e6, 3.0, 1.5));
    }

    /** weibull(x; A, B) = gumbel(ln x; ln A, 1/B): the log-Weibull identity, from the two forms. */
    @Test
    void weibullIsGumbelOnLogX() {
        double a = 2.5, b = 3.2;
        for (double x : new double[] { 0.1, 1.0, 2.5, 3.9, 8.0 }) {
            assertEquals(Sigmoids.WEIBULL.value(x, a, b), Sigmoids.GUMBEL.value(Math.log(x), Math.log(a), 1 / b), 1e-14);
            // chain rule: dW/dx = dG/du / x
            assertEquals(Sigmoids.WEIBULL.derivative(x, a, b),
                    Sigmoids.GUMBEL.derivative(Math.log(x), Math.log(a), 1 / b) / x, 1e-13);
        }
    }

    @Test
    void weibullIsZeroOnNonPositiveValuesOnly() {
        assertTrue(Sigmoids.WEIBULL.positiveDomainOnly());
        assertEquals(0.0, Sigmoids.WEIBULL.value(0.0, 1, 2));
        assertEquals(0.0, Sigmoids.WEIBULL.value(-3.0, 1, 2));
        assertEquals(0.0, Sigmoids.WEIBULL.derivative(-3.0, 1, 2));
        for (Sigmoid s : List.of(Sigmoids.LOGISTIC, Sigmoids.NORMAL, Sigmoids.GUMBEL)) {
            assertTrue(!s.positiveDomainOnly());
        }
    }

    @Test
    void badParametersAreRejectedWithTheValue() {
        for (Sigmoid s : Sigmoids.builtIns()) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> s.value(1, 1, -0.5));
            assertTrue(e.getMessage().contains("-0.5") && e.getMessage().contains(s.spreadName()), e.getMessage());
            assertThrows(IllegalArgumentException.class, () -> s.value(1, Double.NaN, 1));
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Sigmoids.WEIBULL.value(1, 0, 1));
        assertTrue(e.getMessage().contains("alpha"), e.getMessage());
    }
}
