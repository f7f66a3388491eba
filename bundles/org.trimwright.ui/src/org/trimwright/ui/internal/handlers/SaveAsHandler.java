package org.trimwright.ui.internal.handlers;

import java.io.IOException;
import java.nio.file.Path;
import java.nio.file.Paths;

import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.ui.internal.workspace.Workspace;
import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.SpecEditorPart;

import jakarta.inject.Named;

/** Saves the active spec under a new file name; the editor then edits that file. */
public class SaveAsHandler {

    @CanExecute
    boolean can(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        return editor != null && editor.document() != null;
    }

    @Execute
    void execute(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor, Shell shell, IEventBroker broker) {
        if (!can(editor)) {
            return;
        }
        FileDialog d = new FileDialog(shell, SWT.SAVE);
        d.setText("Save Spec As");
        d.setFilterExtensions(new String[] {"*.trimspec"});
        d.setFilterPath(editor.document().file().getParent().toString());
        d.setFileName(editor.document().file().getFileName().toString());
        d.setOverwrite(true);
        String chosen = d.open();
        if (chosen == null) {
            return;
        }
        Path target = Paths.get(Workspace.specFileName(chosen));
        try {
            editor.document().saveAs(target);
            editor.rememberFile();
        } catch (IOException e) {
            MessageDialog.openError(shell, "Save As", "Cannot save " + target + ":\n" + e);
        }
        broker.post(Topics.WORKSPACE_CHANGED, target.toString());
    }
}
