package org.trimwright.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.Finding;
import org.trimwright.analysis.validation.Severity;
import org.trimwright.analysis.validation.SpecValidation;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.SpecChecks;
import org.trimwright.ui.internal.Icons;
import org.trimwright.ui.internal.doc.SpecDocument;

/**
 * The findings of the shown spec, re-checked after every edit, one row each with severity, element path, rule id
 * and message (with the engine's advice where there is one). The structural rules run at once on the UI thread;
 * the analysis rules ({@link SpecValidation}: range, linearity, monotonic risk, glitches, safe limits) run in a
 * background job on a copy of the spec, and their result replaces the rows when it arrives. Double-click (or Enter)
 * hands the row's element to the listener, which selects it in the editor.
 */
public final class ProblemsView {

    /** One row: a finding and the live element its path names (null when the path names none). */
    public record Row(Finding finding, EObject element) {
    }

    /** Quiet time after an edit before the analysis rules run again. */
    static final int DELAY_MS = 400;

    private final Composite root;
    private final Label summary;
    private final Table table;
    private final List<Row> rows = new ArrayList<>();
    private final SpecDocument.Listener listener = (d, c) -> recheck();
    private AnalysisSettings settings = AnalysisSettings.DEFAULTS;
    private SpecDocument document;
    private Job job;
    private long generation;
    private boolean analysed;

    public ProblemsView(Composite parent, Consumer<Row> onOpen) {
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(1, false));
        summary = new Label(root, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        table = new Table(root, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL | SWT.H_SCROLL);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String[] c : new String[][] {{"Severity", "90"}, {"Element", "230"}, {"Rule", "200"},
            {"Finding", "900"}}) {
            TableColumn col = new TableColumn(table, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        table.addListener(SWT.DefaultSelection, e -> {
            int i = table.getSelectionIndex();
            if (i >= 0 && i < rows.size() && onOpen != null) {
                onOpen.accept(rows.get(i));
            }
        });
        root.addListener(SWT.Dispose, e -> {
            generation++;
            if (job != null) {
                job.cancel();
            }
            if (document != null) {
                document.removeListener(listener);
            }
        });
        show(null);
    }

    public Control control() {
        return root;
    }

    public Table table() {
        return table;
    }

    public String summaryText() {
        return summary.getText();
    }

    public List<Row> rows() {
        return List.copyOf(rows);
    }

    /** True once the analysis rules' result for the current model is shown. */
    public boolean isAnalysed() {
        return analysed;
    }

    /** Settings of the analysis rules' Monte Carlo (from the preferences). */
    public void setSettings(AnalysisSettings s) {
        settings = s;
        recheck();
    }

    /** Shows the findings of {@code doc} (null: none) and follows its edits. */
    public void show(SpecDocument doc) {
        if (document != null) {
            document.removeListener(listener);
        }
        document = doc;
        if (document != null && !root.isDisposed()) {
            document.addListener(listener);
        }
        recheck();
    }

    public SpecDocument document() {
        return document;
    }

    private void recheck() {
        if (root.isDisposed()) {
            return;
        }
        long gen = ++generation;
        if (job != null) {
            job.cancel();
            job = null;
        }
        analysed = false;
        if (document == null) {
            fill(List.of(), "No spec open.");
            return;
        }
        fill(SpecValidation.findings(SpecChecks.validate(document.spec())),
                "structural rules; analysis rules running ...");
        ChipSpec copy = EcoreUtil.copy(document.spec());
        AnalysisSettings s = settings;
        Display display = root.getDisplay();
        Job j = new Job("Checking " + document.file().getFileName()) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                if (monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                List<Finding> found;
                try {
                    found = SpecValidation.validate(copy, new ReportCache(s));
                } catch (RuntimeException e) {
                    display.asyncExec(() -> {
                        if (gen == generation && !root.isDisposed()) {
                            summary.setText("Analysis rules failed: " + e.getMessage());
                        }
                    });
                    return Status.error("validation failed", e);
                }
                display.asyncExec(() -> {
                    if (gen == generation && !root.isDisposed()) {
                        analysed = true;
                        fill(found, "structural and analysis rules, " + s.trials() + " Monte Carlo trials");
                    }
                });
                return Status.OK_STATUS;
            }
        };
        j.setSystem(true);
        job = j;
        j.schedule(DELAY_MS);
    }

    private void fill(List<Finding> findings, String scope) {
        rows.clear();
        for (Finding f : findings) {
            rows.add(new Row(f, document == null ? null : document.find(f.path())));
        }
        table.removeAll();
        int errors = 0;
        for (Row r : rows) {
            Finding f = r.finding();
            TableItem it = new TableItem(table, SWT.NONE);
            boolean error = f.severity() == Severity.ERROR;
            errors += error ? 1 : 0;
            it.setImage(0, Icons.get(error ? "error" : "warning"));
            it.setText(new String[] {f.severity().key(), f.path(), f.ruleId(),
                f.message() + (f.advice() == null ? "" : "  \u2192 " + f.advice())});
        }
        summary.setText(document == null ? scope : document.file().getFileName() + ": " + errors + " errors, "
                + (rows.size() - errors) + " warnings (" + scope + ")"
                + (rows.isEmpty() ? "" : "; double-click a row to go to the element"));
    }
}
