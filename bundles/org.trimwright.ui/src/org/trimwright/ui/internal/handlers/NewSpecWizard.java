package org.trimwright.ui.internal.handlers;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.e4.core.services.events.IEventBroker;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Coding;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.InlDefinition;
import org.trimwright.model.Limits;
import org.trimwright.model.MismatchSpec;
import org.trimwright.model.Quantity;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.UnitElement;
import org.trimwright.model.spec.SpecFiles;
import org.trimwright.ui.internal.Topics;
import org.trimwright.ui.internal.editor.Editors;
import org.trimwright.ui.internal.prefs.UiPreferences;
import org.trimwright.ui.internal.workspace.Workspace;

/**
 * Creates a spec file: project (existing or new), file name and chip name; the new spec holds one block with one
 * 8-bit register and a 4-bit binary voltage trim to start from. The file is written and opened in an editor.
 */
public final class NewSpecWizard extends Wizard {

    private final Workspace workspace;
    private final Path initialProject;
    private Page page;
    private Path created;

    NewSpecWizard(Workspace workspace, Path initialProject) {
        this.workspace = workspace;
        this.initialProject = initialProject;
        setWindowTitle("New Trim Spec");
    }

    /** Runs the wizard and opens the new spec; returns the file or null. */
    public static Path open(Shell shell, Workspace ws, Path project, MApplication app, EModelService models,
            EPartService parts, IEventBroker broker) {
        NewSpecWizard w = new NewSpecWizard(ws, project);
        if (new WizardDialog(shell, w).open() != WizardDialog.OK || w.created == null) {
            return null;
        }
        broker.post(Topics.WORKSPACE_CHANGED, w.created.toString());
        Editors.open(w.created, app, models, parts);
        return w.created;
    }

    @Override
    public void addPages() {
        page = new Page();
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        try {
            Path dir = workspace.root().resolve(page.project.getText().strip());
            Files.createDirectories(dir);
            Path file = dir.resolve(Workspace.specFileName(page.file.getText().strip()));
            SpecFiles.save(starter(page.chip.getText().strip(), UiPreferences.load()), file);
            created = file;
            return true;
        } catch (IOException e) {
            page.setErrorMessage("Cannot create the spec: " + e.getMessage());
            return false;
        }
    }

    /** The starting content of a new spec. */
    public static ChipSpec starter(String chipName, UiPreferences prefs) {
        TrimwrightFactory f = TrimwrightFactory.eINSTANCE;
        ChipSpec spec = f.createChipSpec();
        spec.setName(chipName);
        spec.setRevision("A0");
        Block b = f.createBlock();
        b.setName("REF");
        b.setDescription("Reference");
        spec.getBlocks().add(b);
        Register r = f.createRegister();
        r.setName("REF_TRIM");
        r.setWidth(8);
        b.getRegisters().add(r);
        Field fl = f.createField();
        fl.setName("VTRIM");
        fl.setWidth(4);
        fl.setRole(FieldRole.TRIM);
        fl.setDescription("Output voltage trim");
        AnalogTarget t = f.createAnalogTarget();
        t.setQuantity(Quantity.VOLTAGE);
        t.setUnit("V");
        t.setValueAtZero(1.2);
        t.setStep(0.004);
        fl.setTarget(t);
        Coding c = f.createCoding();
        c.setScheme(CodingScheme.BINARY);
        fl.setCoding(c);
        UnitElement e = f.createUnitElement();
        e.setNominalValue(0.004);
        e.setMismatchSpec(MismatchSpec.RELATIVE_SIGMA);
        e.setUnitSigmaPercent(1.0);
        fl.setElement(e);
        Limits l = f.createLimits();
        l.setMustBeMonotonic(true);
        l.setMaxDnlLsb(0.5);
        l.setMaxInlLsb(1.0);
        l.setInlDefinition(InlDefinition.get(prefs.inlDefinition().key()));
        fl.setLimits(l);
        r.getFields().add(fl);
        return spec;
    }

    private final class Page extends WizardPage {
        private Combo project;
        private Text file;
        private Text chip;

        Page() {
            super("spec");
            setTitle("New trim spec");
            setDescription("A spec file in a workspace project, with one block, register and field to start from.");
        }

        @Override
        public void createControl(Composite parent) {
            Composite c = new Composite(parent, SWT.NONE);
            c.setLayout(new GridLayout(2, false));
            new Label(c, SWT.NONE).setText("Project:");
            project = new Combo(c, SWT.DROP_DOWN);
            project.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            try {
                for (Path p : workspace.projects()) {
                    project.add(p.getFileName().toString());
                }
            } catch (IOException e) {
                setErrorMessage(e.getMessage());
            }
            project.setText(initialProject != null && initialProject.startsWith(workspace.root())
                    && !initialProject.equals(workspace.root())
                    ? workspace.root().relativize(initialProject).toString()
                    : project.getItemCount() > 0 ? project.getItem(0) : "specs");
            new Label(c, SWT.NONE).setText("File name:");
            file = new Text(c, SWT.BORDER);
            file.setText("new-chip.trimspec");
            file.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            new Label(c, SWT.NONE).setText("Chip name:");
            chip = new Text(c, SWT.BORDER);
            chip.setText("NEWCHIP");
            chip.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            project.addListener(SWT.Modify, e -> validate());
            file.addListener(SWT.Modify, e -> validate());
            chip.addListener(SWT.Modify, e -> validate());
            setControl(c);
            validate();
        }

        private void validate() {
            String msg = Workspace.checkName(project.getText().strip());
            if (msg == null) {
                msg = Workspace.checkName(file.getText().strip());
            }
            if (msg == null && chip.getText().isBlank()) {
                msg = "Enter the chip's name.";
            }
            if (msg == null && Files.exists(workspace.root().resolve(project.getText().strip())
                    .resolve(Workspace.specFileName(file.getText().strip())))) {
                msg = "That file exists already.";
            }
            setErrorMessage(msg);
            setPageComplete(msg == null);
        }
    }
}
