package org.trimwright.ui.internal.handlers;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.model.spec.SpecLoadException;
import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.SpecEditorPart;

import jakarta.inject.Named;

/** Throws away unsaved edits (after confirmation) and reads the file again. */
public class RevertHandler {

    @CanExecute
    boolean can(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        return editor != null && editor.document() != null && editor.document().isDirty();
    }

    @Execute
    void execute(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor, Shell shell) {
        if (!can(editor) || !MessageDialog.openConfirm(shell, "Revert", "Discard unsaved edits of "
                + editor.document().file().getFileName() + " and read the file again?")) {
            return;
        }
        try {
            editor.document().revert();
        } catch (SpecLoadException e) {
            MessageDialog.openError(shell, "Revert", e.getMessage());
        }
    }
}
