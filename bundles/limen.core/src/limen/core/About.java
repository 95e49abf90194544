package limen.core;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Optional;
import java.util.jar.Manifest;

/**
 * What Limen says about itself: its version, when it was built, and the cautions every entry point shows.
 * <p>
 * The version comes from this bundle's {@code Bundle-Version}. The build replaces the {@code qualifier}
 * with a UTC timestamp {@code yyyyMMddHHmm}, which is read back as the build date; a development build
 * (compiled outside Tycho) keeps the literal qualifier and reports no build date.
 */
public final class About {

    /** The product name, as shown in window titles and command output. */
    public static final String PRODUCT_NAME = "Limen";

    /**
     * The research-use caution. Shown by {@code limen --version}, the About dialog, the booth preflight and
     * every command that renders or plays sound.
     */
    public static final String RESEARCH_CAUTION =
            "Research software, not a clinical audiometer: do not use it for diagnosis. "
            + "Sound can damage hearing: present levels only within your lab's ethics approval, local regulations "
            + "and licensed audiological practice; the calibration's ceiling is enforced but is only as good as the "
            + "calibration.";

    private static final DateTimeFormatter QUALIFIER = DateTimeFormatter.ofPattern("yyyyMMddHHmm");

    private final String bundleVersion;

    private About(String bundleVersion) {
        this.bundleVersion = bundleVersion;
    }

    /** Reads this bundle's manifest (works in OSGi and on a plain classpath). */
    public static About current() {
        return new About(readBundleVersion().orElse("0.0.0.unknown"));
    }

    /** For tests and tools: an {@code About} for a given {@code Bundle-Version} string. */
    public static About forBundleVersion(String bundleVersion) {
        return new About(bundleVersion);
    }

    /** The full bundle version, e.g. {@code 0.1.0.202612012305}. */
    public String bundleVersion() {
        return bundleVersion;
    }

    /** The release part of the version, e.g. {@code 0.1.0}. */
    public String version() {
        String[] parts = bundleVersion.split("\\.");
        return parts.length >= 3 ? parts[0] + "." + parts[1] + "." + parts[2] : bundleVersion;
    }

    /** The build time (UTC) encoded in the qualifier, or empty for a development build. */
    public Optional<LocalDateTime> buildTime() {
        String[] parts = bundleVersion.split("\\.");
        if (parts.length < 4) {
            return Optional.empty();
        }
        try {
            return Optional.of(LocalDateTime.parse(parts[3], QUALIFIER));
        } catch (DateTimeParseException e) {
            return Optional.empty();
        }
    }

    /** e.g. {@code 2026-12-01 23:05 UTC}, or {@code development build}. */
    public String buildDateText() {
        return buildTime().map(t -> t.format(DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm")) + " UTC")
                .orElse("development build");
    }

    /** The Java runtime that runs this process, e.g. {@code 17.0.15 (Debian)}. */
    public static String javaVersionText() {
        return System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")";
    }

    /** The lines {@code limen --version} prints and the About dialog shows. */
    public String versionText() {
        return PRODUCT_NAME + " " + version() + "\n"
                + "build: " + buildDateText() + " (" + bundleVersion + ")\n"
                + "java: " + javaVersionText() + "\n"
                + "caution: " + RESEARCH_CAUTION;
    }

    private static Optional<String> readBundleVersion() {
        // The manifest of the jar or bundle that holds this class: derive its URL from the class's own URL,
        // because a plain getResource("/META-INF/MANIFEST.MF") may answer another jar's manifest.
        URL self = About.class.getResource("About.class");
        if (self == null) {
            return Optional.empty();
        }
        String text = self.toString();
        String suffix = "limen/core/About.class";
        if (!text.endsWith(suffix)) {
            return Optional.empty();
        }
        String base = text.substring(0, text.length() - suffix.length());
        // a development build compiles into bin/ or a temporary folder: look one level up for META-INF too
        for (String candidate : new String[] {base + "META-INF/MANIFEST.MF", base + "../META-INF/MANIFEST.MF"}) {
            try (InputStream in = new URL(candidate).openStream()) {
                String version = new Manifest(in).getMainAttributes().getValue("Bundle-Version");
                if (version != null) {
                    return Optional.of(version.trim());
                }
            } catch (IOException e) {
                // try the next candidate
            }
        }
        return Optional.empty();
    }
}
