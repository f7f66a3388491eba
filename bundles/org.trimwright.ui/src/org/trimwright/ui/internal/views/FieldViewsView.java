package org.trimwright.ui.internal.views;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Table;
import org.jfree.chart.JFreeChart;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldMappingException;
import org.trimwright.analysis.FieldReport;
import org.trimwright.charts.FieldCharts;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.model.Field;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.ui.internal.doc.SpecDocument;

/**
 * The field views: charts (transfer curve with Monte Carlo envelope, DNL/INL per code, distribution of
 * max|DNL| and max|INL| with limits, segmentation cost against risk) and tables (key figures, step table, decoder
 * cost, glitches) of one field. They follow the field shown and its edits: every change of the document starts a
 * background {@link AnalysisJob} (the previous one is cancelled); finished stages replace the views. Reports are
 * cached by the value of everything the analysis reads, so undo brings a previous report back at once.
 */
public final class FieldViewsView {

    private static final int CACHE_SIZE = 48;

    private final Composite root;
    private final Label status;
    private final ProgressBar progress;
    private final Button cancel;
    private final CTabFolder tabs;
    private final Map<String, ChartCanvas> charts = new LinkedHashMap<>();
    private final Table figures;
    private final Table steps;
    private final Table costs;
    private final Table glitches;
    private final Map<AnalysisKey, FieldReport> cache = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<AnalysisKey, FieldReport> e) {
            return size() > CACHE_SIZE;
        }
    };
    private final SpecDocument.Listener docListener = (d, c) -> refresh();

    private AnalysisSettings settings = AnalysisSettings.DEFAULTS;
    private InlDefinition inlDefinition = InlDefinition.ENDPOINT;
    private SpecDocument document;
    private Field field;
    private AnalysisKey shownKey;
    private AnalysisJob job;
    private FieldReport report;
    private int stage;
    private long generation;

    public FieldViewsView(Composite parent) {
        root = new Composite(parent, SWT.NONE);
        GridLayout gl = new GridLayout(3, false);
        gl.marginHeight = 2;
        root.setLayout(gl);
        status = new Label(root, SWT.NONE);
        status.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        progress = new ProgressBar(root, SWT.HORIZONTAL);
        progress.setMaximum(3);
        GridData pd = new GridData(SWT.RIGHT, SWT.CENTER, false, false);
        pd.widthHint = 90;
        progress.setLayoutData(pd);
        cancel = new Button(root, SWT.PUSH);
        cancel.setText("Cancel");
        cancel.setEnabled(false);
        cancel.addListener(SWT.Selection, e -> cancel());
        tabs = new CTabFolder(root, SWT.BORDER | SWT.TOP);
        tabs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true, 3, 1));
        chartTab("Transfer");
        chartTab("DNL / INL");
        chartTab("Distribution");
        chartTab("Segmentation");
        figures = tableTab("Figures");
        steps = tableTab("Steps");
        costs = tableTab("Decoder");
        glitches = tableTab("Glitches");
        tabs.setSelection(0);
        root.addListener(SWT.Dispose, e -> {
            cancel();
            if (document != null) {
                document.removeListener(docListener);
            }
        });
        show(null, null);
    }

    public Control control() {
        return root;
    }

    public CTabFolder tabs() {
        return tabs;
    }

    /** The chart canvas of a tab ("Transfer", "DNL / INL", "Distribution", "Segmentation"). */
    public ChartCanvas chart(String tab) {
        return charts.get(tab);
    }

    /** The report shown now (null when none). */
    public FieldReport report() {
        return report;
    }

    /** 0 nothing, 1 coding figures, 2 preview Monte Carlo, 3 full run. */
    public int stage() {
        return stage;
    }

    public boolean isRunning() {
        return job != null;
    }

    public String statusText() {
        return status.getText();
    }

    public Table stepTable() {
        return steps;
    }

    public Table costTable() {
        return costs;
    }

    public Table glitchTable() {
        return glitches;
    }

    public Table figureTable() {
        return figures;
    }

    /** New analysis settings (e.g. from the preferences); the shown field is analysed again. */
    public void setSettings(AnalysisSettings s, InlDefinition preferredInl) {
        settings = s;
        inlDefinition = preferredInl;
        refresh();
    }

    /** Follows {@code f} of {@code doc} (null for none). */
    public void show(SpecDocument doc, Field f) {
        if (doc != document) {
            if (document != null) {
                document.removeListener(docListener);
            }
            document = doc;
            if (document != null) {
                document.addListener(docListener);
            }
        }
        field = f;
        shownKey = null;
        refresh();
    }

    /** Analyses the shown field again from scratch (ignores the cache). */
    public void rerun() {
        if (shownKey != null) {
            cache.remove(shownKey);
        }
        shownKey = null;
        refresh();
    }

    /** Stops the running analysis after its current stage. */
    public void cancel() {
        if (job != null) {
            job.cancel();
            generation++;
            job = null;
            setStatus(field == null ? "" : ElementPaths.of(field) + ": cancelled", stage);
            cancel.setEnabled(false);
        }
    }

    /** Re-reads the field; starts an analysis when anything it reads changed. */
    private void refresh() {
        if (root.isDisposed()) {
            return;
        }
        if (field == null || field.eResource() == null) {
            cancel();
            shownKey = null;
            display(null, 0);
            setStatus(document == null ? "Open a spec and select a field." : "Select a field in the spec editor.", 0);
            return;
        }
        AnalysisKey key;
        try {
            key = AnalysisKey.of(field, settings);
        } catch (FieldMappingException e) {
            cancel();
            shownKey = null;
            display(null, 0);
            setStatus("Cannot analyse " + e.getMessage(), 0);
            return;
        } catch (IllegalArgumentException e) {
            cancel();
            shownKey = null;
            display(null, 0);
            setStatus("Cannot analyse " + ElementPaths.of(field) + ": " + e.getMessage(), 0);
            return;
        }
        if (key.equals(shownKey)) {
            return;
        }
        shownKey = key;
        FieldReport cached = cache.get(key);
        if (cached != null) {
            cancel();
            display(cached, 3);
            setStatus(summary(key, cached, 3), 3);
            return;
        }
        start(key);
    }

    private void start(AnalysisKey key) {
        cancel();
        long gen = ++generation;
        Display display = root.getDisplay();
        AnalysisJob j = new AnalysisJob(key, (r, s) -> display.asyncExec(() -> {
            if (gen != generation || root.isDisposed()) {
                return;
            }
            boolean last = s == 3 || key.mismatch() == null;
            if (last) {
                cache.put(key, r);
            }
            display(r, last ? 3 : s);
            setStatus(summary(key, r, last ? 3 : s), last ? 3 : s);
        }));
        j.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                display.asyncExec(() -> {
                    if (gen != generation || root.isDisposed()) {
                        return;
                    }
                    job = null;
                    cancel.setEnabled(false);
                    if (j.failure() != null) {
                        setStatus(key.inputs().path() + ": analysis failed: " + j.failure().getMessage(), stage);
                    }
                });
            }
        });
        job = j;
        cancel.setEnabled(true);
        setStatus(key.inputs().path() + ": analysing" + (key.mismatch() == null ? "" : ", Monte Carlo "
                + key.settings().trials() + " trials") + " ...", 0);
        j.schedule();
    }

    private String summary(AnalysisKey key, FieldReport r, int s) {
        String base = key.inputs().path() + "  \u2014  " + ReportTables.key(r.coding().coding().scheme()) + ", "
                + r.coding().coding().bits() + " bits";
        if (r.mismatch().isEmpty()) {
            return base + (key.mismatch() == null ? "; no unit element, coding figures only" : "; Monte Carlo ...");
        }
        long trials = r.mismatch().get().run().trials();
        return base + "; Monte Carlo " + trials + " trials, seed " + r.settings().seed()
                + (s == 2 ? " (preview, full run going)" : "");
    }

    private void setStatus(String text, int s) {
        if (!status.isDisposed()) {
            status.setText(text);
            status.setToolTipText(text);
            progress.setSelection(job == null ? (s > 0 ? 3 : 0) : s);
        }
    }

    private void display(FieldReport r, int s) {
        report = r;
        stage = s;
        setChart("Transfer", r, FieldCharts::transfer);
        setChart("DNL / INL", r, FieldCharts::dnlInl);
        setChart("Distribution", r, FieldCharts::errorDistribution);
        setChart("Segmentation", r, FieldCharts::segmentation);
        if (r == null) {
            ReportTables.fill(figures, ReportTables.figureHeaders(), java.util.List.of());
            ReportTables.fill(steps, ReportTables.stepHeaders(), java.util.List.of());
            ReportTables.fill(costs, ReportTables.costHeaders(), java.util.List.of());
            ReportTables.fill(glitches, ReportTables.glitchHeaders(), java.util.List.of());
            return;
        }
        ReportTables.fill(figures, ReportTables.figureHeaders(), ReportTables.figures(r, inlDefinition, s));
        ReportTables.fill(steps, ReportTables.stepHeaders(), ReportTables.steps(r));
        ReportTables.fill(costs, ReportTables.costHeaders(), ReportTables.costs(r));
        ReportTables.fill(glitches, ReportTables.glitchHeaders(), ReportTables.glitches(r));
    }

    private void setChart(String tab, FieldReport r, Function<FieldReport, JFreeChart> make) {
        ChartCanvas c = charts.get(tab);
        if (r == null) {
            c.setChart(null);
            return;
        }
        try {
            c.setChart(make.apply(r));
        } catch (RuntimeException e) {
            c.setChart(null);
            status.setText(tab + " chart failed: " + e.getMessage());
        }
    }

    private void chartTab(String title) {
        ChartCanvas c = new ChartCanvas(tabs);
        CTabItem item = new CTabItem(tabs, SWT.NONE);
        item.setText(title);
        item.setControl(c.control());
        charts.put(title, c);
    }

    private Table tableTab(String title) {
        Table t = ReportTables.create(tabs);
        CTabItem item = new CTabItem(tabs, SWT.NONE);
        item.setText(title);
        item.setControl(t);
        return t;
    }
}
