package limen.core;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDateTime;

import org.junit.jupiter.api.Test;

class AboutTest {

    @Test
    void qualifierIsReadAsBuildTime() {
        About about = About.forBundleVersion("0.1.0.202612012305");
        assertEquals("0.1.0", about.version());
        assertEquals(LocalDateTime.of(2026, 12, 1, 23, 5), about.buildTime().orElseThrow());
        assertEquals("2026-12-01 23:05 UTC", about.buildDateText());
    }

    @Test
    void developmentBuildHasNoBuildTime() {
        About about = About.forBundleVersion("0.1.0.qualifier");
        assertFalse(about.buildTime().isPresent());
        assertEquals("development build", about.buildDateText());
    }

    @Test
    void versionTextCarriesVersionJavaAndCaution() {
        String text = About.forBundleVersion("0.1.0.202612012305").versionText();
        assertTrue(text.startsWith("Limen 0.1.0\n"), text);
        assertTrue(text.contains("java: " + System.getProperty("java.version")), text);
        assertTrue(text.contains("not a clinical audiometer"), text);
        assertTrue(text.contains("ethics approval"), text);
    }
}
