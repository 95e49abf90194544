package limen.ui.authoring.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.Devices;
import limen.model.LimenPackage.Literals;
import limen.model.Step;
import limen.signal.IntervalMark;
import limen.ui.authoring.AuthoringTopics;
import limen.ui.authoring.StepFocus;
import limen.ui.authoring.edit.Field;
import limen.ui.authoring.parts.BatteryEditorPart;
import limen.ui.authoring.parts.StimulusPreviewPart;
import limen.ui.authoring.preview.TrialPreview;

/** The preview of a frequency-discrimination step: two intervals peaking at the standard and the comparison. */
class StimulusPreviewTest {

    @TempDir
    Path temp;

    private Fixture fx;
    private BatteryEditorPart editor;
    private StimulusPreviewPart preview;

    @BeforeEach
    void setUp() throws Exception {
        fx = new Fixture(temp, "stimulus preview", 1200, 900);
        SashForm sash = new SashForm(fx.shell, SWT.VERTICAL);
        Composite top = new Composite(sash, SWT.NONE);
        Composite bottom = new Composite(sash, SWT.NONE);
        sash.setWeights(40, 60);
        preview = fx.make(StimulusPreviewPart.class, bottom, null);
        fx.broker.on(AuthoringTopics.STEP, data -> preview.show((StepFocus) data));
        editor = fx.editor(top, "frequency-discrimination.battery");
        fx.shell.open();
    }

    @AfterEach
    void tearDown() {
        fx.close();
    }

    /**
     * The frequency of the largest |DFT| of x between lo and hi Hz, searched on a 0.01 Hz grid by direct
     * evaluation of X(f) = sum x[n] exp(-2 pi i f n / fs) (no window, no FFT: independent of limen.signal's
     * Spectrum). For a single windowed tone the maximum of |X(f)| is the maximum-likelihood frequency estimate
     * (Rife &amp; Boorstyn 1974, IEEE Trans. Inf. Theory 20(5), 591-598).
     */
    static double bruteForcePeakHz(double[] x, double fs, double lo, double hi) {
        double coarseBest = lo;
        double coarseMax = -1;
        for (double f = lo; f <= hi; f += 1.0) {
            double p = power(x, fs, f);
            if (p > coarseMax) {
                coarseMax = p;
                coarseBest = f;
            }
        }
        double best = coarseBest;
        double max = -1;
        for (double f = coarseBest - 1; f <= coarseBest + 1; f += 0.01) {
            double p = power(x, fs, f);
            if (p > max) {
                max = p;
                best = f;
            }
        }
        return best;
    }

    private static double power(double[] x, double fs, double f) {
        double re = 0;
        double im = 0;
        for (int n = 0; n < x.length; n++) {
            double a = 2 * Math.PI * f * n / fs;
            re += x[n] * Math.cos(a);
            im -= x[n] * Math.sin(a);
        }
        return re * re + im * im;
    }

    @Test
    void frequencyDiscriminationTrialPeaksAtStandardAndComparison() throws Exception {
        Step step = editor.document().battery().getSteps().get(1); // fd-1000: standard 1000 Hz, percent steps
        editor.select(step);
        TrialPreview.Result first = preview.result();
        assertNotNull(first, "selecting the step renders it: " + preview.problem());
        assertEquals(8.0, first.plan().value(), "starts at track A's start value (8 %)");

        preview.preview(8.0, 2);
        TrialPreview.Result r = preview.result();
        assertNotNull(r.checked(), "the guard passes a 60 dB SPL trial under an 85 dB SPL ceiling: " + r.refusal());
        assertNull(r.refusal());
        assertEquals(2, r.intervals().size());
        TrialPreview.Interval standard = r.intervals().get(0);
        TrialPreview.Interval comparison = r.intervals().get(1);
        assertFalse(standard.target());
        assertTrue(comparison.target());
        // comparison = f0 (1 + v/100) for a PERCENT quantity (the model's documentation of QuantityUnit.PERCENT)
        double expected = 1000 * (1 + 8.0 / 100);
        assertEquals(1000.0, standard.dominantFrequencyHz(), 0.05);
        assertEquals(expected, comparison.dominantFrequencyHz(), 0.05);

        // the numbers behind the plot, checked against a direct DFT of each interval's samples
        double fs = r.stimulus().sampleRateHz();
        double[] left = r.stimulus().channel(0);
        for (IntervalMark m : r.stimulus().intervals()) {
            double[] x = Arrays.copyOfRange(left, m.onsetSample(), m.offsetSample());
            double peak = bruteForcePeakHz(x, fs, 800, 1300);
            assertEquals(m.target() ? expected : 1000.0, peak, 0.02, "direct DFT of interval " + (m.index() + 1));
        }

        // levels in dB SPL through the calibration: a 60 dB SPL tone reads 60 dB SPL at its peak, less at most
        // the Hann window's scalloping loss of 1.42 dB between bins (Harris 1978, Proc. IEEE 66(1), Table 1)
        for (TrialPreview.Interval i : r.intervals()) {
            assertTrue(i.peakLevelDbSpl() <= 60.05 && i.peakLevelDbSpl() >= 60 - 1.45, "peak " + i.peakLevelDbSpl());
        }
        assertTrue(preview.levelsText().contains("Standard level 60.0 dB SPL"), preview.levelsText());
        assertTrue(preview.levelsText().contains("Guard: passed"), preview.levelsText());

        // the plotted series peak where the numbers say
        XYPlot plot = preview.charts().get(1).chart().getXYPlot();
        XYDataset data = plot.getDataset();
        assertEquals(2, data.getSeriesCount());
        for (int s = 0; s < 2; s++) {
            int best = 0;
            for (int k = 1; k < data.getItemCount(s); k++) {
                if (data.getYValue(s, k) > data.getYValue(s, best)) {
                    best = k;
                }
            }
            double binHz = data.getXValue(s, 1) - data.getXValue(s, 0);
            assertEquals(r.intervals().get(s).dominantFrequencyHz(), data.getXValue(s, best), binHz,
                    "plotted peak of interval " + (s + 1));
        }

        boolean device = !Devices.system().outputs().isEmpty();
        assertEquals(device, preview.playEnabled(), "Play follows the device: " + preview.playReason());
        if (!device) {
            assertEquals(Devices.NO_OUTPUT_MESSAGE, preview.playReason());
        }
        fx.pump(300);
        Path png = Screenshots.save(fx.shell, "preview-frequency-discrimination");
        assertTrue(Screenshots.distinctPixels(png) > 50, "the charts are drawn");
    }

    @Test
    void previewEqualsTheHeadlessRenderCommand() throws Exception {
        Step step = editor.document().battery().getSteps().get(2); // fd-4000
        editor.select(step);
        preview.preview(5.0, 1);
        TrialPreview.Result r = preview.result();
        assertNotNull(r.checked());
        Path wav = temp.resolve("fd-4000.wav");
        java.io.StringWriter out = new java.io.StringWriter();
        java.io.StringWriter err = new java.io.StringWriter();
        int code = limen.cli.LimenCli.execute(new java.io.PrintWriter(out), new java.io.PrintWriter(err), "render",
                fx.workspace.resolve("frequency-discrimination.battery").toString(), "--step", "fd-4000", "--value",
                "5", "--target-interval", "1", "--bits", "24", "--out", wav.toString());
        assertEquals(0, code, err.toString());
        limen.signal.WavData data = limen.signal.WavFiles.read(wav);
        assertEquals(r.stimulus().length(), data.length(), "same layout: lead-in, intervals, ISI, trail");
        double lsb = Math.pow(2, -23); // 24-bit samples: the WAV differs from the preview by at most half a step
        for (int c = 0; c < 2; c++) {
            double[] mine = r.stimulus().channel(c);
            double[] theirs = data.channel(c);
            for (int n = 0; n < mine.length; n++) {
                if (Math.abs(mine[n] - theirs[n]) > lsb) {
                    throw new AssertionError("channel " + c + " sample " + n + ": preview " + mine[n] + ", render "
                            + theirs[n]);
                }
            }
        }
        assertTrue(r.intervals().get(0).target());
        assertEquals(4000 * 1.05, r.intervals().get(0).dominantFrequencyHz(), 0.05, "target first: 4200 Hz");
        assertEquals(4000, r.intervals().get(1).dominantFrequencyHz(), 0.05);
    }

    @Test
    void guardRefusesAboveTheCeilingAndPlayIsOff() throws Exception {
        Step step = editor.document().battery().getSteps().get(0);
        editor.select(step);
        Field level = editor.form().field(step.getStimulus().getStandardLevel(), Literals.ABSOLUTE_LEVEL__LEVEL_DB_SPL);
        assertEquals("dB SPL", level.unit());
        assertTrue(level.enter("92"));
        preview.render();
        TrialPreview.Result r = preview.result();
        assertNotNull(r);
        assertNull(r.checked());
        assertTrue(r.refusal().contains("92.00 dB SPL") && r.refusal().contains("allowed 85.00 dB SPL"), r.refusal());
        assertFalse(preview.playEnabled());
        assertEquals("the safety guard refused this trial", preview.playReason());
        assertTrue(editor.problems().stream().anyMatch(p -> p.code().number() == 211), "and the validator says so");
        fx.pump(300);
        Screenshots.save(fx.shell, "preview-refused");
    }
}
