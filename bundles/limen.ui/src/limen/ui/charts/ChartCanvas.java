package limen.ui.charts;

import java.awt.image.BufferedImage;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.jfree.chart.JFreeChart;

/**
 * Shows a JFreeChart in SWT: the chart is drawn by Java2D into a {@link BufferedImage} of the canvas's size
 * and the pixels are copied into an SWT image (no AWT window is ever opened, so AWT runs headless beside
 * SWT). Redrawn when the canvas is resized or the chart is replaced.
 */
public final class ChartCanvas {

    static {
        // Java2D draws into images only; never let it start an AWT toolkit next to SWT's GTK.
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    private final Canvas canvas;
    private JFreeChart chart;
    private Image image;
    private Point imageSize;
    private String placeholder = "";

    public ChartCanvas(Composite parent) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
        canvas.addListener(SWT.Paint, e -> paint(e.gc));
        canvas.addListener(SWT.Resize, e -> canvas.redraw());
        canvas.addListener(SWT.Dispose, e -> disposeImage());
    }

    /** @return the SWT control */
    public Canvas control() {
        return canvas;
    }

    /** Shows a chart (null shows the placeholder text). */
    public void setChart(JFreeChart newChart) {
        chart = newChart;
        disposeImage();
        canvas.redraw();
    }

    /** @return the chart shown, or null */
    public JFreeChart chart() {
        return chart;
    }

    /** Text shown when there is no chart. */
    public void setPlaceholder(String text) {
        placeholder = text == null ? "" : text;
        canvas.redraw();
    }

    private void paint(GC gc) {
        Point size = canvas.getSize();
        if (chart == null || size.x < 20 || size.y < 20) {
            gc.drawText(placeholder, 8, 8, true);
            return;
        }
        if (image == null || !size.equals(imageSize)) {
            disposeImage();
            image = new Image(canvas.getDisplay(), toSwt(chart.createBufferedImage(size.x, size.y)));
            imageSize = size;
        }
        gc.drawImage(image, 0, 0);
    }

    private void disposeImage() {
        if (image != null) {
            image.dispose();
            image = null;
        }
    }

    /** @return the pixels of an AWT image as SWT image data (24-bit RGB) */
    public static ImageData toSwt(BufferedImage awt) {
        int w = awt.getWidth();
        int h = awt.getHeight();
        ImageData data = new ImageData(w, h, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        int[] row = new int[w];
        for (int y = 0; y < h; y++) {
            awt.getRGB(0, y, w, 1, row, 0, w);
            for (int x = 0; x < w; x++) {
                data.setPixel(x, y, row[x] & 0xFFFFFF);
            }
        }
        return data;
    }
}
