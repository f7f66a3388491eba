package org.trimwright.ui.internal.export;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;

import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Shell;

/**
 * A small modeless window that follows an {@link ExportJob}: the exporter's current step, a bar in
 * {@link ExportJob#TICKS} ticks, and a Cancel button that cancels the job. The workbench stays usable meanwhile.
 * Updates reach the UI thread through {@link Display#asyncExec}, at most one pending at a time. When the job ends the
 * window closes and {@code onDone} receives the outcome on the UI thread.
 */
public final class ExportProgressWindow {

    private final Shell shell;
    private final Label message;
    private final ProgressBar bar;
    private final Button cancel;
    private final AtomicBoolean pending = new AtomicBoolean();
    private volatile int ticks;
    private volatile String step;

    private ExportProgressWindow(Shell parent, ExportJob job) {
        step = "analysing the fields (Monte Carlo, " + job.options().settings().trials() + " trials each)...";
        shell = new Shell(parent, SWT.DIALOG_TRIM | SWT.MODELESS);
        shell.setText("Exporting " + job.folder().getFileName());
        shell.setLayout(new GridLayout(2, false));
        message = new Label(shell, SWT.NONE);
        message.setText(step);
        GridData md = new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1);
        md.widthHint = 420;
        message.setLayoutData(md);
        bar = new ProgressBar(shell, SWT.HORIZONTAL);
        bar.setMaximum(ExportJob.TICKS);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        cancel = new Button(shell, SWT.PUSH);
        cancel.setText("Cancel");
        cancel.addListener(SWT.Selection, e -> {
            cancel.setEnabled(false);
            message.setText("cancelling...");
            job.cancel();
        });
        shell.pack();
    }

    /**
     * Opens a window that follows {@code job} (not yet scheduled) and calls {@code onDone} on the UI thread when it
     * ends. Returns the window (the caller schedules the job).
     */
    public static ExportProgressWindow follow(Shell parent, ExportJob job, Consumer<ExportOutcome> onDone) {
        Display display = parent.getDisplay();
        ExportProgressWindow w = new ExportProgressWindow(parent, job);
        job.addWatcher((done, total, msg) -> {
            w.ticks = total <= 0 ? ExportJob.TICKS : (int) Math.min(ExportJob.TICKS, (long) ExportJob.TICKS * done / total);
            w.step = msg;
            if (w.pending.compareAndSet(false, true)) {
                display.asyncExec(w::refresh);
            }
        });
        job.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                if (display.isDisposed()) {
                    return;
                }
                display.asyncExec(() -> {
                    if (!w.shell.isDisposed()) {
                        w.shell.dispose();
                    }
                    ExportOutcome o = job.outcome();
                    onDone.accept(o != null ? o : new ExportOutcome(ExportOutcome.State.CANCELLED, job.folder(),
                            java.util.List.of(), null, 0));
                });
            }
        });
        w.shell.open();
        return w;
    }

    private void refresh() {
        pending.set(false);
        if (shell.isDisposed()) {
            return;
        }
        bar.setSelection(ticks);
        if (cancel.isEnabled()) {
            message.setText(step);
        }
    }

    /** The window (for tests and screenshots); disposed when the job has ended. */
    public Shell shell() {
        return shell;
    }

    /** The Cancel button. */
    public Button cancelButton() {
        return cancel;
    }

    /** The bar's position in ticks. */
    public int barSelection() {
        return bar.getSelection();
    }
}
