package limen.ui.booth.tests;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;

/** Saves what a control shows as a PNG under target/screenshots, so people can look at what tests saw. */
final class Screenshots {

    private Screenshots() {
    }

    static Path save(Control control, String name) throws Exception {
        return save(control, name, 200);
    }

    /** Lets the control paint for about {@code pumpMillis}, then copies it from the screen. */
    static Path save(Control control, String name, int pumpMillis) throws Exception {
        Display display = control.getDisplay();
        long until = System.nanoTime() + pumpMillis * 1_000_000L;
        do {
            while (display.readAndDispatch()) {
                // let the control paint
            }
            if (pumpMillis > 0) {
                Thread.sleep(5);
            }
        } while (System.nanoTime() < until);
        Point size = control.getSize();
        Image image = new Image(display, size.x, size.y);
        GC gc = new GC(control);
        try {
            gc.copyArea(image, 0, 0);
        } finally {
            gc.dispose();
        }
        Path dir = Paths.get(System.getProperty("limen.screenshots", "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        try {
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {image.getImageData()};
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            image.dispose();
        }
        return file;
    }

    /**
     * Draws a control into an image with {@link Control#print} (for a console covered by the participant
     * screen, which a copy from the screen would show instead).
     */
    static Path print(Control control, String name) throws Exception {
        Display display = control.getDisplay();
        while (display.readAndDispatch()) {
            // let the control lay out
        }
        Point size = control.getSize();
        Image image = new Image(display, size.x, size.y);
        GC gc = new GC(image);
        try {
            control.print(gc);
        } finally {
            gc.dispose();
        }
        Path dir = Paths.get(System.getProperty("limen.screenshots", "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        try {
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {image.getImageData()};
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            image.dispose();
        }
        return file;
    }

    /** Number of distinct pixel values: a blank capture has one or two. */
    static int distinctPixels(Path png) {
        ImageData data = new ImageLoader().load(png.toString())[0];
        java.util.Set<Integer> seen = new java.util.HashSet<>();
        for (int y = 0; y < data.height; y += 2) {
            for (int x = 0; x < data.width; x += 2) {
                seen.add(data.getPixel(x, y));
            }
        }
        return seen.size();
    }
}
