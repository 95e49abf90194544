package limen.ui.analysis.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.MApplicationFactory;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

import limen.cli.LimenCli;

/**
 * A demo archive made by the real runner ({@code ./limen run} in this JVM, output none, model listeners),
 * a shell, and an injection context with a {@link TestBroker}. The archive is also the workspace folder the
 * workbench is "started on", so the browser opens it by default.
 */
final class Fixture implements AutoCloseable {

    /** The Harbourside participants and their model listeners (x: Δf in percent of the standard). */
    static final String[][] PARTICIPANTS = {{"P-RAVEN", "logistic:mid=0.3,scale=0.08", "7"},
        {"P-OTTER", "logistic:mid=0.6,scale=0.15", "11"}};

    final Path archive;
    final Display display;
    final Shell shell;
    final TestBroker broker = new TestBroker();
    final IEclipseContext context;

    Fixture(Path temp, String title, int width, int height) throws Exception {
        archive = temp.resolve("archive").toAbsolutePath();
        for (String[] p : PARTICIPANTS) {
            cli("run", examples().resolve("frequency-discrimination.battery").toString(), "--participant", p[0], "--archive",
                    archive.toString(), "--output", "none", "--listener", p[1], "--seed", p[2]);
        }
        System.setProperty("limen.preferences", temp.resolve("workbench.prefs").toString());
        System.setProperty("limen.workspace", archive.toString());
        System.setProperty("limen.archive", temp.resolve("no-such-archive").toString());
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setText("Limen test: " + title);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
        context = EclipseContextFactory.create("test " + title);
        context.set(IEventBroker.class, broker);
        // the application model element whose context holds the browser's selection for views opened later
        MApplication app = MApplicationFactory.INSTANCE.createApplication();
        app.setContext(context);
        context.set(MApplication.class, app);
    }

    /** Runs a headless command in this JVM; returns its stderr; fails the test on a non-zero exit. */
    static String cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = LimenCli.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        assertEquals(0, code, "limen " + String.join(" ", args) + ":\n" + err);
        return err.toString();
    }

    static Path examples() {
        String root = System.getProperty("limen.root");
        if (root == null) {
            throw new IllegalStateException("limen.root is not set: run the tests through the Maven build");
        }
        return Paths.get(root, "examples");
    }

    /** Parses a CSV file with commons-csv's default (RFC 4180) format and its header row. */
    static Table csv(Path file) throws Exception {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
                CSVParser p = CSVParser.parse(r, CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get())) {
            return new Table(p.getHeaderNames(), new ArrayList<>(p.getRecords()));
        }
    }

    record Table(List<String> header, List<CSVRecord> rows) {
    }

    <T> T make(Class<T> type, Composite parent) {
        return make(type, parent, null);
    }

    /** Makes a view as the workbench does for a part (with the part's model element when given). */
    <T> T make(Class<T> type, Composite parent, MPart part) {
        IEclipseContext child = context.createChild(type.getSimpleName());
        child.set(Composite.class, parent);
        if (part != null) {
            child.set(MPart.class, part);
        }
        return ContextInjectionFactory.make(type, child);
    }

    boolean pumpUntil(BooleanSupplier condition, long millis) throws InterruptedException {
        long end = System.currentTimeMillis() + millis;
        while (!condition.getAsBoolean()) {
            if (System.currentTimeMillis() > end) {
                return false;
            }
            while (display.readAndDispatch()) {
                // drain
            }
            Thread.sleep(5);
        }
        return true;
    }

    void pump(long millis) throws InterruptedException {
        long end = System.currentTimeMillis() + millis;
        do {
            while (display.readAndDispatch()) {
                // drain
            }
            Thread.sleep(5);
        } while (System.currentTimeMillis() < end);
    }

    @Override
    public void close() {
        shell.dispose();
        context.dispose();
        System.clearProperty("limen.preferences");
        System.clearProperty("limen.workspace");
        System.clearProperty("limen.archive");
    }
}
