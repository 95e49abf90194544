package limen.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * AES17-2020 (and IEC 61606) level convention: 0 dBFS is the RMS of a sine whose peak reaches full scale, so a
 * full-scale square wave reads +3.01 dBFS and a sine's RMS level equals its peak level 20·log10(A).
 */
class LevelConventionTest {

    @Test
    void fullScaleSineIsZeroDbfs() {
        double[] x = Synthesis.sine(997, 1.0, 48000, 48000); // 997 Hz: the AES17 test frequency, 1 s
        assertEquals(0.0, Levels.rmsDbfs(x), 1e-4);
        assertEquals(0.0, Levels.peakDbfs(x), 1e-4);
    }

    @Test
    void sineAtMinus20() {
        double a = Math.pow(10, -20 / 20.0);
        double[] x = Synthesis.sine(1000, a, 48000, 48000);
        assertEquals(-20.0, Levels.rmsDbfs(x), 1e-9);
        assertEquals(Math.sqrt(0.5) * a, Levels.rms(x), 1e-12);
    }

    @Test
    void fullScaleSquareWaveIsPlus3Dbfs() {
        double[] x = new double[48000];
        for (int i = 0; i < x.length; i++) {
            x[i] = (i / 24) % 2 == 0 ? 1.0 : -1.0;
        }
        // 20·log10(√2) = 3.0103 dB
        assertEquals(20 * Math.log10(Math.sqrt(2)), Levels.rmsDbfs(x), 1e-12);
        assertEquals(3.0103, Levels.rmsDbfs(x), 1e-4);
    }

    @Test
    void splThroughCalibration() {
        Calibration c = new Calibration("TDH-bench", -20, new double[] {250, 1000, 4000}, new double[] {70, 75, 80}, 95,
                48000);
        // a -20 dBFS sine at 1 kHz is 75 dB SPL by definition of the calibration point
        double[] x = Synthesis.sine(1000, 0.1, 48000, 48000);
        assertEquals(75.0, Levels.rmsDbSpl(x, 0, x.length, c, 1000), 1e-9);
        assertEquals(75.0, Levels.peakDbSpl(x, 0, x.length, c, 1000), 1e-6);
        assertEquals(0.1, c.sineAmplitude(75, 1000), 1e-15);
    }
}
