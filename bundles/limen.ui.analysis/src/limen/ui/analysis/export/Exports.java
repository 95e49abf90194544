package limen.ui.analysis.export;

import java.awt.Rectangle;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.pdf.PDFDocument;
import org.jfree.pdf.PDFGraphics2D;
import org.jfree.pdf.Page;
import org.jfree.svg.SVGGraphics2D;

/**
 * Writes tables and figures. Tables are tidy CSV (a header row, one observation per row) in RFC 4180 by
 * commons-csv, LF line ends, UTF-8 without a byte-order mark, {@code NA} for missing numbers, so that R's
 * {@code read.csv} and pandas' {@code read_csv} read them unchanged. Figures go through the charting
 * libraries' own exporters: SVG by JFreeSVG's {@link SVGGraphics2D}, PNG by JFreeChart's {@link ChartUtils},
 * PDF by JFreePDF's {@link PDFGraphics2D}. Every file is written to a temporary file beside it and then
 * moved into place, so a reader never sees half a file.
 */
public final class Exports {

    /** The CSV dialect of every table. */
    public static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setRecordSeparator("\n").get();

    private Exports() {
    }

    /** Writes a table: the header, then the rows (fields in header order). */
    public static void csv(Path file, List<String> header, List<List<String>> rows) throws IOException {
        atomically(file, tmp -> {
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8); CSVPrinter p = new CSVPrinter(w, FORMAT)) {
                p.printRecord(header);
                for (List<String> r : rows) {
                    if (r.size() != header.size()) {
                        throw new IllegalArgumentException("a row has " + r.size() + " fields, the header " + header.size());
                    }
                    p.printRecord(r);
                }
            }
        });
    }

    /** Writes a chart as SVG of the given size in pixels. */
    public static void svg(Path file, JFreeChart chart, int width, int height) throws IOException {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        chart.draw(g, new Rectangle(0, 0, width, height));
        String svg = g.getSVGDocument();
        atomically(file, tmp -> Files.writeString(tmp, svg, StandardCharsets.UTF_8));
    }

    /** Writes a chart as PNG of the given size in pixels. */
    public static void png(Path file, JFreeChart chart, int width, int height) throws IOException {
        atomically(file, tmp -> ChartUtils.saveChartAsPNG(tmp.toFile(), chart, width, height));
    }

    /** Writes a chart as a one-page PDF of the given size in points. */
    public static void pdf(Path file, JFreeChart chart, int width, int height) throws IOException {
        PDFDocument doc = new PDFDocument();
        doc.setTitle(chart.getTitle() == null ? "Limen figure" : chart.getTitle().getText());
        doc.setAuthor("Limen");
        Page page = doc.createPage(new Rectangle(width, height));
        PDFGraphics2D g = page.getGraphics2D();
        chart.draw(g, new Rectangle(0, 0, width, height));
        byte[] bytes = doc.getPDFBytes();
        atomically(file, tmp -> Files.write(tmp, bytes));
    }

    /** The body of a write to a temporary file. */
    @FunctionalInterface
    interface Body {
        void write(Path tmp) throws IOException;
    }

    static void atomically(Path file, Body body) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + file.getFileName(), ".tmp");
        try {
            body.write(tmp);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
