package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.ui.internal.doc.SpecDocument;
import org.trimwright.ui.internal.editor.SpecEditorView;
import org.trimwright.ui.internal.views.FieldViewsView;
import org.trimwright.ui.internal.views.ProblemsView;

/**
 * Drives the editor and the field views in a real window: open the demo, edit a field's coding through the form,
 * undo, edit again, save, reopen, and check that the charts' data follow each state of the model.
 */
class SpecEditorRoundTripTest {

    private static final TrimwrightPackage P = TrimwrightPackage.eINSTANCE;
    private static final String FINE = "OSC/OSC_TRIM/FREQ_FINE";
    private static final long WAIT = 90_000;

    private Display display;
    private Shell shell;
    private SpecEditorView editor;
    private FieldViewsView views;
    private ProblemsView problems;

    @BeforeEach
    void openWindow() {
        display = Ui.display();
        shell = new Shell(display);
        shell.setText("Trimwright test");
        shell.setSize(1500, 940);
        shell.setLayout(new FillLayout());
    }

    @AfterEach
    void closeWindow() {
        if (shell != null && !shell.isDisposed()) {
            shell.dispose();
        }
        Ui.settle(50);
    }

    private SpecDocument open(Path file) throws Exception {
        for (var c : shell.getChildren()) {
            c.dispose();
        }
        SpecDocument doc = SpecDocument.open(file);
        SashForm outer = new SashForm(shell, SWT.HORIZONTAL);
        SashForm left = new SashForm(outer, SWT.VERTICAL);
        editor = new SpecEditorView(left, doc);
        problems = new ProblemsView(left, f -> editor.select(f.element()));
        left.setWeights(68, 32);
        views = new FieldViewsView(outer);
        outer.setWeights(55, 45);
        problems.show(doc);
        editor.addSelectionListener(e -> views.show(doc, e instanceof Field f ? f : null));
        shell.layout(true, true);
        shell.open();
        Ui.settle(200);
        return doc;
    }

    private Field selectField(SpecDocument doc, String path) {
        Field f = ElementPaths.findField(doc.spec(), path);
        assertNotNull(f, path);
        editor.select(f);
        Ui.pumpUntil("selection of " + path, () -> editor.selection() == f, 5_000);
        return f;
    }

    private void awaitFull(CodingScheme scheme) {
        Ui.pumpUntil("full analysis with " + scheme, () -> views.stage() == 3 && !views.isRunning()
                && views.report() != null
                && views.report().coding().coding().scheme().name().equals(scheme.name()), WAIT);
        Ui.settle(150);
    }

    /** Largest DNL sigma in the DNL/INL chart's data (series 0). */
    private double chartMaxDnlSigma() {
        JFreeChart c = views.chart("DNL / INL").chart();
        assertNotNull(c, "DNL/INL chart shown");
        XYDataset d = ((XYPlot) c.getPlot()).getDataset();
        double max = 0;
        for (int i = 0; i < d.getItemCount(0); i++) {
            max = Math.max(max, d.getYValue(0, i));
        }
        return max;
    }

    /** Highest nominal value in the transfer chart's data. */
    private double chartTopValue() {
        XYDataset d = ((XYPlot) views.chart("Transfer").chart().getPlot()).getDataset(0);
        return d.getYValue(0, d.getItemCount(0) - 1);
    }

    private void select(Combo combo, String item) {
        int i = combo.indexOf(item);
        assertTrue(i >= 0, item + " offered");
        combo.select(i);
        combo.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        Ui.settle(30);
    }

    private void type(Text text, String value) {
        text.setText(value);
        text.notifyListeners(SWT.DefaultSelection, new org.eclipse.swt.widgets.Event());
        Ui.settle(30);
    }

    @Test
    void codingEditUndoSaveReopenAndChartsFollow() throws Exception {
        Path file = Ui.demoCopy();
        SpecDocument doc = open(file);
        Field fine = selectField(doc, FINE);
        awaitFull(CodingScheme.SEGMENTED);
        // FREQ_FINE: 3 unary + 3 binary bits, unit sigma 1 % (demo spec). The worst step is the unary/binary
        // carry: one element of 8 units turns on while 1 + 2 + 4 units turn off. With independent elements the
        // variances add and an element of k units has sigma sqrt(k) s_u (the element model of DESIGN.md), so
        // sigma = sqrt(8 + 7) * 0.01 LSB (elementary probability: variance of a sum of independent Gaussians).
        assertEquals(Math.sqrt(15) * 0.01, chartMaxDnlSigma(), 1e-9);
        Ui.screenshot(shell, "01-editor-segmented-transfer");

        Combo scheme = (Combo) editor.form().controlFor(P.getCoding_Scheme());
        select(scheme, "thermometer");
        assertEquals(CodingScheme.THERMOMETER, fine.getCoding().getScheme());
        assertTrue(doc.isDirty(), "dirty after an edit");
        assertTrue(doc.canUndo());
        awaitFull(CodingScheme.THERMOMETER);
        // Thermometer: every step turns on exactly one unit element, so every DNL sigma is s_u = 0.01 LSB
        // (definition of unary coding; same element model).
        assertEquals(0.01, chartMaxDnlSigma(), 1e-9);
        assertEquals(63, views.report().coding().stepTable().map().layout().size(),
                "a 6-bit thermometer decoder has 2^6 - 1 outputs (definition of thermometer code)");
        assertEquals(64, views.stepTable().getItemCount());

        doc.undo();
        Ui.settle(30);
        assertEquals(CodingScheme.SEGMENTED, fine.getCoding().getScheme());
        assertEquals("segmented", scheme.getText(), "form follows the undo");
        assertFalse(doc.isDirty(), "undo back to the saved state is clean");
        awaitFull(CodingScheme.SEGMENTED);
        assertEquals(Math.sqrt(15) * 0.01, chartMaxDnlSigma(), 1e-9);

        doc.redo();
        assertEquals(CodingScheme.THERMOMETER, fine.getCoding().getScheme());
        Text step = (Text) editor.form().controlFor(P.getAnalogTarget_Step());
        type(step, "0.5kHz");
        assertEquals(500.0, fine.getTarget().getStep(), 0.0);
        awaitFull(CodingScheme.THERMOMETER);
        // Offset binary 6 bits: the top code is s = +31 steps; nominal value = atZero + s * step = 0 + 31 * 500 Hz
        // (definition of the transfer in DESIGN.md).
        Ui.pumpUntil("transfer with the new step", () -> Math.abs(chartTopValue() - 31 * 500.0) < 1e-6, WAIT);
        Ui.screenshot(shell, "02-editor-thermometer-edited");

        doc.save();
        assertFalse(doc.isDirty());
        String saved = Files.readString(file);
        assertTrue(saved.contains("scheme=\"thermometer\""), "saved file holds the edit");

        SpecDocument again = open(file);
        Field reopened = selectField(again, FINE);
        assertEquals(CodingScheme.THERMOMETER, reopened.getCoding().getScheme());
        assertEquals(500.0, reopened.getTarget().getStep(), 0.0);
        awaitFull(CodingScheme.THERMOMETER);
        assertEquals(0.01, chartMaxDnlSigma(), 1e-9);
        assertEquals(31 * 500.0, chartTopValue(), 1e-6);
        assertEquals("thermometer", ((Combo) editor.form().controlFor(P.getCoding_Scheme())).getText());
    }

    @Test
    void unitAwareInputAcceptsPrefixesAndExplainsBadInput() throws Exception {
        SpecDocument doc = open(Ui.demoCopy());
        Field vref = selectField(doc, "REF/REF_TRIM0/VREF");
        Text step = (Text) editor.form().controlFor(P.getAnalogTarget_Step());
        assertEquals("2mV", step.getText(), "shown with an SI prefix");
        type(step, "4mV");
        assertEquals(0.004, vref.getTarget().getStep(), 1e-15);
        type(step, "1.5uA");
        assertEquals(0.004, vref.getTarget().getStep(), 1e-15, "a current is refused for a voltage trim");
        assertTrue(editor.form().message().contains("A") && editor.form().message().contains("V"),
                editor.form().message());
        type(step, "four millivolts");
        assertTrue(editor.form().message().contains("cannot read"), editor.form().message());
        type(step, "3.5 mV");
        assertEquals(0.0035, vref.getTarget().getStep(), 1e-15);
        assertEquals("", editor.form().message());
        Ui.screenshot(shell, "03-editor-unit-input");
        doc.undo();
        doc.undo();
        assertEquals(0.002, vref.getTarget().getStep(), 1e-15);
    }

    @Test
    void bitMapShowsOwnersAndFindingsSelectTheField() throws Exception {
        SpecDocument doc = open(Ui.demoCopy());
        Field fine = selectField(doc, FINE);
        assertEquals(java.util.List.of(fine), editor.form().bitMap().owners(10));
        assertEquals(java.util.List.of(fine), editor.form().bitMap().owners(15));
        Field coarse = ElementPaths.findField(doc.spec(), "OSC/OSC_TRIM/FREQ_COARSE");
        assertEquals(java.util.List.of(coarse), editor.form().bitMap().owners(9));

        Ui.pumpUntil("analysis rules of the demo", problems::isAnalysed, WAIT);
        int before = problems.rows().size();
        Text offset = (Text) editor.form().controlFor(P.getField_BitOffset());
        type(offset, "8");
        assertEquals(8, fine.getBitOffset());
        assertEquals(2, editor.form().bitMap().owners(9).size(), "bits 8 and 9 now claimed twice");
        assertTrue(problems.rows().stream().anyMatch(r -> r.finding().message().contains("overlap")),
                "the overlap is reported at once by the structural rules: " + problems.rows());
        Ui.pumpUntil("analysis rules after the edit", problems::isAnalysed, WAIT);
        assertTrue(problems.rows().stream().anyMatch(r -> r.finding().message().contains("overlap")),
                problems.rows().toString());
        Ui.settle(100);
        assertTrue(problems.isAnalysed() && problems.summaryText().contains("analysis rules,"),
                problems.summaryText());
        Ui.screenshot(shell, "04-findings-overlap");

        editor.select(doc.spec());
        Ui.settle(50);
        int row = -1;
        for (int i = 0; i < problems.rows().size(); i++) {
            EObject e = problems.rows().get(i).element();
            if (e == fine || e == coarse) {
                row = i;
            }
        }
        assertTrue(row >= 0, "a finding names one of the overlapping fields: " + problems.rows());
        problems.table().setSelection(row);
        problems.table().notifyListeners(SWT.DefaultSelection, new org.eclipse.swt.widgets.Event());
        Ui.settle(50);
        assertSame(problems.rows().get(row).element(), editor.selection(), "double-click selects the field");
        doc.undo();
        assertEquals(10, fine.getBitOffset());
        Ui.pumpUntil("analysis rules after the undo", problems::isAnalysed, WAIT);
        assertEquals(before, problems.rows().size());
    }

    @Test
    void chartScreensAreRendered() throws Exception {
        SpecDocument doc = open(Ui.demoCopy());
        selectField(doc, "REF/REF_TRIM1/CURV");
        awaitFull(CodingScheme.THERMOMETER);
        selectField(doc, FINE);
        awaitFull(CodingScheme.SEGMENTED);
        String[] tabs = {"Transfer", "DNL / INL", "Distribution", "Segmentation"};
        for (int i = 0; i < tabs.length; i++) {
            views.tabs().setSelection(i);
            Ui.settle(300);
            assertNotNull(views.chart(tabs[i]).imageData(), tabs[i] + " painted");
            Ui.save(views.chart(tabs[i]).imageData(), "1" + i + "-chart-" + tabs[i].replace(" / ", "-")
                    .toLowerCase());
        }
        views.tabs().setSelection(5);
        Ui.settle(200);
        Ui.screenshot(shell, "05-step-table");
        views.tabs().setSelection(4);
        Ui.settle(200);
        Ui.screenshot(shell, "06-figures");
    }
}
