package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Stream;

import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.trimwright.export.ExportFormat;
import org.trimwright.model.Field;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.ui.internal.doc.SpecDocument;
import org.trimwright.ui.internal.export.ExportJob;
import org.trimwright.ui.internal.export.ExportOutcome;
import org.trimwright.ui.internal.export.ExportPage;
import org.trimwright.ui.internal.export.ExportWizard;
import org.trimwright.ui.internal.prefs.UiPreferences;

/**
 * Drives the export wizard in a real window: page validation, and a real export of the demo through the wizard's
 * Finish button, as a background job, producing only the formats ticked and using the unsaved model.
 */
class ExportWizardTest {

    private static final long WAIT = 90_000;

    private Display display;
    private Shell shell;
    private SpecDocument doc;
    private ExportWizard wizard;
    private WizardDialog dialog;
    private final AtomicReference<ExportOutcome> outcome = new AtomicReference<>();

    @BeforeEach
    void openWizard() throws Exception {
        display = Ui.display();
        shell = new Shell(display);
        shell.setText("Trimwright export test");
        shell.setSize(900, 700);
        shell.open();
        doc = SpecDocument.open(Ui.demoCopy());
        wizard = new ExportWizard(doc, new UiPreferences(300, 7, UiPreferences.DEFAULTS.inlDefinition(), 2),
                outcome::set);
        dialog = new WizardDialog(shell, wizard);
        dialog.setBlockOnOpen(false);
        dialog.open();
        Ui.settle(200);
    }

    @AfterEach
    void close() {
        if (dialog.getShell() != null && !dialog.getShell().isDisposed()) {
            dialog.close();
        }
        if (!shell.isDisposed()) {
            shell.dispose();
        }
        Ui.settle(50);
    }

    private static Button button(Composite root, String label) {
        for (Control c : root.getChildren()) {
            if (c instanceof Button b && b.getText().replace("&", "").equals(label)) {
                return b;
            }
            if (c instanceof Composite k) {
                Button found = button(k, label);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private Button finish() {
        Button b = button(dialog.getShell(), "Finish");
        assertNotNull(b, "the wizard has a Finish button");
        return b;
    }

    private void type(org.eclipse.swt.widgets.Text t, String value) {
        t.setText(value);
        Ui.settle(20);
    }

    private void tick(Button box, boolean on) {
        box.setSelection(on);
        box.notifyListeners(SWT.Selection, new Event());
        Ui.settle(20);
    }

    @Test
    void pageRejectsUnusableFolderNoFormatAndBadNumbers() throws Exception {
        ExportPage page = wizard.page();
        for (ExportFormat f : ExportFormat.values()) {
            assertTrue(page.formatButton(f).getSelection(), f + " ticked by default");
        }
        assertEquals("300", page.trialsText().getText(), "trials default from the preferences");
        assertEquals("7", page.seedText().getText(), "seed default from the preferences");
        assertEquals("Analog architecture team (fictional)", page.authorLabel().getText(), "author from the spec");
        assertTrue(page.folderText().getText().endsWith("export-TMK3"), page.folderText().getText());
        assertNull(page.getErrorMessage());
        assertTrue(page.isPageComplete());
        assertTrue(finish().isEnabled());
        Ui.screenshot(dialog.getShell(), "20-export-wizard");

        Path dir = Files.createTempDirectory("trimwright-export-wizard");
        Path file = Files.writeString(dir.resolve("not-a-folder.txt"), "x");
        type(page.folderText(), file.toString());
        assertEquals(file + " is a file, not a folder.", page.getErrorMessage());
        assertFalse(page.isPageComplete());
        assertFalse(finish().isEnabled(), "Finish disabled while the folder is unusable");
        Ui.screenshot(dialog.getShell(), "21-export-wizard-bad-folder");

        type(page.folderText(), file.resolve("sub").toString());
        assertTrue(page.getErrorMessage().contains("is a file, not a folder"), page.getErrorMessage());
        type(page.folderText(), "relative/out");
        assertTrue(page.getErrorMessage().startsWith("Give the output folder as a full path"), page.getErrorMessage());
        type(page.folderText(), "  ");
        assertEquals("Choose an output folder.", page.getErrorMessage());

        type(page.folderText(), dir.resolve("new/deeper").toString());
        assertNull(page.getErrorMessage(), "a folder that does not exist yet under a writable one is fine");
        for (ExportFormat f : ExportFormat.values()) {
            tick(page.formatButton(f), false);
        }
        assertEquals("Choose at least one format.", page.getErrorMessage());
        assertFalse(finish().isEnabled());
        tick(page.formatButton(ExportFormat.CSV), true);
        assertNull(page.getErrorMessage());

        type(page.trialsText(), "many");
        assertEquals("Trials: 'many' is not a whole number.", page.getErrorMessage());
        type(page.trialsText(), "0");
        assertEquals("Trials must be at least 1.", page.getErrorMessage());
        type(page.trialsText(), "500");
        type(page.dateText(), "2026-13-01");
        assertTrue(page.getErrorMessage().startsWith("Date:"), page.getErrorMessage());
        type(page.dateText(), "2026-12-01");
        assertNull(page.getErrorMessage());
        assertTrue(finish().isEnabled());
        assertFalse(Files.exists(dir.resolve("new")), "validation writes nothing");
    }

    @Test
    void finishExportsTheUnsavedSpecInTheTickedFormatsOnly() throws Exception {
        // An unsaved edit: rename REF/REF_TRIM0/VREF. The export must use it; the file on disk must not change.
        Field vref = ElementPaths.findField(doc.spec(), "REF/REF_TRIM0/VREF");
        assertNotNull(vref);
        assertTrue(doc.execute(SetCommand.create(doc.domain(), vref, TrimwrightPackage.eINSTANCE.getField_Name(),
                "VREF_EDITED")));
        assertTrue(doc.isDirty());
        String onDisk = Files.readString(doc.file());

        ExportPage page = wizard.page();
        Path out = Files.createTempDirectory("trimwright-export-wizard").resolve("out");
        type(page.folderText(), out.toString());
        for (ExportFormat f : ExportFormat.values()) {
            tick(page.formatButton(f), f == ExportFormat.CSV || f == ExportFormat.HEADER);
        }
        assertNull(page.getErrorMessage());
        Button finish = finish();
        long t0 = System.nanoTime();
        finish.notifyListeners(SWT.Selection, new Event());
        assertTrue(dialog.getShell() == null || dialog.getShell().isDisposed(), "Finish closes the wizard at once");
        ExportJob job = wizard.job();
        assertNotNull(job, "Finish started a job");
        assertNotNull(wizard.progressWindow());
        Ui.pumpUntil("export outcome", () -> outcome.get() != null, WAIT);
        double seconds = (System.nanoTime() - t0) / 1e9;
        ExportOutcome o = outcome.get();
        assertEquals(ExportOutcome.State.FINISHED, o.state(), String.valueOf(o.error()));
        assertEquals(ExportJob.TICKS, job.ticksGiven(), "the job's monitor was fed to the end from ExportProgress");
        assertTrue(wizard.progressWindow().shell().isDisposed(), "progress window closed when the job ended");

        List<Path> written;
        try (Stream<Path> s = Files.walk(out)) {
            written = s.filter(Files::isRegularFile).sorted().toList();
        }
        assertEquals(written, o.files().stream().sorted().toList(), "outcome lists exactly the files in the folder");
        for (Path p : written) {
            String name = out.relativize(p).toString();
            assertTrue(name.startsWith("csv/") && name.endsWith(".csv") || name.equals("TMK3_regs.h"),
                    "only CSV tables and the C header: " + name);
        }
        assertTrue(Files.exists(out.resolve("TMK3_regs.h")));
        assertTrue(Files.readString(out.resolve("TMK3_regs.h")).contains("VREF_EDITED"),
                "the header holds the unsaved rename");
        assertTrue(Files.exists(out.resolve("csv/REF_REF_TRIM0_VREF_EDITED.csv")), "CSV named after the edit");
        assertTrue(written.size() > 5, "a CSV per analysed field of the demo: " + written.size());
        assertTrue(doc.isDirty(), "exporting does not save");
        assertEquals(onDisk, Files.readString(doc.file()), "the spec file is untouched");
        System.out.printf("export wizard: %d files (CSV + header) of the demo in %.2f s (job %.2f s)%n",
                written.size(), seconds, o.seconds());
    }

    @Test
    void cancelStopsALongExportAndReportsItCancelled() throws Exception {
        ExportPage page = wizard.page();
        Path out = Files.createTempDirectory("trimwright-export-wizard").resolve("cancelled");
        type(page.folderText(), out.toString());
        // Many trials: the analysis of the demo's fields takes far longer than the moment until Cancel is pressed.
        type(page.trialsText(), "1000000");
        assertNull(page.getErrorMessage());
        finish().notifyListeners(SWT.Selection, new Event());
        ExportJob job = wizard.job();
        Ui.pumpUntil("export job running", () -> job.getState() == org.eclipse.core.runtime.jobs.Job.RUNNING, 10_000);
        Ui.settle(300);
        Ui.screenshot(wizard.progressWindow().shell(), "22-export-progress");
        Button cancel = wizard.progressWindow().cancelButton();
        long t0 = System.nanoTime();
        cancel.notifyListeners(SWT.Selection, new Event());
        Ui.pumpUntil("cancelled outcome", () -> outcome.get() != null, WAIT);
        double latency = (System.nanoTime() - t0) / 1e9;
        assertEquals(ExportOutcome.State.CANCELLED, outcome.get().state());
        assertTrue(outcome.get().files().isEmpty());
        assertTrue(wizard.progressWindow().shell().isDisposed());
        assertFalse(Files.exists(out.resolve("TMK3-spec.html")), "documents are written only after the analysis");
        assertTrue(latency < 10, "cancel took effect in " + latency + " s");
        System.out.printf("export wizard: cancel took effect after %.2f s%n", latency);
    }
}
