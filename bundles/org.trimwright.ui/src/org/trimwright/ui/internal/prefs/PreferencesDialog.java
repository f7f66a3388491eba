package org.trimwright.ui.internal.prefs;

import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.dialogs.TitleAreaDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;

/** Edits {@link UiPreferences}; OK is enabled only for valid input, and the message says what is wrong. */
public final class PreferencesDialog extends TitleAreaDialog {

    private UiPreferences value;
    private Text trials;
    private Text seed;
    private Combo inl;
    private Combo fanIn;

    public PreferencesDialog(Shell shell, UiPreferences initial) {
        super(shell);
        value = initial;
    }

    /** The accepted preferences (the initial ones until OK). */
    public UiPreferences value() {
        return value;
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        setTitle("Analysis preferences");
        setMessage("Defaults for the field views' Monte Carlo runs and decoder cost.");
        getShell().setText("Preferences");
        Composite area = (Composite) super.createDialogArea(parent);
        Composite c = new Composite(area, SWT.NONE);
        c.setLayout(new GridLayout(2, false));
        c.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        trials = text(c, "Monte Carlo trials per field:", Long.toString(value.trials()));
        seed = text(c, "Random seed:", Long.toString(value.seed()));
        new Label(c, SWT.NONE).setText("INL definition shown first:");
        inl = new Combo(c, SWT.READ_ONLY);
        for (InlDefinition d : InlDefinition.values()) {
            inl.add(d.key());
        }
        inl.select(value.inlDefinition().ordinal());
        new Label(c, SWT.NONE).setText("Decoder gate library:");
        fanIn = new Combo(c, SWT.READ_ONLY);
        fanIn.add("2-input gates (INV, NAND2, NOR2)");
        fanIn.add("3-input gates (adds NAND3, NOR3)");
        fanIn.select(value.maxFanIn() == 3 ? 1 : 0);
        trials.addListener(SWT.Modify, e -> validate());
        seed.addListener(SWT.Modify, e -> validate());
        return area;
    }

    private static Text text(Composite c, String label, String v) {
        new Label(c, SWT.NONE).setText(label);
        Text t = new Text(c, SWT.BORDER);
        t.setText(v);
        t.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        return t;
    }

    private UiPreferences read() {
        long n;
        long s;
        try {
            n = Long.parseLong(trials.getText().strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("Trials must be a whole number, e.g. 20000.");
        }
        if (n < 1 || n > MonteCarloOptions.MAX_TRIALS) {
            throw new IllegalArgumentException("Trials must be 1.." + MonteCarloOptions.MAX_TRIALS + ".");
        }
        try {
            s = Long.parseLong(seed.getText().strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("The seed must be a whole number.");
        }
        return new UiPreferences(n, s, InlDefinition.values()[inl.getSelectionIndex()],
                fanIn.getSelectionIndex() == 1 ? 3 : 2);
    }

    private void validate() {
        try {
            read();
            setErrorMessage(null);
            getButton(IDialogConstants.OK_ID).setEnabled(true);
        } catch (IllegalArgumentException e) {
            setErrorMessage(e.getMessage());
            getButton(IDialogConstants.OK_ID).setEnabled(false);
        }
    }

    @Override
    protected void okPressed() {
        value = read();
        super.okPressed();
    }
}
