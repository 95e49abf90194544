package limen.core.extension;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

/**
 * Named, typed settings handed to an extension: what a battery's settings group holds for a contributed
 * procedure or stimulus design, and what the model's own elements hold for the built-in ones (every attribute
 * under its model name, see {@code limen.session.build.ModelSettings}). Immutable.
 * <p>
 * Values are text, integers (long), reals (finite double), booleans, or lists of reals. An integer is also
 * accepted where a real is asked for. Every getter throws {@link IllegalArgumentException} naming the setting
 * when it is missing or of another type, so a provider can state its needs with one call per setting and the
 * message reaches the author as it is.
 */
public final class Settings {

    private static final Settings EMPTY = new Settings(Map.of());

    private final Map<String, Object> values;

    private Settings(Map<String, Object> values) {
        this.values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** @return settings with no entries */
    public static Settings empty() {
        return EMPTY;
    }

    /** @return a builder of settings */
    public static Builder builder() {
        return new Builder();
    }

    /** @return the names, in the order given */
    public Set<String> names() {
        return values.keySet();
    }

    /** @return whether a value of this name is given */
    public boolean has(String name) {
        return values.containsKey(name);
    }

    /** @return the value as a real; an integer setting is widened */
    public double real(String name) {
        Object v = get(name);
        if (v instanceof Double d) {
            return d;
        }
        if (v instanceof Long l) {
            return l;
        }
        throw wrongType(name, v, "a real number");
    }

    /** @return the real, or {@code fallback} when the setting is not given */
    public double real(String name, double fallback) {
        return has(name) ? real(name) : fallback;
    }

    /**
     * @return the value as an int
     * @throws IllegalArgumentException also when the integer does not fit an int
     */
    public int integer(String name) {
        Object v = get(name);
        if (v instanceof Long l) {
            if (l < Integer.MIN_VALUE || l > Integer.MAX_VALUE) {
                throw new IllegalArgumentException("setting '" + name + "' = " + l + " is out of the integer range");
            }
            return (int) (long) l;
        }
        throw wrongType(name, v, "an integer");
    }

    /** @return the int, or {@code fallback} when the setting is not given */
    public int integer(String name, int fallback) {
        return has(name) ? integer(name) : fallback;
    }

    /** @return the value as a boolean */
    public boolean bool(String name) {
        Object v = get(name);
        if (v instanceof Boolean b) {
            return b;
        }
        throw wrongType(name, v, "true or false");
    }

    /** @return the boolean, or {@code fallback} when the setting is not given */
    public boolean bool(String name, boolean fallback) {
        return has(name) ? bool(name) : fallback;
    }

    /** @return the value as text (text settings only) */
    public String text(String name) {
        Object v = get(name);
        if (v instanceof String s) {
            return s;
        }
        throw wrongType(name, v, "text");
    }

    /** @return the text, or {@code fallback} when the setting is not given */
    public String text(String name, String fallback) {
        return has(name) ? text(name) : fallback;
    }

    /** @return a copy of a list of reals */
    public double[] reals(String name) {
        Object v = get(name);
        if (v instanceof double[] a) {
            return a.clone();
        }
        throw wrongType(name, v, "a list of real numbers");
    }

    /** @return these settings with those of {@code more} added; a name given in both is refused */
    public Settings plus(Settings more) {
        Map<String, Object> all = new LinkedHashMap<>(values);
        for (Map.Entry<String, Object> e : more.values.entrySet()) {
            if (all.putIfAbsent(e.getKey(), e.getValue()) != null) {
                throw new IllegalArgumentException("setting '" + e.getKey() + "' is given twice");
            }
        }
        return new Settings(all);
    }

    private Object get(String name) {
        Object v = values.get(name);
        if (v == null) {
            throw new IllegalArgumentException("setting '" + name + "' is missing");
        }
        return v;
    }

    private static IllegalArgumentException wrongType(String name, Object v, String wanted) {
        String shown = v instanceof double[] a ? java.util.Arrays.toString(a) : String.valueOf(v);
        return new IllegalArgumentException("setting '" + name + "' = " + shown + " is not " + wanted);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Settings other) || !other.values.keySet().equals(values.keySet())) {
            return false;
        }
        for (Map.Entry<String, Object> e : values.entrySet()) {
            Object w = other.values.get(e.getKey());
            boolean same = e.getValue() instanceof double[] a ? w instanceof double[] b && java.util.Arrays.equals(a, b)
                    : e.getValue().equals(w);
            if (!same) {
                return false;
            }
        }
        return true;
    }

    @Override
    public int hashCode() {
        return values.keySet().hashCode();
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("{");
        values.forEach((k, v) -> b.append(b.length() > 1 ? ", " : "").append(k).append('=')
                .append(v instanceof double[] a ? java.util.Arrays.toString(a) : v));
        return b.append('}').toString();
    }

    /** Collects settings; each name at most once. */
    public static final class Builder {
        private final Map<String, Object> values = new LinkedHashMap<>();

        private Builder() {
        }

        private Builder put(String name, Object value) {
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("a setting needs a non-blank name, was '" + name + "'");
            }
            if (values.putIfAbsent(name, value) != null) {
                throw new IllegalArgumentException("setting '" + name + "' is given twice");
            }
            return this;
        }

        /** Adds a finite real. */
        public Builder real(String name, double value) {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("setting '" + name + "' must be finite, was " + value);
            }
            return put(name, value);
        }

        /** Adds an integer. */
        public Builder integer(String name, long value) {
            return put(name, value);
        }

        /** Adds a boolean. */
        public Builder bool(String name, boolean value) {
            return put(name, value);
        }

        /** Adds text. */
        public Builder text(String name, String value) {
            if (value == null) {
                throw new IllegalArgumentException("setting '" + name + "' needs a text, was null");
            }
            return put(name, value);
        }

        /** Adds a list of finite reals (copied). */
        public Builder reals(String name, double... value) {
            for (double v : value) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("setting '" + name + "' must hold finite numbers, had " + v);
                }
            }
            return put(name, value.clone());
        }

        /** @return the settings */
        public Settings build() {
            return new Settings(values);
        }
    }
}
