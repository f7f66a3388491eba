package org.trimwright.ui.internal.export;

import java.nio.file.Path;
import java.util.function.Consumer;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.widgets.Shell;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.export.ExportOptions;
import org.trimwright.export.text.CNames;
import org.trimwright.model.ChipSpec;
import org.trimwright.ui.internal.doc.SpecDocument;
import org.trimwright.ui.internal.prefs.UiPreferences;

/**
 * Exports the control spec of an open document. Finish copies the document's current model (unsaved edits
 * included) on the UI thread, schedules an {@link ExportJob} on the copy, opens an {@link ExportProgressWindow}
 * that follows it, and closes the wizard; the outcome goes to {@code onDone} on the UI thread when the job ends.
 */
public final class ExportWizard extends Wizard {

    private final SpecDocument document;
    private final UiPreferences prefs;
    private final Consumer<ExportOutcome> onDone;
    private ExportPage page;
    private ExportJob job;
    private ExportProgressWindow window;

    /**
     * @param document the open spec
     * @param prefs    defaults of trials and seed, and the gate library
     * @param onDone   receives the outcome on the UI thread
     */
    public ExportWizard(SpecDocument document, UiPreferences prefs, Consumer<ExportOutcome> onDone) {
        this.document = document;
        this.prefs = prefs;
        this.onDone = onDone;
        setWindowTitle("Export Control Spec");
    }

    /** Opens the wizard on {@code shell}; the outcome is shown by {@link ExportResults}. */
    public static void open(Shell shell, SpecDocument document, UiPreferences prefs) {
        ExportWizard w = new ExportWizard(document, prefs, o -> ExportResults.show(shell, o));
        new WizardDialog(shell, w).open();
    }

    /** The default folder: {@code export-CHIP} beside the spec file. */
    static Path defaultFolder(SpecDocument document) {
        Path parent = document.file().toAbsolutePath().getParent();
        String chip = CNames.identifier(document.spec().getName());
        return parent.resolve("export-" + chip);
    }

    @Override
    public void addPages() {
        page = new ExportPage(document.spec(), defaultFolder(document), prefs);
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        if (page.validate() != null) {
            return false;
        }
        ChipSpec copy = EcoreUtil.copy(document.spec());
        AnalysisSettings settings = new AnalysisSettings(page.trialsValue(), page.seedValue(), 0, prefs.maxFanIn());
        ExportOptions options = ExportOptions.defaults().withFormats(page.selectedFormats()).withSettings(settings)
                .withDate(page.dateValue());
        job = new ExportJob(copy, page.folderPath(), options);
        Shell parent = getShell().getParent() instanceof Shell s ? s : getShell();
        window = ExportProgressWindow.follow(parent, job, onDone);
        job.schedule();
        return true;
    }

    /** The page (for tests). */
    public ExportPage page() {
        return page;
    }

    /** The job started by Finish, or null before. */
    public ExportJob job() {
        return job;
    }

    /** The progress window opened by Finish, or null before. */
    public ExportProgressWindow progressWindow() {
        return window;
    }
}
