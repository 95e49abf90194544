package limen.psychometric;

import java.math.BigDecimal;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Text form of a model listener's psychometric function, as the procedures and simulation use it:
 * <pre>
 *   logistic:mid=M,scale=S     F(x) = 1/(1 + exp(−(x − M)/S))
 *   normal:mid=M,sd=S          F(x) = Φ((x − M)/S)
 *   weibull:alpha=A,beta=B     F(x) = 1 − exp(−(x/A)^B), x &gt; 0
 *   gumbel:mid=M,scale=S       F(x) = 1 − exp(−exp((x − M)/S))
 * </pre>
 * each optionally followed by {@code ,lapse=L} (default 0). The guess rate is not part of the
 * spec: it comes from the task (1/n for n-alternative forced choice). Family and key names are
 * case-insensitive; blanks around names, values and separators are ignored; every key must appear
 * exactly once (lapse at most once).
 */
public final class ListenerSpec {

    private ListenerSpec() {
    }

    /**
     * @param spec  for example {@code "weibull:alpha=2.5,beta=3,lapse=0.02"}
     * @param guess the guess rate γ from the task
     * @return the psychometric function
     * @throws IllegalArgumentException naming the bad part of the spec
     */
    public static PsychometricFunction parse(String spec, double guess) {
        if (spec == null || spec.isBlank()) {
            throw new IllegalArgumentException("empty listener spec; expected e.g. 'logistic:mid=0,scale=1'");
        }
        int colon = spec.indexOf(':');
        if (colon < 0) {
            throw new IllegalArgumentException("listener spec '" + spec + "' lacks ':' after the family name; expected e.g. 'logistic:mid=0,scale=1'");
        }
        Sigmoid sigmoid;
        try {
            sigmoid = Sigmoids.byName(spec.substring(0, colon));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("listener spec '" + spec + "': " + e.getMessage(), e);
        }
        Map<String, Double> values = new LinkedHashMap<>();
        for (String part : spec.substring(colon + 1).split(",", -1)) {
            int eq = part.indexOf('=');
            if (eq < 0) {
                throw new IllegalArgumentException("listener spec '" + spec + "': part '" + part.trim() + "' is not key=value");
            }
            String key = part.substring(0, eq).trim().toLowerCase(java.util.Locale.ROOT);
            String text = part.substring(eq + 1).trim();
            if (!key.equals(sigmoid.locationName()) && !key.equals(sigmoid.spreadName()) && !key.equals("lapse")) {
                throw new IllegalArgumentException("listener spec '" + spec + "': unknown key '" + key + "' for " + sigmoid.name()
                        + "; expected " + sigmoid.locationName() + ", " + sigmoid.spreadName() + " and optionally lapse");
            }
            double v;
            try {
                v = Double.parseDouble(text);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("listener spec '" + spec + "': value of " + key + " '" + text + "' is not a number", e);
            }
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("listener spec '" + spec + "': value of " + key + " must be finite, was " + text);
            }
            if (values.put(key, v) != null) {
                throw new IllegalArgumentException("listener spec '" + spec + "': key '" + key + "' given twice");
            }
        }
        Double location = values.get(sigmoid.locationName());
        Double spread = values.get(sigmoid.spreadName());
        if (location == null || spread == null) {
            throw new IllegalArgumentException("listener spec '" + spec + "': missing " + (location == null ? sigmoid.locationName() : sigmoid.spreadName()));
        }
        double lapse = values.getOrDefault("lapse", 0.0);
        try {
            return new PsychometricFunction(sigmoid, location, spread, guess, lapse);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("listener spec '" + spec + "': " + e.getMessage(), e);
        }
    }

    /**
     * @return the spec of f, e.g. {@code "logistic:mid=40,scale=2.5,lapse=0.02"}; lapse written only when
     *         non-zero, numbers in the shortest form that parses back to the same double; the guess rate is
     *         not written
     */
    public static String format(PsychometricFunction f) {
        Sigmoid s = f.sigmoid();
        StringBuilder b = new StringBuilder(s.name()).append(':')
                .append(s.locationName()).append('=').append(number(f.location())).append(',')
                .append(s.spreadName()).append('=').append(number(f.spread()));
        if (f.lapse() != 0) {
            b.append(",lapse=").append(number(f.lapse()));
        }
        return b.toString();
    }

    /** Shortest round-trip decimal without exponent (BigDecimal.valueOf uses Double.toString's digits). */
    static String number(double v) {
        if (v == 0) {
            return "0";
        }
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
