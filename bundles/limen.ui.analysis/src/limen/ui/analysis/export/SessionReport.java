package limen.ui.analysis.export;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.JFreeChart;
import org.jfree.pdf.PDFDocument;
import org.jfree.pdf.Page;

import limen.fit.FitSettings;
import limen.session.refit.RefitTable;
import limen.session.refit.SessionRefit;

/**
 * A one-page PDF report of a session (A4 portrait, drawn by JFreePDF): who and what, the journal's
 * integrity, the fit settings, one line of numbers per track (the fields of {@link RefitTable}, so they are
 * those of {@code ./limen refit}), and the track and fit charts of one track.
 */
public final class SessionReport {

    /** A4 in points (210 x 297 mm at 72 points per inch). */
    public static final int WIDTH = 595;
    public static final int HEIGHT = 842;
    private static final int MARGIN = 40;
    private static final java.time.format.DateTimeFormatter STARTED = java.time.format.DateTimeFormatter
            .ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'", Locale.ROOT).withZone(java.time.ZoneOffset.UTC);

    private SessionReport() {
    }

    /**
     * @param file     where to write the PDF
     * @param refit    the session's refit
     * @param settings the settings it was made with
     * @param track    the chart of the shown track's trials
     * @param fit      the chart of the shown track's fit
     */
    public static void write(Path file, SessionRefit refit, FitSettings settings, JFreeChart track, JFreeChart fit)
            throws IOException {
        PDFDocument doc = new PDFDocument();
        doc.setTitle("Limen session report " + refit.folder().getFileName());
        doc.setAuthor("Limen");
        Page page = doc.createPage(new Rectangle(WIDTH, HEIGHT));
        draw(page.getGraphics2D(), refit, settings, track, fit);
        byte[] bytes = doc.getPDFBytes();
        Exports.atomically(file, tmp -> Files.write(tmp, bytes));
    }

    /**
     * Draws the page into any Java2D surface of {@link #WIDTH} x {@link #HEIGHT} units (the PDF page, or an
     * image to look at).
     */
    public static void draw(Graphics2D g, SessionRefit refit, FitSettings settings, JFreeChart track, JFreeChart fit) {
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, WIDTH, HEIGHT);
        g.setColor(Color.BLACK);
        int y = MARGIN + 6;
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        g.drawString("Session of " + refit.participant(), MARGIN, y);
        y += 16;
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 10));
        y = wrap(g, refit.battery(), MARGIN, y, 95);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 9));
        for (String line : new String[] {
            "folder " + refit.folder().getFileName() + "   started "
                    + (refit.started() == null ? "unknown" : STARTED.format(refit.started()))
                    + "   status " + refit.status() + "   journal " + refit.integrity(),
            "fit settings: " + settings,
            refit.skipped() ? "skipped: " + refit.problem() : ""}) {
            if (!line.isEmpty()) {
                y = wrap(g, line, MARGIN, y, 110);
            }
        }
        y += 6;
        g.setFont(new Font(Font.MONOSPACED, Font.BOLD, 8));
        String head = String.format(Locale.ROOT, "%-10s %-6s %6s %10s %22s %9s %7s %8s %6s %5s", "step", "track", "trials",
                "threshold", "interval", "slope", "lapse", "deviance", "gof p", "revs");
        g.drawString(head, MARGIN, y);
        y += 11;
        g.setFont(new Font(Font.MONOSPACED, Font.PLAIN, 8));
        for (List<String> r : new RefitTable(settings).rows(refit)) {
            g.drawString(String.format(Locale.ROOT, "%-10s %-6s %6s %10s %22s %9s %7s %8s %6s %5s", field(r, "step"),
                    field(r, "track"), field(r, "trials"), short4(field(r, "threshold")),
                    "[" + short4(field(r, "threshold_lo")) + ", " + short4(field(r, "threshold_hi")) + "]",
                    short4(field(r, "slope")), short4(field(r, "lapse")), short4(field(r, "deviance")),
                    short4(field(r, "gof_p")), field(r, "reversal_count")), MARGIN, y);
            y += 10;
            if (y > 300) {
                g.drawString("(more tracks in the CSV export)", MARGIN, y);
                y += 10;
                break;
            }
        }
        int chartWidth = WIDTH - 2 * MARGIN;
        int chartHeight = (HEIGHT - MARGIN - 24 - (y + 8)) / 2;
        if (track != null) {
            track.draw(g, new Rectangle(MARGIN, y + 8, chartWidth, chartHeight));
        }
        if (fit != null) {
            fit.draw(g, new Rectangle(MARGIN, y + 12 + chartHeight, chartWidth, chartHeight));
        }
        g.setColor(Color.DARK_GRAY);
        g.setFont(new Font(Font.SANS_SERIF, Font.ITALIC, 8));
        g.drawString("Made with Limen, research software: not a clinical audiometer, not for diagnosis.", MARGIN, HEIGHT - MARGIN + 14);
    }

    private static int wrap(Graphics2D g, String text, int x, int y, int columns) {
        List<String> lines = new ArrayList<>();
        String rest = text;
        while (rest.length() > columns) {
            int cut = rest.lastIndexOf(' ', columns);
            cut = cut <= 0 ? columns : cut;
            lines.add(rest.substring(0, cut));
            rest = rest.substring(cut).trim();
        }
        lines.add(rest);
        for (String l : lines) {
            g.drawString(l, x, y);
            y += 11;
        }
        return y;
    }

    private static String field(List<String> row, String column) {
        return row.get(RefitTable.COLUMNS.indexOf(column));
    }

    /** Four significant digits for the page; the CSV keeps every digit. */
    static String short4(String number) {
        try {
            double v = Double.parseDouble(number);
            return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : number;
        } catch (NumberFormatException e) {
            return number;
        }
    }
}
