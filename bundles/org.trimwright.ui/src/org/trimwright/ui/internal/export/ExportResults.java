package org.trimwright.ui.internal.export;

import java.util.List;
import java.util.Locale;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Shell;

/** Tells the user how an export ended, in a message dialog opened after the job (the UI never waits on it). */
public final class ExportResults {

    /** Files listed by name in the dialog; the rest are counted. */
    static final int LISTED = 15;

    private ExportResults() {
    }

    /** The dialog's text for {@code o}. */
    public static String text(ExportOutcome o) {
        return switch (o.state()) {
            case FINISHED -> {
                StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "Wrote %d files to %s in %.1f s:%n",
                        o.files().size(), o.folder(), o.seconds()));
                List<String> names = o.files().stream().map(p -> o.folder().relativize(p).toString()).toList();
                names.stream().limit(LISTED).forEach(n -> b.append("  ").append(n).append('\n'));
                if (names.size() > LISTED) {
                    b.append("  ... and ").append(names.size() - LISTED).append(" more\n");
                }
                yield b.toString();
            }
            case CANCELLED -> "Export cancelled. Files already written stay in " + o.folder()
                    + "; a file being written at that moment may be incomplete. Export again for a consistent set.";
            case FAILED -> "Export failed: " + o.error();
        };
    }

    /** Shows {@link #text} in a dialog on {@code shell} (nothing when the shell is gone). */
    public static void show(Shell shell, ExportOutcome o) {
        if (shell == null || shell.isDisposed()) {
            return;
        }
        switch (o.state()) {
            case FINISHED -> MessageDialog.openInformation(shell, "Export finished", text(o));
            case CANCELLED -> MessageDialog.openWarning(shell, "Export cancelled", text(o));
            case FAILED -> MessageDialog.openError(shell, "Export failed", text(o));
        }
    }
}
