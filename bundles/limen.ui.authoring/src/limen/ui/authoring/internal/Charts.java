package limen.ui.authoring.internal;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.statistics.HistogramDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import limen.procedure.TrialOutcome;
import limen.ui.authoring.preview.TrialPreview;

/** The work area's charts (JFreeChart), in one plain style. */
public final class Charts {

    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 12);
    private static final Color[] SERIES = {new Color(30, 100, 190), new Color(210, 100, 20), new Color(40, 150, 70),
        new Color(150, 60, 160)};

    private Charts() {
    }

    private static JFreeChart styled(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.getTitle().setFont(TITLE);
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(SMALL);
        }
        XYPlot plot = chart.getXYPlot();
        plot.setBackgroundPaint(new Color(250, 250, 250));
        plot.setDomainGridlinePaint(new Color(215, 215, 215));
        plot.setRangeGridlinePaint(new Color(215, 215, 215));
        plot.getDomainAxis().setLabelFont(SMALL);
        plot.getRangeAxis().setLabelFont(SMALL);
        plot.getDomainAxis().setTickLabelFont(SMALL);
        plot.getRangeAxis().setTickLabelFont(SMALL);
        return chart;
    }

    /**
     * The trial's waveform (min/max per column, so that 10^5 samples draw as a few thousand points) with its
     * intervals shaded.
     */
    public static JFreeChart waveform(TrialPreview.Result r, int columns) {
        int channel = r.channel();
        double fs = r.stimulus().sampleRateHz();
        int n = r.stimulus().length();
        XYSeries series = new XYSeries(channel == 0 ? "left" : "right", false, true);
        int per = Math.max(1, n / Math.max(100, columns));
        for (int start = 0; start < n; start += per) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int i = start; i < Math.min(n, start + per); i++) {
                double v = r.stimulus().sample(channel, i);
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
            series.add(start / fs, lo);
            series.add((start + per / 2.0) / fs, hi);
        }
        JFreeChart chart = styled(ChartFactory.createXYLineChart("Waveform, " + (channel == 0 ? "left" : "right")
                + " channel", "time (s)", "amplitude (full scale 1)", new XYSeriesCollection(series),
                PlotOrientation.VERTICAL, false, false, false));
        XYPlot plot = chart.getXYPlot();
        plot.getRenderer().setSeriesPaint(0, SERIES[0]);
        plot.getRenderer().setSeriesStroke(0, new BasicStroke(0.6f));
        for (TrialPreview.Interval i : r.intervals()) {
            IntervalMarker m = new IntervalMarker(i.onsetSeconds(), i.offsetSeconds());
            m.setPaint(i.target() ? new Color(255, 220, 170, 120) : new Color(200, 220, 255, 120));
            m.setLabel("interval " + (i.index() + 1) + (i.target() ? " (target)" : ""));
            m.setLabelFont(SMALL);
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            plot.addDomainMarker(m);
        }
        return chart;
    }

    /** Each interval's spectrum in dB SPL, zoomed around the components, with the dominant frequencies marked. */
    public static JFreeChart spectrum(TrialPreview.Result r) {
        XYSeriesCollection data = new XYSeriesCollection();
        double fMin = Double.POSITIVE_INFINITY;
        double fMax = 0;
        double peak = Double.NEGATIVE_INFINITY;
        for (TrialPreview.Interval i : r.intervals()) {
            if (i.frequencyHz().length == 0) {
                continue;
            }
            XYSeries s = new XYSeries(String.format(Locale.ROOT, "interval %d%s: peak %.1f Hz", i.index() + 1,
                    i.target() ? " (target)" : "", i.dominantFrequencyHz()), false, true);
            for (int k = 0; k < i.frequencyHz().length; k++) {
                s.add(i.frequencyHz()[k], i.levelDbSpl()[k]);
            }
            data.addSeries(s);
            fMin = Math.min(fMin, i.dominantFrequencyHz());
            fMax = Math.max(fMax, i.dominantFrequencyHz());
            peak = Math.max(peak, i.peakLevelDbSpl());
        }
        JFreeChart chart = styled(ChartFactory.createXYLineChart("Spectrum of each interval", "frequency (Hz)",
                "level (dB SPL)", data, PlotOrientation.VERTICAL, true, false, false));
        XYPlot plot = chart.getXYPlot();
        for (int s = 0; s < data.getSeriesCount(); s++) {
            plot.getRenderer().setSeriesPaint(s, SERIES[s % SERIES.length]);
            plot.getRenderer().setSeriesStroke(s, new BasicStroke(1.2f));
        }
        if (fMax > 0) {
            double span = Math.max(fMax - fMin, fMin * 0.05);
            plot.getDomainAxis().setRange(Math.max(0, fMin - 3 * span), fMax + 3 * span);
            plot.getRangeAxis().setRange(peak - 70, peak + 6);
            for (TrialPreview.Interval i : r.intervals()) {
                if (i.frequencyHz().length > 0) {
                    ValueMarker m = new ValueMarker(i.dominantFrequencyHz(), new Color(120, 120, 120),
                            new BasicStroke(0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1, new float[] {3, 3},
                                    0));
                    plot.addDomainMarker(m);
                }
            }
        }
        return chart;
    }

    /** A histogram of one value per run, one series per track. */
    public static JFreeChart histogram(String title, String axis, List<String> names, List<double[]> values,
            boolean whole) {
        HistogramDataset data = new HistogramDataset();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] v : values) {
            for (double x : v) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        for (int s = 0; s < names.size(); s++) {
            double[] v = values.get(s);
            if (v.length == 0) {
                continue;
            }
            int bins = whole ? (int) Math.max(1, Math.min(40, hi - lo + 1)) : 24;
            double from = whole ? lo - 0.5 : lo;
            double to = whole ? from + Math.ceil((hi - lo + 1) / bins) * bins : hi > lo ? hi : lo + 1;
            data.addSeries(names.get(s), v, bins, from, to);
        }
        JFreeChart chart = styled(ChartFactory.createHistogram(title, axis, "runs", data, PlotOrientation.VERTICAL,
                names.size() > 1, false, false));
        XYPlot plot = chart.getXYPlot();
        XYBarRenderer bars = (XYBarRenderer) plot.getRenderer();
        bars.setShadowVisible(false);
        bars.setDrawBarOutline(false);
        bars.setBarPainter(new org.jfree.chart.renderer.xy.StandardXYBarPainter());
        for (int s = 0; s < names.size(); s++) {
            Color c = SERIES[s % SERIES.length];
            bars.setSeriesPaint(s, new Color(c.getRed(), c.getGreen(), c.getBlue(), 150));
        }
        plot.getRangeAxis().setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        return chart;
    }

    /** One track trial by trial: the value presented, correct answers as filled dots, wrong ones as squares. */
    public static JFreeChart exampleTrack(String title, String unit, List<TrialOutcome> trials, double estimate,
            double trueValue, boolean logScale) {
        XYSeries path = new XYSeries("value", false, true);
        XYSeries right = new XYSeries("correct", false, true);
        XYSeries wrong = new XYSeries("incorrect", false, true);
        for (int t = 0; t < trials.size(); t++) {
            TrialOutcome o = trials.get(t);
            path.add(t + 1, o.plan().value());
            (o.correct() ? right : wrong).add(t + 1, o.plan().value());
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(path);
        data.addSeries(right);
        data.addSeries(wrong);
        JFreeChart chart = styled(ChartFactory.createXYLineChart(title, "trial", "value (" + unit + ")", data,
                PlotOrientation.VERTICAL, true, false, false));
        XYPlot plot = chart.getXYPlot();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        r.setSeriesLinesVisible(0, true);
        r.setSeriesShapesVisible(0, false);
        r.setSeriesPaint(0, new Color(150, 150, 150));
        r.setSeriesLinesVisible(1, false);
        r.setSeriesShape(1, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        r.setSeriesPaint(1, new Color(40, 150, 70));
        r.setSeriesLinesVisible(2, false);
        r.setSeriesShape(2, new Rectangle2D.Double(-3.5, -3.5, 7, 7));
        r.setSeriesPaint(2, new Color(200, 40, 40));
        plot.setRenderer(r);
        boolean positive = trials.stream().allMatch(o -> o.plan().value() > 0);
        if (logScale && positive && !trials.isEmpty()) {
            LogAxis axis = new LogAxis("value (" + unit + ", log scale)");
            axis.setLabelFont(SMALL);
            axis.setTickLabelFont(SMALL);
            axis.setSmallestValue(1e-9);
            axis.setNumberFormatOverride(new java.text.DecimalFormat("0.###"));
            plot.setRangeAxis(axis);
        }
        if (Double.isFinite(estimate)) {
            ValueMarker m = new ValueMarker(estimate, new Color(30, 100, 190), new BasicStroke(1.2f));
            m.setLabel(String.format(Locale.ROOT, "estimate %.4g", estimate));
            m.setLabelFont(SMALL);
            m.setLabelPaint(new Color(30, 100, 190));
            m.setLabelBackgroundColor(new Color(255, 255, 255, 0));
            m.setLabelAnchor(RectangleAnchor.LEFT);
            m.setLabelTextAnchor(estimate >= trueValue ? TextAnchor.BOTTOM_LEFT : TextAnchor.TOP_LEFT);
            plot.addRangeMarker(m);
        }
        if (Double.isFinite(trueValue)) {
            ValueMarker m = new ValueMarker(trueValue, new Color(90, 90, 90), new BasicStroke(1f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_MITER, 1, new float[] {4, 3}, 0));
            m.setLabel(String.format(Locale.ROOT, "listener's true value %.4g", trueValue));
            m.setLabelFont(SMALL);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 0));
            m.setLabelAnchor(RectangleAnchor.RIGHT);
            m.setLabelTextAnchor(estimate >= trueValue ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT);
            plot.addRangeMarker(m);
        }
        return chart;
    }
}
