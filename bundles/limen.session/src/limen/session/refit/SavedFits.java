package limen.session.refit;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Properties;
import java.util.stream.Stream;

import limen.fit.FitSettings;

/**
 * Refits kept beside their session: {@code SESSION/fits/fit-yyyyMMdd-HHmmss-SSS-N.csv} holds the session's
 * {@link RefitTable} rows (the same columns as {@code ./limen refit}), and {@code fit-...-N.settings} beside
 * it the settings that produced them, one key per setting, so that the fit can be repeated. A saved fit is
 * never replaced: every save takes a new name, and each file appears complete or not at all (written to a
 * temporary file in the same folder, then hard-linked to its final name, which fails rather than replaces
 * when the name is taken). Nothing else in the session folder is touched.
 */
public final class SavedFits {

    /** Name of the folder inside a session folder. */
    public static final String FOLDER = "fits";
    /** Extension of the table of a saved fit. */
    public static final String TABLE_EXTENSION = ".csv";
    /** Extension of the settings of a saved fit. */
    public static final String SETTINGS_EXTENSION = ".settings";

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss-SSS", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /**
     * A saved fit read back.
     *
     * @param table    the table file
     * @param settings the settings it was made with
     * @param header   the column names of the table
     * @param rows     the rows, fields in {@code header} order
     */
    public record SavedFit(Path table, FitSettings settings, List<String> header, List<List<String>> rows) {

        public SavedFit {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
        }

        /** @return the field of a row by column name */
        public String field(List<String> row, String column) {
            int i = header.indexOf(column);
            if (i < 0) {
                throw new IllegalArgumentException("no column '" + column + "' in " + table);
            }
            return row.get(i);
        }
    }

    private SavedFits() {
    }

    /**
     * Saves a refit beside its session under a new name.
     *
     * @param refit    the refit of the session (its folder is where the fit goes)
     * @param settings the settings the refit used
     * @param when     the time in the file name (UTC, milliseconds)
     * @return the table file written
     * @throws IOException when the folder cannot be written
     */
    public static Path save(SessionRefit refit, FitSettings settings, Instant when) throws IOException {
        Path dir = Files.createDirectories(refit.folder().resolve(FOLDER));
        RefitTable table = new RefitTable(settings);
        StringBuilder csv = new StringBuilder();
        table.writeHeader(csv);
        table.write(csv, refit);
        String stem = "fit-" + STAMP.format(when);
        for (int n = 1; n < 10_000; n++) {
            Path target = dir.resolve(stem + "-" + n + TABLE_EXTENSION);
            Path settingsFile = dir.resolve(stem + "-" + n + SETTINGS_EXTENSION);
            if (Files.exists(settingsFile)) {
                continue;
            }
            // the settings first: a table is only ever visible with its settings beside it
            if (!publish(dir, settingsFile, settingsText(settings))) {
                continue;
            }
            if (publish(dir, target, csv.toString())) {
                return target;
            }
            Files.deleteIfExists(settingsFile);
        }
        throw new IOException("no free name for a fit under " + dir + " at " + stem);
    }

    /** Writes text to a temporary file, then links it to {@code target}; false when the target already exists. */
    private static boolean publish(Path dir, Path target, String text) throws IOException {
        Path tmp = Files.createTempFile(dir, ".fit-", ".tmp");
        try {
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            try (var ch = java.nio.channels.FileChannel.open(tmp, java.nio.file.StandardOpenOption.WRITE)) {
                ch.force(true);
            }
            try {
                Files.createLink(target, tmp);
                return true;
            } catch (FileAlreadyExistsException e) {
                return false;
            } catch (UnsupportedOperationException e) {
                // no hard links on this file system: an exclusive create, then a rename (atomic on POSIX)
                try {
                    Files.createFile(target);
                } catch (FileAlreadyExistsException taken) {
                    return false;
                }
                Files.move(tmp, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                        java.nio.file.StandardCopyOption.ATOMIC_MOVE);
                return true;
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /** @return the settings as properties text, one key per setting */
    static String settingsText(FitSettings s) {
        Properties p = new Properties();
        p.setProperty("function", s.sigmoid().name());
        p.setProperty("guess", s.guessText());
        p.setProperty("lapse_max", Double.toString(s.lapseMax()));
        if (!Double.isNaN(s.fixedLapse())) {
            p.setProperty("lapse", Double.toString(s.fixedLapse()));
        }
        if (!Double.isNaN(s.targetPsi())) {
            p.setProperty("target", Double.toString(s.targetPsi()));
        }
        if (!Double.isNaN(s.targetF())) {
            p.setProperty("target_f", Double.toString(s.targetF()));
        }
        p.setProperty("bootstrap", Integer.toString(s.bootstrapSamples()));
        p.setProperty("seed", Long.toString(s.seed()));
        p.setProperty("ci_method", s.intervalMethod().name().toLowerCase(Locale.ROOT));
        p.setProperty("level", Double.toString(s.level()));
        p.setProperty("nonparametric", Boolean.toString(s.nonparametric()));
        p.setProperty("summary", s.toString());
        StringWriter w = new StringWriter();
        try {
            p.store(w, "Limen refit settings");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }

    /** @return the settings read from properties text written by {@link #save} */
    static FitSettings parseSettings(String text) throws IOException {
        Properties p = new Properties();
        p.load(new StringReader(text));
        return FitSettings.parse(p.getProperty("function"), p.getProperty("guess"),
                Double.parseDouble(p.getProperty("lapse_max")), optional(p, "lapse"), optional(p, "target"),
                optional(p, "target_f"), Integer.parseInt(p.getProperty("bootstrap")), Long.parseLong(p.getProperty("seed")),
                p.getProperty("ci_method"), Double.parseDouble(p.getProperty("level")),
                Boolean.parseBoolean(p.getProperty("nonparametric")), null);
    }

    private static Double optional(Properties p, String key) {
        String v = p.getProperty(key);
        return v == null ? null : Double.valueOf(v);
    }

    /** @return the tables of the fits saved beside a session, oldest first (empty when there are none) */
    public static List<Path> list(Path sessionFolder) throws IOException {
        Path dir = sessionFolder.resolve(FOLDER);
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(f -> {
                String n = f.getFileName().toString();
                return n.startsWith("fit-") && n.endsWith(TABLE_EXTENSION);
            }).sorted((a, b) -> compareNames(a.getFileName().toString(), b.getFileName().toString())).toList();
        }
    }

    /** Orders by time stamp, then by the counter as a number (so -10 comes after -9). */
    private static int compareNames(String a, String b) {
        String sa = a.substring(0, a.lastIndexOf('-'));
        String sb = b.substring(0, b.lastIndexOf('-'));
        int c = sa.compareTo(sb);
        return c != 0 ? c : Integer.compare(counter(a), counter(b));
    }

    private static int counter(String name) {
        return Integer.parseInt(name.substring(name.lastIndexOf('-') + 1, name.length() - TABLE_EXTENSION.length()));
    }

    /**
     * Reads a saved fit and its settings.
     *
     * @throws IOException when a file cannot be read or is not a saved fit
     */
    public static SavedFit read(Path table) throws IOException {
        String name = table.getFileName().toString();
        if (!name.endsWith(TABLE_EXTENSION)) {
            throw new IOException(table + ": not a saved fit table (" + TABLE_EXTENSION + ")");
        }
        Path settingsFile = table.resolveSibling(name.substring(0, name.length() - TABLE_EXTENSION.length()) + SETTINGS_EXTENSION);
        FitSettings settings;
        try {
            settings = parseSettings(Files.readString(settingsFile, StandardCharsets.UTF_8));
        } catch (RuntimeException e) {
            throw new IOException(settingsFile + ": unreadable settings: " + e.getMessage(), e);
        }
        List<List<String>> records = Rfc4180.parse(Files.readString(table, StandardCharsets.UTF_8));
        if (records.isEmpty()) {
            throw new IOException(table + ": empty");
        }
        List<String> header = records.get(0);
        List<List<String>> rows = new ArrayList<>(records.subList(1, records.size()));
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).size() != header.size()) {
                throw new IOException(table + ":" + (i + 2) + ": " + rows.get(i).size() + " fields, header has " + header.size());
            }
        }
        return new SavedFit(table, settings, header, rows);
    }
}
