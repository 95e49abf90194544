package limen.ui.analysis.tests;

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
        Display display = control.getDisplay();
        for (int i = 0; i < 20; i++) {
            while (display.readAndDispatch()) {
                // let the control paint
            }
            Thread.sleep(10);
        }
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
