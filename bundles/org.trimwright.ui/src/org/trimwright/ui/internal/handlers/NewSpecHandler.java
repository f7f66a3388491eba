package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.ui.internal.workspace.Workspace;

/** Opens the new-spec wizard. */
public class NewSpecHandler {

    @Execute
    void execute(Shell shell, Workspace ws, MApplication app, EModelService models, EPartService parts,
            IEventBroker broker) {
        NewSpecWizard.open(shell, ws, null, app, models, parts, broker);
    }
}
