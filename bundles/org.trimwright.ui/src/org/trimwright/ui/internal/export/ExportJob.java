package org.trimwright.ui.internal.export;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CopyOnWriteArrayList;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.trimwright.export.ExportOptions;
import org.trimwright.export.ExportProgress;
import org.trimwright.export.SpecExport;
import org.trimwright.model.ChipSpec;

/**
 * Runs {@link SpecExport#export} in the background on a copy of the spec (taken on the UI thread, so later edits do
 * not reach a running export). The job's progress monitor is fed from {@link ExportProgress}: work units are scaled
 * to {@value #TICKS} ticks and each message becomes the sub-task. Every progress callback first checks
 * {@link IProgressMonitor#isCanceled()} and, when set, throws {@link OperationCanceledException}, which unwinds the
 * exporter (its document threads stop at their next callback); a cancel also interrupts the job's thread, so a
 * running Monte Carlo stops within one block of trials. Fields being analysed on other cores at that moment finish
 * in the background and are discarded. Watchers (e.g. the progress window) hear every callback on the exporting
 * threads.
 */
public final class ExportJob extends Job {

    /** Ticks of the job's progress monitor. */
    public static final int TICKS = 1000;

    private final ChipSpec spec;
    private final Path folder;
    private final ExportOptions options;
    private final List<ExportProgress> watchers = new CopyOnWriteArrayList<>();
    private final Object lock = new Object();
    private volatile ExportOutcome outcome;
    private int ticksGiven;

    /**
     * @param spec    the spec to export; must not be edited while the job runs (pass a copy)
     * @param folder  output folder (created if needed)
     * @param options formats, analysis settings and date
     */
    public ExportJob(ChipSpec spec, Path folder, ExportOptions options) {
        super("Exporting " + spec.getName() + " to " + folder);
        this.spec = spec;
        this.folder = folder;
        this.options = options;
        setUser(true);
        setPriority(Job.LONG);
    }

    /** Adds a watcher of the exporter's progress (called on the exporting threads, serialised). */
    public void addWatcher(ExportProgress watcher) {
        watchers.add(watcher);
    }

    /** How the export ended; null while it runs. */
    public ExportOutcome outcome() {
        return outcome;
    }

    /** Ticks given to the job's monitor so far ({@value #TICKS} when the exporter reported its end). */
    public int ticksGiven() {
        synchronized (lock) {
            return ticksGiven;
        }
    }

    public Path folder() {
        return folder;
    }

    public ExportOptions options() {
        return options;
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        long t0 = System.nanoTime();
        monitor.beginTask(getName(), TICKS);
        ExportProgress feed = (done, total, message) -> {
            synchronized (lock) {
                if (monitor.isCanceled()) {
                    throw new OperationCanceledException();
                }
                int target = total <= 0 ? TICKS : (int) Math.min(TICKS, (long) TICKS * done / total);
                if (target > ticksGiven) {
                    monitor.worked(target - ticksGiven);
                    ticksGiven = target;
                }
                monitor.subTask(message);
                for (ExportProgress w : watchers) {
                    w.report(done, total, message);
                }
            }
        };
        try {
            SpecExport.Result r = SpecExport.export(spec, folder, options, feed);
            outcome = new ExportOutcome(ExportOutcome.State.FINISHED, folder, r.files(), null, since(t0));
            return Status.OK_STATUS;
        } catch (OperationCanceledException | CancellationException e) {
            return cancelled(t0);
        } catch (IOException | UncheckedIOException e) {
            if (monitor.isCanceled()) {
                return cancelled(t0);
            }
            return failed(t0, "cannot write to " + folder + ": " + e.getMessage(), e);
        } catch (RuntimeException e) {
            if (monitor.isCanceled()) {
                return cancelled(t0);
            }
            return failed(t0, "export of " + spec.getName() + " failed: " + e, e);
        } finally {
            Thread.interrupted();
            monitor.done();
        }
    }

    private IStatus cancelled(long t0) {
        outcome = new ExportOutcome(ExportOutcome.State.CANCELLED, folder, List.of(), null, since(t0));
        return Status.CANCEL_STATUS;
    }

    private IStatus failed(long t0, String message, Exception e) {
        outcome = new ExportOutcome(ExportOutcome.State.FAILED, folder, List.of(), message, since(t0));
        return Status.error(message, e);
    }

    private static double since(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }

    @Override
    protected void canceling() {
        Thread t = getThread();
        if (t != null) {
            t.interrupt();
        }
    }
}
