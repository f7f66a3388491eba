package org.trimwright.ui.internal.editor;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.trimwright.ui.internal.Topics;

/** Opens spec files in spec editors (one editor per file) and finds the editor of a file. */
public final class Editors {

    private Editors() {
    }

    /** Activates the editor of {@code file}, opening one in the editor stack when there is none. */
    public static MPart open(Path file, MApplication app, EModelService models, EPartService parts) {
        Path abs = file.toAbsolutePath().normalize();
        MPart existing = find(abs, app, models);
        if (existing != null) {
            parts.showPart(existing, PartState.ACTIVATE);
            return existing;
        }
        MPart part = parts.createPart(Topics.EDITOR_DESCRIPTOR);
        part.getPersistedState().put(Topics.FILE_KEY, abs.toString());
        part.setLabel(abs.getFileName().toString());
        List<MPartStack> stacks = models.findElements(app, Topics.EDITOR_STACK, MPartStack.class, null);
        if (!stacks.isEmpty()) {
            stacks.get(0).getChildren().add(part);
        }
        parts.showPart(part, PartState.ACTIVATE);
        return part;
    }

    /** The open editor part of {@code file}, or null. */
    public static MPart find(Path file, MApplication app, EModelService models) {
        String key = file.toAbsolutePath().normalize().toString();
        for (MPart p : models.findElements(app, null, MPart.class, null)) {
            if (key.equals(p.getPersistedState().get(Topics.FILE_KEY))) {
                return p;
            }
        }
        return null;
    }
}
