package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.trimwright.model.spec.DemoSpec;

/** Helpers for tests in a real window (under Xvfb in CI): event pumping with a deadline, screenshots, demo copy. */
final class Ui {

    private Ui() {
    }

    static Display display() {
        Display d = Display.getCurrent();
        return d != null ? d : new Display();
    }

    /** Runs the event loop until {@code done} holds; fails after {@code millis}. Never blocks in Display.sleep. */
    static void pumpUntil(String what, BooleanSupplier done, long millis) {
        Display d = display();
        long end = System.currentTimeMillis() + millis;
        while (!done.getAsBoolean() && System.currentTimeMillis() < end) {
            if (!d.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    break;
                }
            }
        }
        assertTrue(done.getAsBoolean(), "timed out waiting for " + what);
    }

    /** Runs pending events for a moment (layout, paint). */
    static void settle(long millis) {
        Display d = display();
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            if (!d.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    static Path screenshotDir() throws IOException {
        Path dir = Paths.get(System.getProperty("trimwright.screenshots", "target/screenshots"));
        return Files.createDirectories(dir);
    }

    /** Saves what {@code c} shows as PNG (Control.print into an image). */
    static Path screenshot(Control c, String name) throws IOException {
        Point size = c.getSize();
        Image img = new Image(c.getDisplay(), Math.max(1, size.x), Math.max(1, size.y));
        GC gc = new GC(img);
        try {
            c.print(gc);
        } finally {
            gc.dispose();
        }
        try {
            return save(img.getImageData(), name);
        } finally {
            img.dispose();
        }
    }

    static Path save(ImageData data, String name) throws IOException {
        Path out = screenshotDir().resolve(name + ".png");
        // Round trip through an Image: the PNG encoder wants the display's own pixel layout.
        Image img = new Image(display(), data);
        ImageData native_;
        try {
            native_ = img.getImageData();
        } finally {
            img.dispose();
        }
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] {native_};
        loader.save(out.toString(), SWT.IMAGE_PNG);
        return out;
    }

    /** A copy of the bundled demo spec in a fresh temporary folder. */
    static Path demoCopy() throws IOException {
        Path dir = Files.createTempDirectory("trimwright-ui-test");
        Path file = dir.resolve(DemoSpec.FILE_NAME);
        try (InputStream in = DemoSpec.open()) {
            Files.copy(in, file);
        }
        return file;
    }
}
