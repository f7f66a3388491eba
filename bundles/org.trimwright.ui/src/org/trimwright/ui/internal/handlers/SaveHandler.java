package org.trimwright.ui.internal.handlers;

import java.io.IOException;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.SpecEditorPart;

import jakarta.inject.Named;

/** Saves the active spec editor's document (atomically: temporary file, fsync, rename). */
public class SaveHandler {

    @CanExecute
    boolean can(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        return editor != null && editor.document() != null && editor.document().isDirty();
    }

    @Execute
    void execute(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor, Shell shell) {
        if (editor == null || editor.document() == null) {
            return;
        }
        try {
            editor.document().save();
        } catch (IOException e) {
            MessageDialog.openError(shell, "Save", "Cannot save " + editor.document().file() + ":\n" + e);
        }
    }
}
