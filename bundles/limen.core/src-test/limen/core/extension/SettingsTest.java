package limen.core.extension;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Typed getters, defaults, and messages that name the setting. */
class SettingsTest {

    private final Settings s = Settings.builder().real("stepSize", 2).integer("downCount", 3).bool("blocked", true)
            .text("stepMode", "ADDITIVE").reals("values", 1, 2, 4).build();

    @Test
    void valuesComeBackAsTheirTypes() {
        assertEquals(2.0, s.real("stepSize"));
        assertEquals(3, s.integer("downCount"));
        assertEquals(3.0, s.real("downCount"), "an integer widens to a real");
        assertTrue(s.bool("blocked"));
        assertEquals("ADDITIVE", s.text("stepMode"));
        assertArrayEquals(new double[] {1, 2, 4}, s.reals("values"));
        assertEquals(List.of("stepSize", "downCount", "blocked", "stepMode", "values"), List.copyOf(s.names()));
        assertEquals(7.5, s.real("missing", 7.5));
        assertEquals(1, s.integer("missing", 1));
        assertFalse(s.has("missing"));
    }

    @Test
    void mistakesNameTheSettingAndItsValue() {
        assertEquals("setting 'upCount' is missing",
                assertThrows(IllegalArgumentException.class, () -> s.integer("upCount")).getMessage());
        assertEquals("setting 'stepSize' = 2.0 is not an integer",
                assertThrows(IllegalArgumentException.class, () -> s.integer("stepSize")).getMessage());
        assertEquals("setting 'stepMode' = ADDITIVE is not a real number",
                assertThrows(IllegalArgumentException.class, () -> s.real("stepMode")).getMessage());
        assertEquals("setting 'x' must be finite, was NaN",
                assertThrows(IllegalArgumentException.class, () -> Settings.builder().real("x", Double.NaN)).getMessage());
        assertEquals("setting 'stepSize' is given twice",
                assertThrows(IllegalArgumentException.class, () -> s.plus(Settings.builder().real("stepSize", 1).build()))
                        .getMessage());
        assertEquals("setting 'big' = 4294967296 is out of the integer range", assertThrows(IllegalArgumentException.class,
                () -> Settings.builder().integer("big", 1L << 32).build().integer("big")).getMessage());
    }

    @Test
    void listsAreCopiedAndEqualityIsByValue() {
        double[] values = s.reals("values");
        values[0] = 99;
        assertEquals(1.0, s.reals("values")[0]);
        Settings same = Settings.builder().real("stepSize", 2).integer("downCount", 3).bool("blocked", true)
                .text("stepMode", "ADDITIVE").reals("values", 1, 2, 4).build();
        assertEquals(s, same);
        assertEquals(s.hashCode(), same.hashCode());
        assertEquals(Settings.empty().plus(s), s);
    }
}
