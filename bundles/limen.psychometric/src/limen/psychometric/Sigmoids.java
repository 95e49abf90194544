package limen.psychometric;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import limen.core.extension.Extensions;

/**
 * The built-in sigmoid families. With z = (x − M)/S:
 * <ul>
 * <li>{@link #LOGISTIC} {@code logistic:mid=M,scale=S}: F(x) = 1 / (1 + exp(−(x − M)/S)); F(M) = 1/2,
 * dF/dx at M = 1/(4S).</li>
 * <li>{@link #NORMAL} {@code normal:mid=M,sd=S}: F(x) = Φ((x − M)/S), Φ the standard normal
 * cumulative distribution; F(M) = 1/2.</li>
 * <li>{@link #WEIBULL} {@code weibull:alpha=A,beta=B}: F(x) = 1 − exp(−(x/A)^B) for x &gt; 0 and
 * F(x) = 0 for x &le; 0; A &gt; 0, B &gt; 0; F(A) = 1 − 1/e.</li>
 * <li>{@link #GUMBEL} {@code gumbel:mid=M,scale=S}: F(x) = 1 − exp(−exp((x − M)/S)), the
 * log-Weibull (Gumbel for minima, rising): weibull(x; A, B) = gumbel(ln x; ln A, 1/B), and
 * F(M) = 1 − 1/e.</li>
 * </ul>
 * These are the forms written by the model-listener specs of {@link ListenerSpec}.
 */
public final class Sigmoids {

    /** F(x) = 1 / (1 + exp(−(x − mid)/scale)). */
    public static final Sigmoid LOGISTIC = new LogisticSigmoid();
    /** F(x) = Φ((x − mid)/sd). */
    public static final Sigmoid NORMAL = new NormalSigmoid();
    /** F(x) = 1 − exp(−(x/alpha)^beta), x &gt; 0; 0 otherwise. */
    public static final Sigmoid WEIBULL = new WeibullSigmoid();
    /** F(x) = 1 − exp(−exp((x − mid)/scale)). */
    public static final Sigmoid GUMBEL = new GumbelSigmoid();

    private static final List<Sigmoid> BUILT_INS = List.of(LOGISTIC, NORMAL, WEIBULL, GUMBEL);

    private Sigmoids() {
    }

    /**
     * Looks a family up among the installed ones ({@link Extensions}: the built-ins below and any lab's, each
     * registered through {@code META-INF/services/limen.psychometric.Sigmoid} and an {@code OSGI-INF}
     * component). For a built-in the constant of this class is returned, so identity checks against it hold.
     *
     * @param name a family name, case-insensitive, surrounding blanks ignored
     * @return the installed family of that name
     * @throws IllegalArgumentException for an unknown name, listing the installed ones
     */
    public static Sigmoid byName(String name) {
        if (name != null) {
            String key = name.trim().toLowerCase(Locale.ROOT);
            Optional<Sigmoid> found = Extensions.find(Sigmoid.class, key, Sigmoid::name);
            if (found.isPresent()) {
                for (Sigmoid s : BUILT_INS) {
                    if (s.getClass() == found.get().getClass()) {
                        return s;
                    }
                }
                return found.get();
            }
        }
        throw new IllegalArgumentException("unknown psychometric family '" + name + "'; installed: "
                + Extensions.ids(Sigmoid.class, Sigmoid::name));
    }

    /** @return every installed family, built-in or contributed, in the registry's order (unmodifiable) */
    public static List<Sigmoid> installed() {
        return Extensions.all(Sigmoid.class);
    }

    /** @return the built-in families in the order logistic, normal, weibull, gumbel (unmodifiable) */
    public static List<Sigmoid> builtIns() {
        return BUILT_INS;
    }

    static void checkProportion(Sigmoid s, double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException(s.name() + ": inverse needs 0 < p < 1, was " + p);
        }
    }
}
