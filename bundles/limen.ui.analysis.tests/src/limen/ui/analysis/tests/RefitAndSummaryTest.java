package limen.ui.analysis.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import limen.session.refit.ConditionSummary;
import limen.session.refit.RefitTable;
import limen.session.refit.SavedFits;
import limen.ui.analysis.AnalysisIds;
import limen.ui.analysis.RefitJob;
import limen.ui.analysis.SessionEntry;
import limen.ui.analysis.parts.ArchiveBrowserPart;
import limen.ui.analysis.parts.SessionPart;
import limen.ui.analysis.parts.SummaryPart;

/** Batch refit of a selection as a background job, its saved fits, and the summary across sessions. */
class RefitAndSummaryTest {

    @TempDir
    Path temp;

    private Fixture fx;
    private ArchiveBrowserPart browser;
    private SessionPart session;
    private SummaryPart summary;

    @BeforeEach
    @SuppressWarnings("unchecked")
    void setUp() throws Exception {
        fx = new Fixture(temp, "analysis refit", 1600, 1000);
        SashForm sash = new SashForm(fx.shell, SWT.HORIZONTAL);
        Composite left = new Composite(sash, SWT.NONE);
        SashForm right = new SashForm(sash, SWT.VERTICAL);
        Composite top = new Composite(right, SWT.NONE);
        Composite bottom = new Composite(right, SWT.NONE);
        sash.setWeights(30, 70);
        right.setWeights(55, 45);
        browser = fx.make(ArchiveBrowserPart.class, left);
        session = fx.make(SessionPart.class, top);
        summary = fx.make(SummaryPart.class, bottom);
        fx.broker.on(AnalysisIds.SELECTION_TOPIC, data -> session.show((List<Path>) data));
        fx.broker.on(AnalysisIds.SELECTION_TOPIC, data -> summary.select((List<Path>) data));
        fx.shell.open();
        assertTrue(fx.pumpUntil(() -> !browser.scanning() && browser.visible().size() == 2, 30_000));
    }

    @AfterEach
    void tearDown() {
        session.dispose();
        summary.dispose();
        fx.close();
    }

    private List<Path> all() {
        return browser.visible().stream().map(SessionEntry::folder).toList();
    }

    @Test
    void batchRefitFinishesWithProgressAndKeepsEveryFit() throws Exception {
        session.setSettings("normal", "task", "0.04", "0.75", 120, 3, "percentile");
        browser.select(all());
        assertTrue(fx.pumpUntil(() -> session.shown() != null && !session.fitting(), 120_000));
        RefitJob job = session.refitSelection();
        assertNotNull(job, session.problem());
        assertTrue(fx.pumpUntil(() -> !session.running(), 300_000), "the refit ends");
        assertFalse(job.cancelled());
        List<String> progress = session.progressSeen();
        assertFalse(progress.isEmpty());
        assertEquals("2 of 2 sessions", progress.get(progress.size() - 1));
        assertTrue(progress.stream().anyMatch(p -> p.startsWith("0 of 2") || p.startsWith("1 of 2")), "progress seen on the way: " + progress);
        assertEquals(2, job.saved().size(), job.problems().toString());
        fx.pump(200);
        Screenshots.save(fx.shell, "batch-refit-done");

        // each saved fit holds ./limen refit's rows for the same settings and seed
        for (Path folder : all()) {
            List<Path> saved = SavedFits.list(folder);
            assertEquals(1, saved.size());
            Path cliCsv = temp.resolve("cli-" + folder.getFileName() + ".csv");
            Fixture.cli("refit", folder.toString(), "--out", cliCsv.toString(), "--function", "normal", "--lapse-max", "0.04",
                    "--target", "0.75", "--bootstrap", "120", "--seed", "3", "--ci-method", "percentile");
            Fixture.Table cli = Fixture.csv(cliCsv);
            Fixture.Table mine = Fixture.csv(saved.get(0));
            assertEquals(RefitTable.COLUMNS, mine.header());
            assertEquals(cli.rows().size(), mine.rows().size());
            for (int i = 0; i < cli.rows().size(); i++) {
                assertEquals(cli.rows().get(i).toList(), mine.rows().get(i).toList());
            }
            assertEquals(job.settings().toString(), SavedFits.read(saved.get(0)).settings().toString());
        }

        // a second refit adds a fit and leaves the first as it was
        Path first = SavedFits.list(all().get(0)).get(0);
        byte[] before = Files.readAllBytes(first);
        session.setSettings("logistic", "task", "0.06", "", 40, 9, "bca");
        RefitJob again = session.refitSelection();
        assertNotNull(again);
        assertTrue(fx.pumpUntil(() -> !session.running(), 300_000));
        assertEquals(2, SavedFits.list(all().get(0)).size());
        assertArrayEquals(before, Files.readAllBytes(first));

        // the first saved fit shown again: its settings in the form, its rows in the view
        Path shownFolder = session.shown().folder();
        assertEquals(2, session.savedFits().size());
        SavedFits.SavedFit saved = SavedFits.read(session.savedFits().get(0));
        assertNotNull(session.showSavedFit(0));
        assertTrue(fx.pumpUntil(() -> !session.fitting(), 120_000));
        assertEquals(shownFolder, session.shown().folder());
        assertEquals(saved.settings().toString(), session.settings().toString(), "the form holds the saved settings");
        for (int i = 0; i < saved.rows().size(); i++) {
            session.selectTrack(i);
            assertEquals(saved.rows().get(i), session.shownRow(), "track " + i);
        }
    }

    @Test
    void cancelStopsTheBatchEarly() throws Exception {
        browser.select(all());
        assertTrue(fx.pumpUntil(() -> session.shown() != null && !session.fitting(), 120_000));
        session.setSettings("logistic", "task", "0.06", "", 200_000, 1, "percentile");
        RefitJob job = session.refitSelection();
        assertNotNull(job);
        assertTrue(fx.pumpUntil(() -> job.fraction() > 0, 120_000), "bootstrap progress arrives");
        session.cancel();
        assertTrue(fx.pumpUntil(() -> !session.running(), 120_000), "the job stops");
        assertTrue(job.cancelled());
        assertTrue(job.results().size() < 2, "stopped before the end: " + job.results().size());
        assertEquals(0, SavedFits.list(all().get(1)).size(), "nothing saved for the session not reached");
    }

    @Test
    void viewsOpenedLaterPickUpTheSelection() throws Exception {
        browser.select(all());
        Composite extra = new Composite(fx.shell, SWT.NONE);
        SummaryPart later = fx.make(SummaryPart.class, extra);
        later.setBootstrap(0, 1);
        RefitJob job = later.summarise();
        assertNotNull(job, "the summary opened after the selection knows it");
        assertEquals(all(), job.folders());
        assertTrue(fx.pumpUntil(() -> !later.running(), 120_000));
        assertEquals(12, later.points().size());
        later.dispose();
    }

    @Test
    void summaryShowsRelativeDifferenceLimensByStandardFrequency() throws Exception {
        browser.select(all());
        summary.setBootstrap(60, 4);
        RefitJob job = summary.summarise();
        assertNotNull(job);
        assertTrue(fx.pumpUntil(() -> !summary.running(), 300_000));
        List<ConditionSummary.Point> points = summary.points();
        assertEquals(12, points.size(), "2 sessions x 3 standards x 2 tracks");
        assertEquals(List.of(500.0, 1000.0, 4000.0), points.stream().map(ConditionSummary.Point::standardFrequencyHz)
                .distinct().sorted().toList());
        for (ConditionSummary.Point p : points) {
            assertEquals("PERCENT", p.unit(), "the journal's unit literal");
            // Δf/f from a difference in percent of the standard: divide by 100 (definition of percent)
            assertEquals(p.threshold() / 100, p.relative(), 1e-15);
            assertTrue(p.thresholdLow() <= p.threshold() && p.threshold() <= p.thresholdHigh(), p.toString());
        }
        // the model listeners: P-OTTER's midpoint (0.6 %) is twice P-RAVEN's (0.3 %), so are its thresholds on average
        double raven = points.stream().filter(p -> p.participant().equals("P-RAVEN")).mapToDouble(p -> Math.log(p.threshold()))
                .average().orElseThrow();
        double otter = points.stream().filter(p -> p.participant().equals("P-OTTER")).mapToDouble(p -> Math.log(p.threshold()))
                .average().orElseThrow();
        assertTrue(otter > raven, "P-OTTER above P-RAVEN: " + Math.exp(otter) + " vs " + Math.exp(raven));
        assertNotNull(summary.chart().chart());
        fx.pump(300);
        Screenshots.save(fx.shell, "summary");
        List<Path> files = summary.export(temp.resolve("summary"));
        assertEquals("svg", SessionViewTest.parseXml(files.get(1)).getDocumentElement().getNodeName());
        Fixture.Table t = Fixture.csv(files.get(0));
        assertEquals(12, t.rows().size());
        for (CSVRecord r : t.rows()) {
            assertEquals(Double.parseDouble(r.get("threshold")) / 100, Double.parseDouble(r.get("relative_dl")), 1e-15);
        }
        assertEquals(1, SessionViewTest.pdfPages(files.get(3)));
    }
}
