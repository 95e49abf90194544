package limen.ui.analysis.internal;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;

/**
 * A base-10 log axis whose ticks sit at 1, 2 and 5 times a power of ten (every integer multiple when the
 * range is narrower than that gives), labelled as plain numbers, e.g. 0.1 0.2 0.5 1 2 or 500 1000 2000,
 * instead of the fractional powers the library's automatic log ticks choose.
 */
final class PlainLogAxis extends LogAxis {

    private static final long serialVersionUID = 1L;
    private static final int[] ONE_TWO_FIVE = {1, 2, 5};
    private static final int[] EVERY = {1, 2, 3, 4, 5, 6, 7, 8, 9};

    PlainLogAxis(String label) {
        super(label);
        setBase(10);
        setSmallestValue(1e-9);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        double lo = getLowerBound();
        double hi = getUpperBound();
        List ticks = ticks(lo, hi, ONE_TWO_FIVE, edge);
        if (ticks.size() < 4) {
            ticks = ticks(lo, hi, EVERY, edge);
        }
        return ticks;
    }

    private static List<NumberTick> ticks(double lo, double hi, int[] multiples, RectangleEdge edge) {
        List<NumberTick> out = new ArrayList<>();
        if (!(lo > 0) || !(hi > lo)) {
            return out;
        }
        boolean horizontal = RectangleEdge.isTopOrBottom(edge);
        TextAnchor anchor = horizontal ? (edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER : TextAnchor.TOP_CENTER)
                : (edge == RectangleEdge.LEFT ? TextAnchor.CENTER_RIGHT : TextAnchor.CENTER_LEFT);
        for (int k = (int) Math.floor(Math.log10(lo)); k <= (int) Math.ceil(Math.log10(hi)); k++) {
            for (int m : multiples) {
                double v = m * Math.pow(10, k);
                if (v >= lo && v <= hi) {
                    out.add(new NumberTick(TickType.MAJOR, v, label(v), anchor, anchor, 0));
                }
            }
        }
        return out;
    }

    /** Up to four significant digits without trailing zeros. */
    static String label(double v) {
        String s = String.format(Locale.ROOT, "%.4g", v);
        if (s.contains("e")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
