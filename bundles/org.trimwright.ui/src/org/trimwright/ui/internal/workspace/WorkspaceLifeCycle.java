package org.trimwright.ui.internal.workspace;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.Platform;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MPartStack;
import org.eclipse.e4.ui.workbench.lifecycle.PostContextCreate;
import org.eclipse.e4.ui.workbench.lifecycle.ProcessAdditions;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.osgi.service.datalocation.Location;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.ui.internal.Topics;

/**
 * Application life cycle: before the window opens, finds the workspace folder (the instance location, set with
 * {@code -data}; {@code ~/.trimwright/workspace} when none was given), seeds it with the demo project on first
 * use and puts the {@link Workspace} into the application context.
 */
public class WorkspaceLifeCycle {

    @PostContextCreate
    void postContextCreate(IEclipseContext context) {
        Workspace ws = new Workspace(locate());
        try {
            ws.ensureSeeded();
        } catch (IOException e) {
            ILog.of(getClass()).error("cannot prepare the workspace " + ws.root(), e);
        }
        context.set(Workspace.class, ws);
    }

    /** Opens a spec of the workspace (the demo when present) in the editor area before the window shows. */
    @ProcessAdditions
    void processAdditions(MApplication app, EModelService models, Workspace ws) {
        Path spec = firstSpec(ws);
        if (spec == null || !(models.find(Topics.EDITOR_STACK, app) instanceof MPartStack stack)) {
            return;
        }
        MPart part = models.createModelElement(MPart.class);
        part.setElementId(Topics.EDITOR_DESCRIPTOR);
        part.setContributionURI(Topics.EDITOR_CLASS);
        part.setLabel(spec.getFileName().toString());
        part.setIconURI("platform:/plugin/org.trimwright.ui/icons/spec.png");
        part.setCloseable(true);
        part.getPersistedState().put(Topics.FILE_KEY, spec.toAbsolutePath().normalize().toString());
        stack.getChildren().add(part);
        stack.setSelectedElement(part);
    }

    static Path firstSpec(Workspace ws) {
        Path demo = ws.root().resolve(Workspace.DEMO_PROJECT).resolve(DemoSpec.FILE_NAME);
        if (Workspace.isSpec(demo)) {
            return demo;
        }
        try {
            for (Path project : ws.projects()) {
                for (Path p : Workspace.children(project)) {
                    if (Workspace.isSpec(p)) {
                        return p;
                    }
                }
            }
        } catch (IOException e) {
            return null;
        }
        return null;
    }

    static Path locate() {
        Location loc = Platform.getInstanceLocation();
        if (loc != null && loc.isSet() && loc.getURL() != null) {
            try {
                return Paths.get(loc.getURL().toURI());
            } catch (URISyntaxException | IllegalArgumentException e) {
                return Paths.get(loc.getURL().getPath());
            }
        }
        return Paths.get(System.getProperty("user.home"), ".trimwright", "workspace");
    }
}
