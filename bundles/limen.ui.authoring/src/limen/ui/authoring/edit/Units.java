package limen.ui.authoring.edit;

import java.math.BigDecimal;
import java.util.Locale;

import limen.model.QuantityUnit;
import limen.model.Scale;
import limen.model.Step;

/** Unit labels and number formatting of the settings form. */
public final class Units {

    private Units() {
    }

    /**
     * @return a number as the form shows it: at most 9 significant digits, no trailing zeros, no exponent for
     *         ordinary magnitudes (so that 0.05 stays "0.05" and 4000.0 reads "4000")
     */
    public static String format(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        BigDecimal d = new BigDecimal(v).round(new java.math.MathContext(9)).stripTrailingZeros();
        return Math.abs(v) >= 1e-4 && Math.abs(v) < 1e9 ? d.toPlainString() : d.toString();
    }

    /** @return the printed unit of a varied quantity: Hz, %, cents, dB, dB SPL */
    public static String of(QuantityUnit unit) {
        if (unit == null) {
            return "";
        }
        return switch (unit) {
            case HZ -> "Hz";
            case PERCENT -> "%";
            case CENTS -> "cents";
            case DB -> "dB";
            case DB_SPL -> "dB SPL";
        };
    }

    /** @return the unit of the varied quantity of a step ("" when unknown) */
    public static String quantity(Step step) {
        return step == null || step.getVariedQuantity() == null ? "" : of(step.getVariedQuantity().getUnit());
    }

    /**
     * @return the unit of the model-based procedures' axis: the quantity itself on a LINEAR scale, decibels of the
     *         value (20 log10) on a LOG scale
     */
    public static String axis(Step step) {
        if (step != null && step.getVariedQuantity() != null && step.getVariedQuantity().getScale() == Scale.LOG) {
            return "dB of value";
        }
        return quantity(step);
    }

    /** @return a string with the first letter upper case */
    public static String capitalised(String s) {
        return s.isEmpty() ? s : s.substring(0, 1).toUpperCase(Locale.ROOT) + s.substring(1);
    }
}
