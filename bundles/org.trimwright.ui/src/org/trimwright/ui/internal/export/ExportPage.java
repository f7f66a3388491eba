package org.trimwright.ui.internal.export;

import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.trimwright.export.ExportFormat;
import org.trimwright.model.ChipSpec;
import org.trimwright.ui.internal.prefs.UiPreferences;

/**
 * The export wizard's page: output folder (with Browse), formats (all on by default), Monte Carlo trials and seed
 * (defaults from the preferences), the author (read from the spec) and the date printed on the title page (today
 * by default). Validation runs on every change; the first problem is shown and Finish stays disabled until none.
 */
public final class ExportPage extends WizardPage {

    /** Labels of the format check boxes, in the order shown. */
    static final Map<ExportFormat, String> LABELS = new EnumMap<>(Map.of(
            ExportFormat.HTML, "HTML document (charts as SVG)",
            ExportFormat.PDF, "PDF document (same content)",
            ExportFormat.RTL, "RTL: Verilog-2005 decoders and testbench per block",
            ExportFormat.HEADER, "C header for firmware",
            ExportFormat.CSV, "CSV test table per field",
            ExportFormat.IPXACT, "IP-XACT (IEEE 1685-2014) component XML"));

    private final ChipSpec spec;
    private final Path initialFolder;
    private final UiPreferences prefs;
    private final Map<ExportFormat, Button> formats = new EnumMap<>(ExportFormat.class);
    private Text folder;
    private Button browse;
    private Text trials;
    private Text seed;
    private Text date;
    private Label author;

    ExportPage(ChipSpec spec, Path initialFolder, UiPreferences prefs) {
        super("export");
        this.spec = spec;
        this.initialFolder = initialFolder;
        this.prefs = prefs;
        setTitle("Export control spec of " + spec.getName()
                + (spec.getRevision() == null || spec.getRevision().isBlank() ? "" : " rev " + spec.getRevision()));
        setDescription("Writes the spec document, RTL, firmware header, test tables and register map from the spec "
                + "as it is in the editor now, unsaved edits included.");
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        c.setLayout(new GridLayout(3, false));

        new Label(c, SWT.NONE).setText("Output folder:");
        folder = new Text(c, SWT.BORDER);
        folder.setText(initialFolder == null ? "" : initialFolder.toString());
        GridData fd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        fd.widthHint = 380;
        folder.setLayoutData(fd);
        browse = new Button(c, SWT.PUSH);
        browse.setText("Browse...");
        browse.addListener(SWT.Selection, e -> browse());

        Group g = new Group(c, SWT.NONE);
        g.setText("Formats");
        g.setLayout(new GridLayout(2, true));
        g.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1));
        for (ExportFormat f : ExportFormat.values()) {
            Button b = new Button(g, SWT.CHECK);
            b.setText(LABELS.get(f));
            b.setSelection(true);
            b.addListener(SWT.Selection, e -> validate());
            formats.put(f, b);
        }

        Group mc = new Group(c, SWT.NONE);
        mc.setText("Monte Carlo (mismatch statistics in the document)");
        mc.setLayout(new GridLayout(4, false));
        mc.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1));
        new Label(mc, SWT.NONE).setText("Trials per field:");
        trials = new Text(mc, SWT.BORDER);
        trials.setText(Long.toString(prefs.trials()));
        trials.setLayoutData(new GridData(120, SWT.DEFAULT));
        new Label(mc, SWT.NONE).setText("Seed:");
        seed = new Text(mc, SWT.BORDER);
        seed.setText(Long.toString(prefs.seed()));
        seed.setLayoutData(new GridData(120, SWT.DEFAULT));

        Group title = new Group(c, SWT.NONE);
        title.setText("Title page");
        title.setLayout(new GridLayout(2, false));
        title.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1));
        new Label(title, SWT.NONE).setText("Author:");
        author = new Label(title, SWT.NONE);
        author.setText(spec.getAuthor() == null || spec.getAuthor().isBlank()
                ? "(no author given; set it in the chip's form)" : spec.getAuthor());
        author.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        new Label(title, SWT.NONE).setText("Date (YYYY-MM-DD):");
        date = new Text(title, SWT.BORDER);
        date.setText(LocalDate.now().toString());
        date.setLayoutData(new GridData(120, SWT.DEFAULT));

        Label note = new Label(c, SWT.WRAP);
        note.setText("The export uses the spec in the editor, including edits not saved yet. Files of the same "
                + "name in the folder are overwritten; a cancelled export may leave some of them written.");
        GridData nd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        nd.widthHint = 560;
        note.setLayoutData(nd);

        folder.addListener(SWT.Modify, e -> validate());
        trials.addListener(SWT.Modify, e -> validate());
        seed.addListener(SWT.Modify, e -> validate());
        date.addListener(SWT.Modify, e -> validate());
        setControl(c);
        validate();
    }

    private void browse() {
        DirectoryDialog d = new DirectoryDialog(getShell(), SWT.OPEN);
        d.setText("Output folder");
        d.setMessage("Folder for the exported files");
        if (!folder.getText().isBlank()) {
            d.setFilterPath(folder.getText().strip());
        }
        String chosen = d.open();
        if (chosen != null) {
            folder.setText(chosen);
        }
    }

    /** Checks every input; shows the first problem and returns it, or null when the page is complete. */
    String validate() {
        String msg = problem();
        setErrorMessage(msg);
        setPageComplete(msg == null);
        return msg;
    }

    /** The first problem of the inputs, or null. */
    String problem() {
        String msg = OutputFolder.problem(folder.getText());
        if (msg == null && selectedFormats().isEmpty()) {
            msg = "Choose at least one format.";
        }
        if (msg == null) {
            try {
                if (Long.parseLong(trials.getText().strip()) < 1) {
                    msg = "Trials must be at least 1.";
                }
            } catch (NumberFormatException e) {
                msg = "Trials: '" + trials.getText().strip() + "' is not a whole number.";
            }
        }
        if (msg == null) {
            try {
                Long.parseLong(seed.getText().strip());
            } catch (NumberFormatException e) {
                msg = "Seed: '" + seed.getText().strip() + "' is not a whole number.";
            }
        }
        if (msg == null) {
            try {
                LocalDate.parse(date.getText().strip());
            } catch (DateTimeParseException e) {
                msg = "Date: '" + date.getText().strip() + "' is not a date like 2026-12-01.";
            }
        }
        return msg;
    }

    /** The formats ticked. */
    public Set<ExportFormat> selectedFormats() {
        Set<ExportFormat> s = EnumSet.noneOf(ExportFormat.class);
        formats.forEach((f, b) -> {
            if (b.getSelection()) {
                s.add(f);
            }
        });
        return s;
    }

    Path folderPath() {
        return Paths.get(folder.getText().strip());
    }

    long trialsValue() {
        return Long.parseLong(trials.getText().strip());
    }

    long seedValue() {
        return Long.parseLong(seed.getText().strip());
    }

    LocalDate dateValue() {
        return LocalDate.parse(date.getText().strip());
    }

    public Text folderText() {
        return folder;
    }

    public Button browseButton() {
        return browse;
    }

    public Button formatButton(ExportFormat f) {
        return formats.get(f);
    }

    public Text trialsText() {
        return trials;
    }

    public Text seedText() {
        return seed;
    }

    public Text dateText() {
        return date;
    }

    public Label authorLabel() {
        return author;
    }
}
