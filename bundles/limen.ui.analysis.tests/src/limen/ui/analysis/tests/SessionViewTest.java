package limen.ui.analysis.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.commons.csv.CSVRecord;
import org.eclipse.e4.ui.model.application.ui.basic.MBasicFactory;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.widgets.Composite;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import limen.session.refit.RefitTable;
import limen.session.refit.TrialTable;
import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.SessionEntry;
import limen.ui.analysis.parts.ArchiveBrowserPart;
import limen.ui.analysis.parts.SessionPart;

/** The archive browser and the session view on a demo archive made by {@code ./limen run}. */
class SessionViewTest {

    @TempDir
    Path temp;

    private Fixture fx;
    private ArchiveBrowserPart browser;
    private SessionPart session;

    @BeforeEach
    @SuppressWarnings("unchecked")
    void setUp() throws Exception {
        fx = new Fixture(temp, "analysis", 1600, 1000);
        SashForm sash = new SashForm(fx.shell, SWT.HORIZONTAL);
        Composite left = new Composite(sash, SWT.NONE);
        Composite right = new Composite(sash, SWT.NONE);
        sash.setWeights(34, 66);
        browser = fx.make(ArchiveBrowserPart.class, left);
        session = fx.make(SessionPart.class, right);
        fx.broker.on(AnalysisIds.SELECTION_TOPIC, data -> session.show((List<Path>) data));
        fx.shell.open();
        assertTrue(fx.pumpUntil(() -> !browser.scanning() && browser.visible().size() == 2, 30_000),
                "the workspace archive opens by default: " + browser.archives());
    }

    @AfterEach
    void tearDown() {
        session.dispose();
        fx.close();
    }

    private SessionEntry entry(String participant) {
        return browser.visible().stream().filter(e -> e.participant().equals(participant)).findFirst().orElseThrow();
    }

    @Test
    void browserListsSortsAndFiltersTheArchive() throws Exception {
        assertEquals(List.of(fx.archive), browser.archives());
        for (SessionEntry e : browser.visible()) {
            assertEquals("OK", e.integrity(), e.problem());
            assertEquals("COMPLETED", e.status());
            assertTrue(e.trials() > 60, "three steps of two tracks: " + e.trials());
            assertTrue(e.battery().startsWith("Harbourside: frequency discrimination"), e.battery());
        }
        browser.sortBy(0, -1);
        assertEquals(List.of("P-RAVEN", "P-OTTER"), browser.visible().stream().map(SessionEntry::participant).toList());
        browser.sortBy(0, 1);
        assertEquals(List.of("P-OTTER", "P-RAVEN"), browser.visible().stream().map(SessionEntry::participant).toList());
        browser.setFilter("raven");
        assertEquals(List.of("P-RAVEN"), browser.visible().stream().map(SessionEntry::participant).toList());
        browser.setFilter("");

        // a second archive with a tampered copy of a session: listed with its checksum state, then closed again
        Path second = temp.resolve("second");
        Path copy = second.resolve("P-RAVEN").resolve(entry("P-RAVEN").name());
        Files.createDirectories(copy);
        try (var files = Files.list(entry("P-RAVEN").folder())) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Files.copy(f, copy.resolve(f.getFileName()));
            }
        }
        List<String> lines = new ArrayList<>(Files.readAllLines(copy.resolve("trials.csv")));
        String[] f = lines.get(5).split(",", -1);
        f[5] = f[5].equals("1") ? "0" : "1";
        lines.set(5, String.join(",", f));
        Files.write(copy.resolve("trials.csv"), lines);
        browser.addArchive(second);
        assertTrue(fx.pumpUntil(() -> !browser.scanning() && browser.visible().size() == 3, 30_000));
        browser.sortBy(5, 1);
        assertEquals("BROKEN_CHAIN", browser.visible().get(0).integrity(), "the journal's checksum chain is broken");
        assertEquals(second, browser.visible().get(0).archive());
        Screenshots.save(fx.shell, "archive-browser-two-archives");
        browser.removeArchive(second);
        assertEquals(2, browser.visible().size());
    }

    @Test
    void openArchivesAreRememberedInThePartsState() throws Exception {
        MPart part = MBasicFactory.INSTANCE.createPart();
        Path second = Files.createDirectories(temp.resolve("second"));
        ArchiveBrowserPart first = fx.make(ArchiveBrowserPart.class, new Composite(fx.shell, SWT.NONE), part);
        assertEquals(List.of(fx.archive), first.archives(), "first start: the workspace folder");
        first.addArchive(second);
        first.removeArchive(fx.archive);
        assertTrue(fx.pumpUntil(() -> !first.scanning(), 30_000));
        assertEquals(second.toString(), part.getPersistedState().get(ArchiveBrowserPart.ARCHIVES_KEY));
        ArchiveBrowserPart again = fx.make(ArchiveBrowserPart.class, new Composite(fx.shell, SWT.NONE), part);
        assertEquals(List.of(second), again.archives(), "the next start opens what was open");
        assertTrue(fx.pumpUntil(() -> !again.scanning(), 30_000));
        assertEquals(0, again.visible().size());
    }

    @Test
    void sessionShowsPlotsAndTheNumbersOfTheHeadlessRefit() throws Exception {
        session.setSettings("logistic", "task", "0.06", "", 150, 5, "bca");
        SessionEntry raven = entry("P-RAVEN");
        browser.select(List.of(raven.folder()));
        assertTrue(fx.pumpUntil(() -> session.shown() != null && !session.fitting(), 120_000), "fitted: " + session.problem());
        assertEquals(raven.folder(), session.shown().folder());
        assertEquals(6, session.shown().tracks().size(), "three steps of two tracks");
        assertNotNull(session.charts().get(0).chart(), "track chart");
        assertNotNull(session.charts().get(1).chart(), "fit chart");
        fx.pump(300);
        Path png = Screenshots.save(fx.shell, "session-view");
        assertTrue(Screenshots.distinctPixels(png) > 100);

        // ./limen refit with the same settings and seed: every field of every track equals the view's
        Path cliCsv = temp.resolve("cli-refit.csv");
        Fixture.cli("refit", raven.folder().toString(), "--out", cliCsv.toString(), "--bootstrap", "150", "--seed", "5",
                "--ci-method", "bca");
        Fixture.Table cli = Fixture.csv(cliCsv);
        assertEquals(RefitTable.COLUMNS, cli.header());
        assertEquals(6, cli.rows().size());
        for (int i = 0; i < 6; i++) {
            session.selectTrack(i);
            List<String> view = session.shownRow();
            CSVRecord c = cli.rows().get(i);
            for (String column : RefitTable.COLUMNS) {
                assertEquals(c.get(column), view.get(RefitTable.COLUMNS.indexOf(column)), "track " + i + " " + column);
            }
            assertTrue(session.numbersText().contains(c.get("threshold")), session.numbersText());
            assertEquals("fitted", c.get("outcome"), c.get("message"));
        }
        session.selectTrack(3);
        fx.pump(200);
        Screenshots.save(fx.shell, "session-view-track-4");

        // trials: tidy CSV, one row per journal row, reversals where the track turns
        Path trials = temp.resolve("export/trials.csv");
        session.exportTrials(trials);
        Fixture.Table t = Fixture.csv(trials);
        assertEquals(TrialTable.COLUMNS, t.header());
        assertEquals(raven.trials(), t.rows().size());
        Map<String, List<CSVRecord>> byTrack = new LinkedHashMap<>();
        for (CSVRecord r : t.rows()) {
            byTrack.computeIfAbsent(r.get("step") + "/" + r.get("track"), k -> new ArrayList<>()).add(r);
        }
        assertEquals(6, byTrack.size());
        for (List<CSVRecord> rows : byTrack.values()) {
            // written here independently: trial k is a turning point when the next trial's value differs from it
            // in the direction opposite to the last change that led to it (Levitt 1971, JASA 49(2B) 467-477);
            // repeated values carry the last direction on
            double[] v = rows.stream().mapToDouble(r -> Double.parseDouble(r.get("value"))).toArray();
            for (int k = 0; k < v.length; k++) {
                int before = 0;
                for (int j = k; j > 0 && before == 0; j--) {
                    before = Double.compare(v[j], v[j - 1]);
                }
                int next = k + 1 < v.length ? Double.compare(v[k + 1], v[k]) : 0;
                boolean turn = before != 0 && next != 0 && next != before;
                assertEquals(turn ? "1" : "0", rows.get(k).get("reversal"), "trial " + rows.get(k).get("seq"));
            }
            assertTrue(rows.stream().anyMatch(r -> r.get("correct").equals("0")) && rows.stream().anyMatch(r -> r.get("correct").equals("1")));
        }

        // fits: the same rows as ./limen refit
        Path fits = temp.resolve("export/fits.csv");
        session.exportFits(fits);
        Fixture.Table fit = Fixture.csv(fits);
        assertEquals(RefitTable.COLUMNS, fit.header());
        assertEquals(cli.rows().size(), fit.rows().size());
        for (int i = 0; i < fit.rows().size(); i++) {
            assertEquals(cli.rows().get(i).toList(), fit.rows().get(i).toList());
        }

        // figures through the libraries' exporters: SVG parses as XML, PNG decodes, PDF has its header and one page each
        List<Path> figures = session.exportFigures(temp.resolve("export/figures"));
        assertEquals(6, figures.size());
        for (Path p : figures) {
            String name = p.getFileName().toString();
            if (name.endsWith(".svg")) {
                Document d = parseXml(p);
                assertEquals("svg", d.getDocumentElement().getNodeName());
                assertEquals(800.0, Double.parseDouble(d.getDocumentElement().getAttribute("width")));
                assertTrue(d.getElementsByTagName("path").getLength() + d.getElementsByTagName("line").getLength() > 10, name);
            } else if (name.endsWith(".png")) {
                ImageData img = new ImageLoader().load(p.toString())[0];
                assertEquals(800, img.width);
                assertEquals(500, img.height);
            } else {
                assertEquals(1, pdfPages(p), name);
            }
        }
        Path report = temp.resolve("export/report.pdf");
        session.exportReport(report);
        assertEquals(1, pdfPages(report), "a one-page report");
        assertTrue(Files.size(report) > 5000);
        // the same page drawn into an image, kept with the screenshots so that people can look at the layout
        java.awt.image.BufferedImage page = new java.awt.image.BufferedImage(2 * 595, 2 * 842, java.awt.image.BufferedImage.TYPE_INT_RGB);
        java.awt.Graphics2D g = page.createGraphics();
        g.setRenderingHint(java.awt.RenderingHints.KEY_ANTIALIASING, java.awt.RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(java.awt.RenderingHints.KEY_TEXT_ANTIALIASING, java.awt.RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.scale(2, 2);
        session.drawReport(g);
        g.dispose();
        Path shots = Path.of(System.getProperty("limen.screenshots", "target/screenshots"));
        Files.createDirectories(shots);
        javax.imageio.ImageIO.write(page, "png", shots.resolve("session-report-page.png").toFile());
        for (Path p : figures) {
            Files.copy(p, shots.resolve("export-" + p.getFileName()), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
        Files.copy(report, shots.resolve("export-report.pdf"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }

    /** Parses XML with the JDK's parser, without fetching the SVG 1.1 DTD the document names (no network in tests). */
    static Document parseXml(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(file.toFile());
    }

    /** Pages of a PDF counted as its page objects ({@code /Type /Page}, not {@code /Pages}); ISO 32000-1 7.7.3.3. */
    static int pdfPages(Path pdf) throws Exception {
        String text = new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1);
        assertTrue(text.startsWith("%PDF-"), "PDF header");
        assertTrue(text.trim().endsWith("%%EOF"), "PDF trailer");
        Matcher m = Pattern.compile("/Type\\s*/Page(?![s])").matcher(text);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    @Test
    void badSettingsAreRefusedWithTheReason() throws Exception {
        browser.select(List.of(entry("P-OTTER").folder()));
        session.setSettings("logistic", "often", "0.06", "", 10, 1, "bca");
        assertEquals(null, session.refitSelection());
        assertTrue(session.problem().contains("'often'"), session.problem());
    }
}
