package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.SpecEditorPart;

import jakarta.inject.Named;

/** Undoes the last edit of the active spec editor. */
public class UndoHandler {

    @CanExecute
    boolean can(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        return editor != null && editor.document() != null && editor.document().canUndo();
    }

    @Execute
    void execute(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        if (can(editor)) {
            editor.document().undo();
        }
    }
}
