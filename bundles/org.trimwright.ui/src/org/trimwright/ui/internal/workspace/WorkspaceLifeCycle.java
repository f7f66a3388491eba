package org.trimwright.ui.internal.workspace;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.Platform;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.ui.workbench.lifecycle.PostContextCreate;
import org.eclipse.osgi.service.datalocation.Location;

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
