package limen.ui.analysis.internal;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

import limen.fit.BinomialData;
import limen.fit.ConfidenceInterval;
import limen.fit.FitResult;
import limen.fit.IntervalMethod;
import limen.psychometric.PsychometricFunction;
import limen.session.refit.ConditionSummary;
import limen.session.refit.CurveBand;
import limen.session.refit.TrackData;
import limen.session.refit.TrackFit;

/** The Analysis work area's charts (JFreeChart), in one plain style. */
public final class Charts {

    private static final Font SMALL = new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 12);
    private static final Color CORRECT = new Color(30, 130, 60);
    private static final Color WRONG = new Color(200, 40, 40);
    private static final Color LINE = new Color(150, 150, 150);
    private static final Color REVERSAL = new Color(230, 140, 0);
    private static final Color CURVE = new Color(30, 90, 180);
    private static final Color[] SERIES = {new Color(30, 90, 180), new Color(210, 100, 20), new Color(40, 150, 70),
        new Color(150, 60, 160), new Color(120, 120, 120), new Color(0, 150, 160)};

    private Charts() {
    }

    private static JFreeChart styled(String title, XYPlot plot, boolean legend) {
        plot.setBackgroundPaint(new Color(250, 250, 250));
        plot.setDomainGridlinePaint(new Color(215, 215, 215));
        plot.setRangeGridlinePaint(new Color(215, 215, 215));
        for (ValueAxis a : new ValueAxis[] {plot.getDomainAxis(), plot.getRangeAxis()}) {
            a.setLabelFont(SMALL);
            a.setTickLabelFont(SMALL);
        }
        JFreeChart chart = new JFreeChart(title, TITLE, plot, legend);
        chart.setBackgroundPaint(Color.WHITE);
        if (chart.getLegend() != null) {
            chart.getLegend().setItemFont(SMALL);
        }
        return chart;
    }

    private static ValueAxis valueAxis(String label, boolean log) {
        if (log) {
            PlainLogAxis a = new PlainLogAxis(label);
            a.setLowerMargin(0.06);
            a.setUpperMargin(0.06);
            return a;
        }
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    private static String valueLabel(TrackData d) {
        return "value" + (d.unit().isEmpty() ? "" : " (" + d.unit() + ")");
    }

    /**
     * The track trial by trial: presented values joined by a line, correct answers as filled green circles,
     * incorrect ones as red crosses, reversals ringed in orange; the fitted threshold and the reversal mean
     * as horizontal lines.
     */
    public static JFreeChart track(TrackFit t) {
        TrackData d = t.data();
        double[] v = d.values();
        boolean[] c = d.correct();
        XYSeries path = new XYSeries("values", false, true);
        XYSeries right = new XYSeries("correct", false, true);
        XYSeries wrong = new XYSeries("incorrect", false, true);
        XYSeries turns = new XYSeries("reversal", false, true);
        for (int i = 0; i < v.length; i++) {
            path.add(i + 1, v[i]);
            (c[i] ? right : wrong).add(i + 1, v[i]);
        }
        for (int i : d.reversalIndices()) {
            turns.add(i + 1, v[i]);
        }
        XYSeriesCollection data = new XYSeriesCollection();
        data.addSeries(path);
        data.addSeries(right);
        data.addSeries(wrong);
        data.addSeries(turns);
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
        r.setSeriesLinesVisible(0, true);
        r.setSeriesShapesVisible(0, false);
        r.setSeriesPaint(0, LINE);
        r.setSeriesVisibleInLegend(0, false);
        r.setSeriesLinesVisible(1, false);
        r.setSeriesShape(1, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
        r.setSeriesPaint(1, CORRECT);
        r.setSeriesLinesVisible(2, false);
        r.setSeriesShape(2, cross(4));
        r.setSeriesShapesFilled(2, false);
        r.setSeriesStroke(2, new BasicStroke(1.6f));
        r.setSeriesPaint(2, WRONG);
        r.setSeriesLinesVisible(3, false);
        r.setSeriesShape(3, new Ellipse2D.Double(-7, -7, 14, 14));
        r.setSeriesShapesFilled(3, false);
        r.setSeriesPaint(3, REVERSAL);
        r.setSeriesStroke(3, new BasicStroke(1.6f));
        NumberAxis trials = new NumberAxis("trial");
        trials.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYPlot plot = new XYPlot(data, trials, valueAxis(valueLabel(d), d.logScale() && allPositive(v)), r);
        if (t.fit() != null && Double.isFinite(t.fit().threshold())) {
            plot.addRangeMarker(label(new ValueMarker(t.fit().threshold(), CURVE, new BasicStroke(1.2f)),
                    String.format(Locale.ROOT, "fitted threshold %.4g", t.fit().threshold()), false));
        }
        if (Double.isFinite(t.reversalMean())) {
            plot.addRangeMarker(label(new ValueMarker(t.reversalMean(), REVERSAL, dashed()),
                    String.format(Locale.ROOT, "reversal mean %.4g", t.reversalMean()), true));
        }
        int reversals = d.reversalIndices().length;
        return styled("Step " + d.stepId() + ", track " + d.track() + ": " + d.trials() + " trials, " + reversals + " reversals"
                + (d.discardedReversals() > 0 ? " (first " + Math.min(reversals, d.discardedReversals()) + " not averaged)" : ""),
                plot, true);
    }

    /**
     * The psychometric fit: pooled proportions correct as circles whose area grows with the trials at that
     * value, the fitted ψ with its pointwise bootstrap band, the threshold as a vertical line (its bootstrap
     * interval shaded) and the target proportion as a horizontal line.
     */
    public static JFreeChart fit(TrackFit t, CurveBand band, IntervalMethod method) {
        TrackData d = t.data();
        FitResult f = t.fit();
        BinomialData cells = f == null ? d.pooled() : f.data();
        boolean log = d.logScale() && allPositive(cells.values());
        int maxTrials = 1;
        for (int i = 0; i < cells.size(); i++) {
            maxTrials = Math.max(maxTrials, cells.trials(i));
        }
        XYSeries points = new XYSeries("proportion correct (area ~ trials)", false, true);
        for (int i = 0; i < cells.size(); i++) {
            points.add(cells.value(i), cells.proportion(i));
        }
        XYSeriesCollection pointData = new XYSeriesCollection(points);
        final BinomialData shapesOf = cells;
        final int largest = maxTrials;
        XYLineAndShapeRenderer pr = new XYLineAndShapeRenderer(false, true) {
            private static final long serialVersionUID = 1L;

            @Override
            public Shape getItemShape(int series, int item) {
                // area proportional to the trials: diameter ~ sqrt(n), 4 to 22 pixels
                double dia = 4 + 18 * Math.sqrt((double) shapesOf.trials(item) / largest);
                return new Ellipse2D.Double(-dia / 2, -dia / 2, dia, dia);
            }
        };
        pr.setSeriesPaint(0, new Color(20, 20, 20, 170));
        NumberAxis psi = new NumberAxis("proportion correct");
        psi.setRange(Math.min(0, f == null ? 0 : f.function().guess()) - 0.02, 1.04);
        XYPlot plot = new XYPlot(pointData, valueAxis(valueLabel(d), log), psi, pr);
        if (f != null) {
            PsychometricFunction fn = f.function();
            double lo = cells.values()[0];
            double hi = cells.values()[cells.size() - 1];
            if (Double.isFinite(f.threshold())) {
                lo = Math.min(lo, f.threshold());
                hi = Math.max(hi, f.threshold());
            }
            YIntervalSeries curve = new YIntervalSeries("fit " + fn.sigmoid().name()
                    + (band == null ? "" : String.format(Locale.ROOT, ", %.0f%% band of %d replicates", band.level() * 100,
                            band.replicates())));
            double[] x = band != null ? band.x() : CurveBand.grid(lo, hi, 101, log);
            double[] bl = band != null ? band.lower() : null;
            double[] bu = band != null ? band.upper() : null;
            for (int i = 0; i < x.length; i++) {
                double y = fn.psi(x[i]);
                double l = bl == null || Double.isNaN(bl[i]) ? y : bl[i];
                double u = bu == null || Double.isNaN(bu[i]) ? y : bu[i];
                curve.add(x[i], y, l, u);
            }
            YIntervalSeriesCollection curveData = new YIntervalSeriesCollection();
            curveData.addSeries(curve);
            DeviationRenderer cr = new DeviationRenderer(true, false);
            cr.setSeriesPaint(0, CURVE);
            cr.setSeriesFillPaint(0, new Color(30, 90, 180));
            cr.setAlpha(0.2f);
            cr.setSeriesStroke(0, new BasicStroke(1.8f));
            plot.setDataset(1, curveData);
            plot.setRenderer(1, cr);
            plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
            if (Double.isFinite(f.threshold())) {
                // the threshold's bootstrap interval as a bar at the target proportion
                ConfidenceInterval ci = t.bootstrap() == null ? null : t.bootstrap().thresholdInterval(method);
                if (ci != null && ci.isDefined()) {
                    // on a log axis an interval reaching zero or below cannot be drawn: cut it at the axis and say so
                    boolean cut = log && !(ci.lower() > 0);
                    XYSeries bar = new XYSeries(String.format(Locale.ROOT, "threshold %.0f%% interval", ci.level() * 100)
                            + (cut ? String.format(Locale.ROOT, " (lower end %.3g, cut at the axis)", ci.lower()) : ""), false, true);
                    bar.add(cut ? logAxisLow(cells, f, ci) : ci.lower(), f.targetPsi());
                    bar.add(ci.upper(), f.targetPsi());
                    XYLineAndShapeRenderer br = new XYLineAndShapeRenderer(true, true);
                    br.setSeriesPaint(0, REVERSAL);
                    br.setSeriesStroke(0, new BasicStroke(3f));
                    br.setSeriesShape(0, new java.awt.geom.Rectangle2D.Double(-1.5, -6, 3, 12));
                    plot.setDataset(2, new XYSeriesCollection(bar));
                    plot.setRenderer(2, br);
                }
                ValueMarker m = new ValueMarker(f.threshold(), REVERSAL, new BasicStroke(1.2f));
                m.setLabel(String.format(Locale.ROOT, "threshold %.4g", f.threshold()));
                m.setLabelFont(SMALL);
                m.setLabelPaint(Color.DARK_GRAY);
                m.setLabelBackgroundColor(new Color(255, 255, 255, 200));
                m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
                m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
                plot.addDomainMarker(m);
            }
            plot.addRangeMarker(label(new ValueMarker(f.targetPsi(), LINE, dashed()),
                    String.format(Locale.ROOT, "target %.3g", f.targetPsi()), true));
        }
        if (log) {
            // a log axis spans the positive data and the threshold only; a bound at or below zero must not stretch it
            ConfidenceInterval ci = f == null || t.bootstrap() == null ? null : t.bootstrap().thresholdInterval(method);
            double low = logAxisLow(cells, f, ci);
            double high = cells.values()[cells.size() - 1];
            if (f != null && Double.isFinite(f.threshold()) && f.threshold() > 0) {
                high = Math.max(high, f.threshold());
            }
            if (ci != null && ci.isDefined() && ci.upper() > 0 && Double.isFinite(ci.upper())) {
                high = Math.max(high, ci.upper());
            }
            plot.getDomainAxis().setRange(low, high * 1.25);
        }
        return styled("Psychometric fit, step " + d.stepId() + " track " + d.track(), plot, true);
    }

    /** Lower end of a log value axis: below the smallest positive value, threshold and interval bound shown. */
    private static double logAxisLow(BinomialData cells, FitResult f, ConfidenceInterval ci) {
        double low = cells.values()[0];
        if (f != null && Double.isFinite(f.threshold()) && f.threshold() > 0) {
            low = Math.min(low, f.threshold());
        }
        if (ci != null && ci.isDefined() && ci.lower() > 0) {
            low = Math.min(low, ci.lower());
        }
        return low / 1.25;
    }

    /**
     * Thresholds by condition: one series per participant, x the standard frequency, y the relative difference
     * limen Δf/f (or the threshold in its unit when the steps have no relative form), both on log axes, with
     * bootstrap intervals as error bars.
     */
    public static JFreeChart summary(List<ConditionSummary.Point> points) {
        boolean relative = !points.isEmpty() && points.stream().allMatch(p -> Double.isFinite(p.relative()));
        Map<String, YIntervalSeries> byParticipant = new LinkedHashMap<>();
        String unit = points.isEmpty() ? "" : points.get(0).unit();
        for (ConditionSummary.Point p : points) {
            double y = relative ? p.relative() : p.threshold();
            double lo = relative ? p.relativeLow() : p.thresholdLow();
            double hi = relative ? p.relativeHigh() : p.thresholdHigh();
            if (!(p.standardFrequencyHz() > 0) || !(y > 0)) {
                continue;
            }
            byParticipant.computeIfAbsent(p.participant(), k -> new YIntervalSeries(k, false, true))
                    .add(p.standardFrequencyHz(), y, lo > 0 ? lo : y, hi > 0 ? hi : y);
        }
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        byParticipant.values().forEach(data::addSeries);
        XYErrorRenderer r = new XYErrorRenderer();
        r.setDrawXError(false);
        r.setDefaultLinesVisible(false);
        r.setCapLength(6);
        for (int i = 0; i < data.getSeriesCount(); i++) {
            r.setSeriesPaint(i, SERIES[i % SERIES.length]);
            r.setSeriesShape(i, new Ellipse2D.Double(-4, -4, 8, 8));
        }
        ValueAxis x = valueAxis("standard frequency (Hz)", true);
        ValueAxis y = valueAxis(relative ? "relative difference limen \u0394f/f" : "threshold (" + unit + ")", true);
        XYPlot plot = new XYPlot(data, x, y, r);
        return styled(relative ? "Frequency difference limens by standard frequency" : "Thresholds by standard frequency",
                plot, true);
    }

    private static ValueMarker label(ValueMarker m, String text, boolean below) {
        m.setLabel(text);
        m.setLabelFont(SMALL);
        m.setLabelPaint(Color.DARK_GRAY);
        m.setLabelBackgroundColor(new Color(255, 255, 255, 200));
        // one label above its line at the left, the other below its line at the right, so close lines stay legible
        m.setLabelAnchor(below ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(below ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_LEFT);
        return m;
    }

    private static BasicStroke dashed() {
        return new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f);
    }

    private static Shape cross(double r) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(-r, -r);
        p.lineTo(r, r);
        p.moveTo(-r, r);
        p.lineTo(r, -r);
        return p;
    }

    private static boolean allPositive(double[] v) {
        for (double x : v) {
            if (!(x > 0)) {
                return false;
            }
        }
        return v.length > 0;
    }
}
