package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.ui.internal.workspace.Workspace;

/** Says what this program is and where its workspace lives. */
public class AboutHandler {

    @Execute
    void execute(Shell shell, Workspace workspace) {
        MessageDialog.openInformation(shell, "About Trimwright", "Trimwright 0.1\n\n"
                + "Trim and configuration field analysis for mixed-signal register maps: coding schemes, step "
                + "tables, decoder cost, mismatch statistics and glitches.\n\nWorkspace: " + workspace.root()
                + "\nLicence: EPL-2.0");
    }
}
