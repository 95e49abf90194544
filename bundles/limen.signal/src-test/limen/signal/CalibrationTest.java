package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Calibration arithmetic: log-frequency interpolation (by its definition), range, flat factory. */
class CalibrationTest {

    private final Calibration cal = new Calibration("Harbourside booth A", -20, new double[] {125, 250, 1000, 8000},
            new double[] {60, 66, 72, 63}, 100, 48000);

    @Test
    void interpolatesLinearlyInLogFrequency() {
        // at the geometric mean of two points the log position is exactly halfway: the mean of the two levels
        assertEquals(63.0, cal.splAtReferenceDb(Math.sqrt(125 * 250)), 1e-12);
        // 500 Hz is one octave of the two from 250 to 1000 Hz: half the log span
        assertEquals(69.0, cal.splAtReferenceDb(500), 1e-12);
        // 2000 Hz is one third of the log span 1000..8000 (one of three octaves)
        assertEquals(72 + (63 - 72) / 3.0, cal.splAtReferenceDb(2000), 1e-12);
        // independent recomputation at an arbitrary frequency: S = S1 + (S2 - S1)·log(f/f1)/log(f2/f1)
        double f = 3170;
        double expected = 72 + (63 - 72) * Math.log10(f / 1000) / Math.log10(8000.0 / 1000);
        assertEquals(expected, cal.splAtReferenceDb(f), 1e-12);
        assertEquals(72.0, cal.splAtReferenceDb(1000), 0);
    }

    @Test
    void refusesFrequenciesOutsideTheCalibratedRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> cal.sineAmplitude(60, 100));
        assertTrue(e.getMessage().contains("100.0 Hz") && e.getMessage().contains("125.0 to 8000.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> cal.sineAmplitude(60, 8000.5));
        assertFalse(cal.covers(124.99));
        assertTrue(cal.covers(125));
    }

    @Test
    void amplitudeFromLevel() {
        // full-scale sine at 1 kHz gives 72 + 20 = 92 dB SPL; 72 dB SPL needs -20 dBFS = amplitude 0.1
        assertEquals(92.0, cal.fullScaleSineSplDb(1000), 1e-12);
        assertEquals(0.1, cal.sineAmplitude(72, 1000), 1e-15);
        assertEquals(1.0, cal.sineAmplitude(92, 1000), 1e-15);
        assertEquals(-32.0, cal.dbfsForLevel(60, 1000), 1e-12);
        assertEquals(60.0, cal.levelDbSpl(-32, 1000), 1e-12);
    }

    @Test
    void flatCalibration() {
        Calibration flat = Calibration.flat("bench", 100, 48000);
        assertEquals(97.0, flat.ceilingDbSpl(), 0);
        assertEquals(100.0, flat.fullScaleSineSplDb(37), 1e-12);
        assertEquals(100.0, flat.fullScaleSineSplDb(23999), 1e-12);
        assertEquals(90.0, Calibration.flat("bench", 100, 90, 48000).ceilingDbSpl(), 0);
        // a higher ceiling is not honoured
        assertEquals(97.0, Calibration.flat("bench", 100, 120, 48000).ceilingDbSpl(), 0);
        assertEquals(Math.pow(10, -40 / 20.0), flat.sineAmplitude(60, 1000), 1e-15);
    }

    @Test
    void validation() {
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration("x", -20, new double[] {1000, 500}, new double[] {70, 70}, 90, 48000));
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration("x", -20, new double[] {1000}, new double[] {70, 70}, 90, 48000));
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration("x", -20, new double[] {1000, 30000}, new double[] {70, 70}, 90, 48000));
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration("x", 3, new double[] {1000}, new double[] {70}, 90, 48000));
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration("x", -20, new double[] {1000}, new double[] {70}, 90, 22050));
        assertThrows(IllegalArgumentException.class,
                () -> new Calibration(" ", -20, new double[] {1000}, new double[] {70}, 90, 48000));
    }

    @Test
    void worstCaseOverAnInterval() {
        // maximum of the interpolant over 200..2000 Hz is the 1 kHz point: 72 + 20
        assertEquals(92.0, cal.worstCaseFullScaleSplDb(200, 2000), 1e-12);
        // inside one segment the larger end wins
        assertEquals(cal.fullScaleSineSplDb(900), cal.worstCaseFullScaleSplDb(300, 900), 1e-12);
        // far below the range (0 Hz): the most sensitive point of the whole calibration
        assertEquals(92.0, cal.worstCaseFullScaleSplDb(0, 10), 1e-12);
        // within an octave below the range: the end point's value
        assertEquals(80.0, cal.worstCaseFullScaleSplDb(100, 120), 1e-12);
    }

    @Test
    void valueSemantics() {
        Calibration same = new Calibration("Harbourside booth A", -20, new double[] {125, 250, 1000, 8000},
                new double[] {60, 66, 72, 63}, 100, 48000);
        assertEquals(cal, same);
        assertEquals(cal.hashCode(), same.hashCode());
        assertNotEquals(cal, cal.withCeiling(90));
        double[] f = cal.frequenciesHz();
        f[0] = 1;
        assertEquals(125.0, cal.minFrequencyHz(), 0);
    }
}
