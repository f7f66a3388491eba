package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.workbench.IWorkbench;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

/** Closes the workbench after the dirty editors were saved or discarded. */
public class QuitHandler {

    @Execute
    void execute(IWorkbench workbench, EPartService parts) {
        if (parts.saveAll(true)) {
            workbench.close();
        }
    }
}
