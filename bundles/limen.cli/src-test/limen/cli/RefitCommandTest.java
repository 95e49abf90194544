package limen.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.audio.NoOutput;
import limen.fit.BinomialData;
import limen.model.Battery;
import limen.model.Calibration;
import limen.model.io.LimenFiles;
import limen.session.BatteryTrialRenderer;
import limen.session.CalibrationMapping;
import limen.session.ModelListenerResponder;
import limen.session.SessionFolder;
import limen.session.SessionRunner;
import limen.session.refit.RefitTable;
import limen.session.refit.SessionTracks;
import limen.session.refit.TrackData;

class RefitCommandTest {

    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    private static Path examples() {
        String root = System.getProperty("limen.root");
        Path base = root != null ? Paths.get(root) : Paths.get("../..");
        return base.resolve("examples").toAbsolutePath().normalize();
    }

    /** One Harbourside intensity session (2 steps, 1 track each, 80 trials at most) by a model listener. */
    private SessionFolder session(Path archive, String participant, long seed) throws Exception {
        Battery b = LimenFiles.loadBattery(examples().resolve("intensity-discrimination.battery"));
        Calibration c = LimenFiles.loadCalibration(examples().resolve("harbourside-demo.calibration"));
        SessionFolder f = SessionFolder.create(archive, "intensity-discrimination", b, c, participant, seed, "none", -1);
        SessionRunner.start(f, new NoOutput(false), new ModelListenerResponder(null, Map.of(), seed),
                new BatteryTrialRenderer(CalibrationMapping.toSignal(c)), null, false).run();
        return f;
    }

    private static List<CSVRecord> parse(String text) throws Exception {
        try (Reader r = new StringReader(text);
                CSVParser p = CSVParser.parse(r, CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get())) {
            assertEquals(RefitTable.COLUMNS, p.getHeaderNames());
            return new ArrayList<>(p.getRecords());
        }
    }

    @Test
    void tamperedSessionIsReportedAndTheBatchGoesOn() throws Exception {
        Path archive = dir.resolve("archive");
        SessionFolder a = session(archive, "P-RAVEN", 1);
        SessionFolder b = session(archive, "P-OTTER", 2);
        session(archive, "P-FINCH", 3);
        // edit a response in P-OTTER's journal: its checksum chain breaks
        List<String> lines = new ArrayList<>(Files.readAllLines(b.journalFile()));
        String[] f = lines.get(3).split(",", -1);
        f[6] = f[6].equals("1") ? "2" : "1";
        lines.set(3, String.join(",", f));
        Files.write(b.journalFile(), lines);

        Path csv = dir.resolve("fits.csv");
        int code = run("refit", archive.toString(), "--out", csv.toString(), "--bootstrap", "50", "--seed", "4");
        assertEquals(1, code, err.toString());
        String e = err.toString();
        assertTrue(e.contains("[3/3]"), e);
        assertTrue(e.contains("BROKEN_CHAIN") && e.contains("P-OTTER"), e);
        List<CSVRecord> rows = parse(Files.readString(csv));
        assertEquals(5, rows.size(), "2 tracks for each good session, one row for the tampered one");
        int fitted = 0;
        for (CSVRecord r : rows) {
            if (r.get("participant").equals("P-OTTER")) {
                assertEquals("BROKEN_CHAIN", r.get("integrity"));
                assertEquals("skipped", r.get("outcome"));
            } else {
                assertEquals("OK", r.get("integrity"));
                assertEquals("fitted", r.get("outcome"), r.get("message"));
                assertEquals("0.5", r.get("guess"), "2AFC: 1/n from the battery snapshot");
                double t = Double.parseDouble(r.get("threshold"));
                assertTrue(Double.parseDouble(r.get("threshold_lo")) <= t && t <= Double.parseDouble(r.get("threshold_hi")), r.toString());
                fitted++;
            }
        }
        assertEquals(4, fitted);

        // the same track fitted by ./limen fit on its pooled data gives the same row
        List<TrackData> tracks = SessionTracks.of(a.header(), a.readJournal().rows());
        BinomialData d = tracks.get(0).pooled();
        StringBuilder data = new StringBuilder("value,trials,correct\n");
        for (int i = 0; i < d.size(); i++) {
            data.append(d.value(i)).append(',').append(d.trials(i)).append(',').append(d.correct(i)).append('\n');
        }
        Path cells = Files.writeString(dir.resolve("cells.csv"), data);
        out.getBuffer().setLength(0);
        assertEquals(0, run("fit", cells.toString(), "--guess", "0.5", "--bootstrap", "50", "--seed", "4"), err.toString());
        CSVRecord single;
        try (CSVParser p = CSVParser.parse(new StringReader(out.toString()), CSVFormat.DEFAULT.builder().setHeader().get())) {
            single = p.getRecords().get(0);
        }
        CSVRecord mine = rows.stream().filter(r -> r.get("participant").equals("P-RAVEN") && r.get("step").equals(tracks.get(0).stepId()))
                .findFirst().orElseThrow();
        for (String c : List.of("threshold", "slope", "lapse", "loglik", "deviance", "threshold_lo", "threshold_hi", "gof_p")) {
            assertEquals(Double.parseDouble(single.get(c)), Double.parseDouble(mine.get(c)), 0, c);
        }
    }

    @Test
    void usageErrorsExitTwo() throws Exception {
        assertEquals(2, run("refit", dir.resolve("nowhere").toString(), "--out", dir.resolve("x.csv").toString()));
        assertTrue(err.toString().contains("limen refit:"), err.toString());
        Path archive = dir.resolve("archive");
        session(archive, "P-RAVEN", 1);
        assertEquals(2, run("refit", archive.toString(), "--out", dir.resolve("x.csv").toString(), "--function", "cubic"));
        assertEquals(2, run("refit", archive.toString(), "--out", dir.resolve("x.csv").toString(), "--guess", "lots"));
        assertEquals(0, run("refit", archive.toString(), "--out", dir.resolve("x.csv").toString()), err.toString());
    }
}
