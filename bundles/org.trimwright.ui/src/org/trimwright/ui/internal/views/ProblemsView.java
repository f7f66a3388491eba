package org.trimwright.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.model.spec.SpecChecks;
import org.trimwright.ui.internal.Icons;
import org.trimwright.ui.internal.doc.SpecDocument;

/**
 * The findings of the shown spec: the model validator's diagnostics (structural rules and whatever constraints
 * the validator registers), one row each with severity, element path and message, re-checked after every edit.
 * Double-click (or Enter) hands the row's element to the listener, which selects it in the editor.
 */
public final class ProblemsView {

    /** One finding. */
    public record Finding(int severity, String path, String message, EObject element) {
    }

    private final Composite root;
    private final Label summary;
    private final Table table;
    private final List<Finding> findings = new ArrayList<>();
    private final SpecDocument.Listener listener = (d, c) -> recheck();
    private SpecDocument document;

    public ProblemsView(Composite parent, Consumer<Finding> onOpen) {
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(1, false));
        summary = new Label(root, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        table = new Table(root, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL);
        table.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String[] c : new String[][] {{"Severity", "90"}, {"Element", "220"}, {"Finding", "600"}}) {
            TableColumn col = new TableColumn(table, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        table.addListener(SWT.DefaultSelection, e -> {
            int i = table.getSelectionIndex();
            if (i >= 0 && i < findings.size() && onOpen != null) {
                onOpen.accept(findings.get(i));
            }
        });
        root.addListener(SWT.Dispose, e -> show(null));
        show(null);
    }

    public Control control() {
        return root;
    }

    public Table table() {
        return table;
    }

    public List<Finding> findings() {
        return List.copyOf(findings);
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
        findings.clear();
        if (document != null) {
            collect(SpecChecks.validate(document.spec()), findings);
        }
        if (table.isDisposed()) {
            return;
        }
        table.removeAll();
        int errors = 0;
        int warnings = 0;
        for (Finding f : findings) {
            TableItem it = new TableItem(table, SWT.NONE);
            boolean error = f.severity() >= Diagnostic.ERROR;
            errors += error ? 1 : 0;
            warnings += error ? 0 : 1;
            it.setImage(0, Icons.get(error ? "error" : "warning"));
            it.setText(new String[] {error ? "error" : f.severity() == Diagnostic.WARNING ? "warning" : "info",
                f.path(), f.message()});
        }
        summary.setText(document == null ? "No spec open."
                : document.file().getFileName() + ": " + errors + " errors, " + warnings + " warnings and notes"
                + (findings.isEmpty() ? " \u2014 all checks pass." : " (double-click a row to go to the element)"));
    }

    private static void collect(Diagnostic d, List<Finding> out) {
        if (d.getChildren().isEmpty()) {
            if (d.getSeverity() != Diagnostic.OK) {
                EObject e = d.getData().stream().filter(EObject.class::isInstance).map(EObject.class::cast)
                        .findFirst().orElse(null);
                out.add(new Finding(d.getSeverity(), e == null ? "" : ElementPaths.of(e), d.getMessage(), e));
            }
            return;
        }
        for (Diagnostic c : d.getChildren()) {
            collect(c, out);
        }
    }
}
