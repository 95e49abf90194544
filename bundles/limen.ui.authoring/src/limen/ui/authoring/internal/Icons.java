package limen.ui.authoring.internal;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Display;

/**
 * The work area's 16×16 icons, painted pixel by pixel (no image files to ship or license). One instance per
 * part; {@link #dispose()} frees them.
 */
public final class Icons {

    /** Decides whether a pixel centre (x + 0.5, y + 0.5) belongs to a shape. */
    private interface Shape {
        boolean contains(double x, double y);
    }

    private static final int SIZE = 16;

    private final Display display;
    private final List<Image> made = new ArrayList<>();
    private Image error;
    private Image warning;
    private Image battery;
    private Image step;
    private Image track;
    private Image pause;
    private Image calibration;

    public Icons(Display display) {
        this.display = display;
    }

    /** A red disc with a white cross. */
    public Image error() {
        if (error == null) {
            error = paint(new RGB(200, 30, 30), (x, y) -> dist(x, y, 8, 8) <= 7.2,
                    new RGB(255, 255, 255), (x, y) -> dist(x, y, 8, 8) <= 5 && (Math.abs((x - 8) - (y - 8)) < 1.3
                            || Math.abs((x - 8) + (y - 8)) < 1.3));
        }
        return error;
    }

    /** An amber triangle with an exclamation mark. */
    public Image warning() {
        if (warning == null) {
            warning = paint(new RGB(235, 170, 20), (x, y) -> y >= 1.5 && y <= 15 && Math.abs(x - 8) <= (y - 1.5) * 0.55,
                    new RGB(40, 30, 0), (x, y) -> Math.abs(x - 8) < 1.1 && ((y > 5.5 && y < 11) || (y > 12 && y < 14)));
        }
        return warning;
    }

    /** A sheet with lines (a battery file). */
    public Image battery() {
        if (battery == null) {
            battery = paint(new RGB(70, 90, 140), (x, y) -> x > 2.5 && x < 13.5 && y > 1 && y < 15,
                    new RGB(235, 240, 250), (x, y) -> x > 4 && x < 12 && ((int) y == 4 || (int) y == 7 || (int) y == 10));
        }
        return battery;
    }

    /** A blue square (a step). */
    public Image step() {
        if (step == null) {
            step = paint(new RGB(40, 110, 190), (x, y) -> x > 2.5 && x < 13.5 && y > 2.5 && y < 13.5,
                    new RGB(255, 255, 255), (x, y) -> x > 5 && x < 11 && y > 7 && y < 9);
        }
        return step;
    }

    /** A green staircase (a track). */
    public Image track() {
        if (track == null) {
            track = paint(new RGB(30, 140, 70), (x, y) -> {
                int level = (int) Math.min(3, x / 4);
                double top = 12 - level * 3;
                return (y > top && y < top + 2.2) || (Math.abs(x - 4 * Math.round(x / 4)) < 0.8 && x > 3 && x < 13
                        && y > top - 1 && y < top + 4);
            }, null, null);
        }
        return track;
    }

    /** Two grey bars (a break). */
    public Image pause() {
        if (pause == null) {
            pause = paint(new RGB(110, 110, 110), (x, y) -> y > 3 && y < 13 && ((x > 4 && x < 7) || (x > 9 && x < 12)),
                    null, null);
        }
        return pause;
    }

    /** A sine over a baseline (a calibration). */
    public Image calibration() {
        if (calibration == null) {
            calibration = paint(new RGB(150, 50, 110), (x, y) -> x > 1 && x < 15
                    && (Math.abs(y - (8 - 5 * Math.sin((x - 1) / 14 * 2 * Math.PI))) < 1.1 || (int) y == 14),
                    null, null);
        }
        return calibration;
    }

    private Image paint(RGB color, Shape shape, RGB detailColor, Shape detail) {
        ImageData data = new ImageData(SIZE, SIZE, 24, new PaletteData(0xFF0000, 0xFF00, 0xFF));
        byte[] alpha = new byte[SIZE * SIZE];
        for (int y = 0; y < SIZE; y++) {
            for (int x = 0; x < SIZE; x++) {
                double cx = x + 0.5;
                double cy = y + 0.5;
                RGB c = null;
                if (detail != null && shape.contains(cx, cy) && detail.contains(cx, cy)) {
                    c = detailColor;
                } else if (shape.contains(cx, cy)) {
                    c = color;
                }
                if (c != null) {
                    data.setPixel(x, y, data.palette.getPixel(c));
                    alpha[y * SIZE + x] = (byte) 255;
                }
            }
        }
        data.alphaData = alpha;
        Image image = new Image(display, data);
        made.add(image);
        return image;
    }

    private static double dist(double x, double y, double cx, double cy) {
        return Math.hypot(x - cx, y - cy);
    }

    /** Frees the images. */
    public void dispose() {
        for (Image i : made) {
            i.dispose();
        }
        made.clear();
        error = warning = battery = step = track = pause = calibration = null;
    }
}
