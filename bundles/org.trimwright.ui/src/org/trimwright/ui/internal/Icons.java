package org.trimwright.ui.internal;

import java.io.IOException;
import java.io.InputStream;
import java.util.HashMap;
import java.util.Map;

import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.widgets.Display;

/** The bundle's icons (icons/*.png, drawn by icons/make-icons.py), loaded once per display. */
public final class Icons {

    private static final Map<String, Image> IMAGES = new HashMap<>();

    private Icons() {
    }

    /** The image icons/{@code name}.png, or null when missing. */
    public static synchronized Image get(String name) {
        Image img = IMAGES.get(name);
        if (img != null && !img.isDisposed()) {
            return img;
        }
        Display display = Display.getCurrent();
        try (InputStream in = Icons.class.getResourceAsStream("/icons/" + name + ".png")) {
            if (in == null || display == null) {
                return null;
            }
            img = new Image(display, in);
        } catch (IOException e) {
            return null;
        }
        IMAGES.put(name, img);
        Image created = img;
        display.disposeExec(created::dispose);
        return img;
    }
}
