package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.SpecEditorPart;
import org.trimwright.ui.internal.export.ExportWizard;
import org.trimwright.ui.internal.prefs.UiPreferences;

import jakarta.inject.Named;

/** Opens the export wizard on the active spec editor's document (enabled while a spec editor is active). */
public class ExportHandler {

    @CanExecute
    boolean can(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor) {
        return editor != null && editor.document() != null;
    }

    @Execute
    void execute(@Optional @Named(Topics.ACTIVE_EDITOR) SpecEditorPart editor, Shell shell) {
        if (!can(editor)) {
            return;
        }
        ExportWizard.open(shell, editor.document(), UiPreferences.load());
    }
}
