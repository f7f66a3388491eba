package org.trimwright.ui.internal.views;

import java.util.concurrent.CancellationException;
import java.util.function.BiConsumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldReport;

/**
 * Computes a field's report in the background, in stages so that the views fill in early and a cancel takes
 * effect between stages: (1) coding figures only (step table, decoder cost, glitches); (2) a preview Monte Carlo
 * with at most {@link #PREVIEW_TRIALS} trials; (3) the full run with the configured trials. Each finished stage
 * is handed to the sink (on the job's thread) with its stage number. A cancel also interrupts the job's thread,
 * which stops a running Monte Carlo within one block of trials.
 */
final class AnalysisJob extends Job {

    /** Trials of the preview stage. */
    static final long PREVIEW_TRIALS = 2_000;

    private final AnalysisKey key;
    private final BiConsumer<FieldReport, Integer> sink;
    private volatile Throwable failure;

    AnalysisJob(AnalysisKey key, BiConsumer<FieldReport, Integer> sink) {
        super("Analysing " + key.inputs().path());
        this.key = key;
        this.sink = sink;
        setUser(false);
        setPriority(Job.LONG);
    }

    Throwable failure() {
        return failure;
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        AnalysisSettings s = key.settings();
        boolean statistics = key.mismatch() != null;
        monitor.beginTask(getName(), statistics ? 3 : 1);
        try {
            monitor.subTask("coding: step table, decoder cost, glitches");
            FieldReport coding = FieldAnalyzer.analyze(name(), key.inputs(), null, null, s);
            sink.accept(coding, 1);
            monitor.worked(1);
            if (!statistics) {
                return Status.OK_STATUS;
            }
            if (s.trials() > PREVIEW_TRIALS) {
                if (monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                monitor.subTask("Monte Carlo preview, " + PREVIEW_TRIALS + " trials");
                sink.accept(FieldAnalyzer.analyze(name(), key.inputs(), key.mismatch(), key.sizing(),
                        s.withTrials(PREVIEW_TRIALS)), 2);
            }
            monitor.worked(1);
            if (monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            monitor.subTask("Monte Carlo, " + s.trials() + " trials");
            sink.accept(FieldAnalyzer.analyze(name(), key.inputs(), key.mismatch(), key.sizing(), s), 3);
            monitor.worked(1);
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            Thread.interrupted();
            return Status.CANCEL_STATUS;
        } catch (RuntimeException e) {
            failure = e;
            return Status.error("analysis of " + key.inputs().path() + " failed: " + e.getMessage(), e);
        } finally {
            monitor.done();
        }
    }

    @Override
    protected void canceling() {
        Thread t = getThread();
        if (t != null) {
            t.interrupt();
        }
    }

    private String name() {
        String p = key.inputs().path();
        return p.substring(p.lastIndexOf('/') + 1);
    }
}
