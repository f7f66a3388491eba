package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.widgets.Shell;
import org.osgi.service.prefs.BackingStoreException;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.prefs.PreferencesDialog;
import org.trimwright.ui.internal.prefs.UiPreferences;

/** Opens the preferences dialog, stores the result and tells the views. */
public class PreferencesHandler {

    @Execute
    void execute(Shell shell, IEventBroker broker) {
        PreferencesDialog d = new PreferencesDialog(shell, UiPreferences.load());
        if (d.open() != Window.OK) {
            return;
        }
        try {
            d.value().store();
        } catch (BackingStoreException e) {
            MessageDialog.openError(shell, "Preferences", "Cannot store the preferences: " + e.getMessage());
        }
        broker.post(Topics.PREFERENCES_CHANGED, d.value());
    }
}
