package org.trimwright.ui.internal.editor;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.UnitElement;
import org.trimwright.ui.internal.doc.SpecDocument;
import org.trimwright.ui.internal.doc.SpecEdits;
import org.trimwright.ui.internal.editor.ValueInput.Kind;

/**
 * The detail side of the spec editor: a form for the selected element. A field's form has sections for the field,
 * its analog target, coding, element model and limits; a missing section offers a button that adds it. Every
 * change is one command on the document's stack; bad input is kept in the box, marked, and explained in the
 * message line at the top.
 */
public final class DetailForm {

    private static final TrimwrightPackage P = TrimwrightPackage.eINSTANCE;

    private final Composite body;
    private final Label message;
    private final BitMapCanvas bitMap;
    private final Composite sections;
    private final Map<EStructuralFeature, Control> controls = new LinkedHashMap<>();
    private final List<Runnable> refreshers = new ArrayList<>();
    private SpecDocument document;
    private EObject element;
    private String shape = "";

    public DetailForm(Composite parent, Consumer<Field> onBitMapClick) {
        body = new Composite(parent, SWT.NONE);
        body.setLayout(new GridLayout(1, false));
        message = new Label(body, SWT.WRAP);
        GridData md = new GridData(SWT.FILL, SWT.TOP, true, false);
        md.widthHint = 200;
        message.setLayoutData(md);
        message.setForeground(body.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        bitMap = new BitMapCanvas(body, onBitMapClick);
        GridData bd = new GridData(SWT.FILL, SWT.TOP, true, false);
        bd.heightHint = BitMapCanvas.HEIGHT;
        bitMap.control().setLayoutData(bd);
        sections = new Composite(body, SWT.NONE);
        sections.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        GridLayout sl = new GridLayout(2, true);
        sl.marginWidth = 0;
        sections.setLayout(sl);
    }

    public Composite control() {
        return body;
    }

    /** The bit map of the shown register (or of the shown field's register). */
    public BitMapCanvas bitMap() {
        return bitMap;
    }

    /** The input control of a feature in the current form (Text, Combo or Button), or null. */
    public Control controlFor(EStructuralFeature feature) {
        return controls.get(feature);
    }

    /** The message line's text (empty when the last input was fine). */
    public String message() {
        return message.getText();
    }

    /** Shows the form of {@code e} of {@code doc}. */
    public void show(SpecDocument doc, EObject e) {
        document = doc;
        element = e;
        rebuild();
    }

    /** Updates the form after a command: rebuilds when sections appeared or vanished, else refreshes values. */
    public void refresh() {
        if (element != null && element.eResource() == null && !(element instanceof org.trimwright.model.ChipSpec)) {
            element = null;
            rebuild();
            return;
        }
        if (!shape.equals(shapeOf(element))) {
            rebuild();
            return;
        }
        refreshers.forEach(Runnable::run);
        updateBitMap();
    }

    private void rebuild() {
        for (Control c : sections.getChildren()) {
            c.dispose();
        }
        controls.clear();
        refreshers.clear();
        setMessage("");
        shape = shapeOf(element);
        if (element instanceof Field f) {
            section("Field", f, true);
            part(f, P.getField_Target(), "Analog target");
            part(f, P.getField_Coding(), "Coding");
            part(f, P.getField_Element(), "Element model");
            part(f, P.getField_Limits(), "Limits");
        } else if (element != null) {
            section(element.eClass().getName(), element, true);
        }
        updateBitMap();
        body.layout(true, true);
        Composite scroller = body.getParent();
        if (scroller instanceof org.eclipse.swt.custom.ScrolledComposite sc) {
            int w = Math.max(sc.getClientArea().width, 360);
            sc.setMinSize(w, body.computeSize(w, SWT.DEFAULT).y);
        }
    }

    private void updateBitMap() {
        Register r = element instanceof Register reg ? reg
                : element instanceof Field f && f.eContainer() instanceof Register fr ? fr : null;
        bitMap.show(r, element instanceof Field f ? f : null);
        ((GridData) bitMap.control().getLayoutData()).exclude = r == null;
        bitMap.control().setVisible(r != null);
    }

    private static String shapeOf(EObject e) {
        if (e instanceof Field f) {
            return "F" + (f.getTarget() != null) + (f.getCoding() != null) + (f.getElement() != null)
                    + (f.getLimits() != null) + System.identityHashCode(f);
        }
        return e == null ? "" : e.eClass().getName() + System.identityHashCode(e);
    }

    private void part(Field f, EReference ref, String title) {
        EObject value = (EObject) f.eGet(ref);
        if (value != null) {
            section(title, value, false);
            return;
        }
        Group g = group(title);
        Label l = new Label(g, SWT.WRAP);
        l.setText("Not given.");
        Button add = new Button(g, SWT.PUSH);
        add.setText("Add " + title.toLowerCase());
        add.addListener(SWT.Selection, ev -> SpecEdits.createPart(document, f, ref));
    }

    private Group group(String title) {
        Group g = new Group(sections, SWT.NONE);
        g.setText(title);
        g.setLayout(new GridLayout(3, false));
        g.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        return g;
    }

    private void section(String title, EObject owner, boolean wide) {
        Group g = group(title);
        if (wide) {
            ((GridData) g.getLayoutData()).horizontalSpan = 2;
        }
        EClass c = owner.eClass();
        for (EAttribute a : c.getEAllAttributes()) {
            row(g, owner, a);
        }
    }

    private void row(Composite g, EObject owner, EAttribute a) {
        Label l = new Label(g, SWT.NONE);
        l.setText(humanise(a.getName()));
        Control c;
        if (a.getEType() instanceof EEnum en) {
            c = enumCombo(g, owner, a, en);
        } else if (a.getEType().getInstanceClass() == boolean.class) {
            c = check(g, owner, a);
        } else {
            c = text(g, owner, a);
        }
        if (!(c.getLayoutData() instanceof GridData)) {
            GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
            gd.minimumWidth = 120;
            gd.widthHint = 120;
            c.setLayoutData(gd);
        }
        Label unit = new Label(g, SWT.NONE);
        unit.setText(hint(owner, a));
        controls.put(a, c);
        c.setData("trimwright.feature", a.getName());
    }

    private Combo enumCombo(Composite g, EObject owner, EAttribute a, EEnum en) {
        Combo combo = new Combo(g, SWT.READ_ONLY | SWT.DROP_DOWN);
        for (EEnumLiteral lit : en.getELiterals()) {
            combo.add(lit.getLiteral());
        }
        Runnable refresh = () -> {
            if (!combo.isDisposed()) {
                Object v = owner.eGet(a);
                combo.select(v == null ? -1 : en.getELiterals().indexOf(en.getEEnumLiteralByLiteral(v.toString())));
            }
        };
        refresh.run();
        refreshers.add(refresh);
        combo.addListener(SWT.Selection, ev -> {
            int i = combo.getSelectionIndex();
            if (i >= 0) {
                Object v = a.getEType().getEPackage().getEFactoryInstance().createFromString(en,
                        en.getELiterals().get(i).getLiteral());
                SpecEdits.set(document, owner, a, v);
            }
        });
        return combo;
    }

    private Button check(Composite g, EObject owner, EAttribute a) {
        Button b = new Button(g, SWT.CHECK);
        Runnable refresh = () -> {
            if (!b.isDisposed()) {
                b.setSelection(Boolean.TRUE.equals(owner.eGet(a)));
            }
        };
        refresh.run();
        refreshers.add(refresh);
        b.addListener(SWT.Selection, ev -> SpecEdits.set(document, owner, a, b.getSelection()));
        return b;
    }

    private Text text(Composite g, EObject owner, EAttribute a) {
        boolean multi = "description".equals(a.getName());
        Text t = new Text(g, SWT.BORDER | (multi ? SWT.MULTI | SWT.WRAP | SWT.V_SCROLL : SWT.SINGLE));
        if (multi) {
            GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
            gd.heightHint = 40;
            gd.widthHint = 200;
            t.setLayoutData(gd);
        }
        Runnable refresh = () -> {
            if (!t.isDisposed() && t.getData("trimwright.bad") == null) {
                String shown = display(owner, a);
                if (!shown.equals(t.getText())) {
                    t.setText(shown);
                }
            }
        };
        refresh.run();
        refreshers.add(refresh);
        Runnable commit = () -> commit(t, owner, a);
        t.addListener(SWT.DefaultSelection, ev -> commit.run());
        t.addListener(SWT.FocusOut, ev -> commit.run());
        return t;
    }

    private void commit(Text t, EObject owner, EAttribute a) {
        if (t.isDisposed() || document == null) {
            return;
        }
        if (t.getData("trimwright.bad") == null && t.getText().equals(display(owner, a))) {
            return;
        }
        Object value;
        try {
            value = read(owner, a, t.getText());
        } catch (IllegalArgumentException e) {
            t.setData("trimwright.bad", Boolean.TRUE);
            t.setBackground(t.getDisplay().getSystemColor(SWT.COLOR_YELLOW));
            t.setToolTipText(e.getMessage());
            setMessage(e.getMessage());
            return;
        }
        t.setData("trimwright.bad", null);
        t.setBackground(null);
        t.setToolTipText(null);
        setMessage("");
        SpecEdits.set(document, owner, a, value);
        String shown = display(owner, a);
        if (!shown.equals(t.getText())) {
            t.setText(shown);
        }
    }

    private void setMessage(String text) {
        if (!message.isDisposed()) {
            message.setText(text);
            body.layout(new Control[] {message});
        }
    }

    /** Text -> model value; empty text unsets an unsettable feature. */
    static Object read(EObject owner, EAttribute a, String text) {
        Class<?> type = a.getEType().getInstanceClass();
        if (type == String.class) {
            return text;
        }
        if (text.isBlank() && a.isUnsettable()) {
            return null;
        }
        String label = humanise(a.getName());
        if (type == int.class || type == long.class) {
            double v = ValueInput.parse(label, text, Kind.INTEGER, SiUnit.NONE);
            if (v < 0) {
                throw new IllegalArgumentException(label + ": must not be negative, got " + (long) v);
            }
            if (type == int.class) {
                if (v > Integer.MAX_VALUE) {
                    throw new IllegalArgumentException(label + ": " + (long) v + " is too large");
                }
                return (int) v;
            }
            return (long) v;
        }
        return ValueInput.parse(label, text, kind(a), unitOf(owner));
    }

    static String display(EObject owner, EAttribute a) {
        Object v = owner.eGet(a);
        if (a.isUnsettable() && !owner.eIsSet(a)) {
            return "";
        }
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return ValueInput.format(d, kind(a), unitOf(owner));
        }
        return v.toString();
    }

    /** How a double attribute is read: by the model's naming (…Percent, …Lsb, yields, target values). */
    static Kind kind(EAttribute a) {
        String n = a.getName();
        if (n.endsWith("Percent")) {
            return Kind.PERCENT;
        }
        if (n.equals("targetYield")) {
            return Kind.FRACTION;
        }
        EClass owner = a.getEContainingClass();
        if (owner == P.getAnalogTarget() || a == P.getUnitElement_NominalValue()) {
            return Kind.UNIT;
        }
        return Kind.PLAIN;
    }

    static SiUnit unitOf(EObject owner) {
        AnalogTarget t = owner instanceof AnalogTarget at ? at
                : owner instanceof UnitElement && owner.eContainer() instanceof Field f ? f.getTarget() : null;
        if (t == null || t.getUnit() == null) {
            return SiUnit.NONE;
        }
        try {
            return SiUnit.fromSymbol(t.getUnit());
        } catch (IllegalArgumentException e) {
            return SiUnit.NONE;
        }
    }

    private static String hint(EObject owner, EAttribute a) {
        String n = a.getName();
        if (a.getEType().getInstanceClass() != double.class) {
            return n.equals("bitOffset") || n.equals("width") ? "bits" : "";
        }
        switch (kind(a)) {
            case UNIT:
                return unitOf(owner).symbol();
            case PERCENT:
                return n.equals("pelgromPercentUm") ? "%\u00B7\u00B5m" : "%";
            case FRACTION:
                return "0..1 or %";
            default:
                return n.endsWith("Lsb") ? "LSB" : n.equals("areaUm2") ? "\u00B5m\u00B2" : "";
        }
    }

    /** "maxDnlLsb" -> "Max DNL (LSB)"; "valueAtZero" -> "Value at zero"; "unitSigmaPercent" -> "Unit sigma (%)". */
    static String humanise(String name) {
        String[] words = name.split("(?=[A-Z])");
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < words.length; i++) {
            String w = words[i].toLowerCase();
            String shown = switch (w) {
                case "dnl", "inl", "lsb" -> w.equals("lsb") ? "(LSB)" : w.toUpperCase();
                case "percent" -> i + 1 < words.length && words[i + 1].equalsIgnoreCase("um") ? "(%\u00B7\u00B5m)"
                        : "(%)";
                case "um" -> i > 0 && words[i - 1].equalsIgnoreCase("percent") ? null : "\u00B5m";
                case "um2" -> "(\u00B5m\u00B2)";
                default -> i == 0 ? Character.toUpperCase(w.charAt(0)) + w.substring(1) : w;
            };
            if (shown != null) {
                sb.append(sb.length() == 0 ? "" : " ").append(shown);
            }
        }
        return sb.toString();
    }
}
