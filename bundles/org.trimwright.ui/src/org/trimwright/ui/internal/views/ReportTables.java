package org.trimwright.ui.internal.views;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.coding.StepRow;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.glitch.GlitchAdvice;
import org.trimwright.engine.glitch.GlitchStep;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.GateType;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.units.SiValue;

/** The report's tables as rows of text: step table, decoder cost, glitches, key figures. */
final class ReportTables {

    /** Rows beyond this are not listed (a 12-bit field has 4096 codes). */
    static final int MAX_ROWS = 4096;

    private ReportTables() {
    }

    static Table create(Composite parent) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        return t;
    }

    /** Replaces the table's columns and rows. */
    static void fill(Table t, String[] headers, List<String[]> rows) {
        t.setRedraw(false);
        try {
            t.removeAll();
            for (TableColumn c : t.getColumns()) {
                c.dispose();
            }
            for (String h : headers) {
                TableColumn c = new TableColumn(t, SWT.LEFT);
                c.setText(h);
            }
            for (String[] r : rows) {
                new TableItem(t, SWT.NONE).setText(r);
            }
            for (TableColumn c : t.getColumns()) {
                c.pack();
                c.setWidth(Math.min(Math.max(c.getWidth(), 60), 420));
            }
        } finally {
            t.setRedraw(true);
        }
    }

    static String[] stepHeaders() {
        return new String[] {"Code", "Register bits", "Signed steps", "Level", "Decoder outputs", "Units on",
            "Value"};
    }

    static List<String[]> steps(FieldReport r) {
        CodingReport c = r.coding();
        int outputs = c.stepTable().map().layout().size();
        List<String[]> rows = new ArrayList<>();
        for (StepRow s : c.stepTable().rows()) {
            if (rows.size() >= MAX_ROWS) {
                break;
            }
            rows.add(new String[] {Integer.toString(s.code()), s.registerBits(), Integer.toString(s.signedSteps()),
                Integer.toString(s.level()), s.outputBits(outputs), Integer.toString(s.unitsInUse()),
                SiValue.format(s.value(), c.unit())});
        }
        return rows;
    }

    static String[] costHeaders() {
        return new String[] {"Realisation", "Gates", "Transistors", "NAND2 eq.", "Switches", "Unit elements",
            "Decoder outputs", "Method"};
    }

    static List<String[]> costs(FieldReport r) {
        CodingReport c = r.coding();
        List<String[]> rows = new ArrayList<>();
        rows.add(cost("structural decoder", c.cost()));
        c.twoLevelCost().ifPresent(t -> rows.add(cost("two-level (SOP, NAND-NAND)", t)));
        for (int m = 0; m < c.splitCosts().size(); m++) {
            rows.add(cost("split M=" + m + " unary + " + (c.coding().bits() - m) + " binary", c.splitCosts().get(m)));
        }
        return rows;
    }

    private static String[] cost(String what, DecoderCost d) {
        StringBuilder gates = new StringBuilder();
        for (Map.Entry<GateType, Integer> e : d.gates().entrySet()) {
            if (e.getValue() > 0) {
                gates.append(gates.length() == 0 ? "" : ", ").append(e.getValue()).append(' ').append(e.getKey());
            }
        }
        return new String[] {what, gates.length() == 0 ? "none" : gates.toString(),
            Integer.toString(d.transistors()), fmt(d.nand2Equivalent()), Integer.toString(d.switches()),
            Integer.toString(d.unitElements()), Integer.toString(d.decoderOutputs()), d.method()};
    }

    static String[] glitchHeaders() {
        return new String[] {"From", "To", "Bits toggling", "Worst intermediate code", "Excursion (LSB)",
            "Excursion"};
    }

    static List<String[]> glitches(FieldReport r) {
        List<String[]> rows = new ArrayList<>();
        for (GlitchStep g : r.coding().glitch().steps()) {
            if (rows.size() >= MAX_ROWS) {
                break;
            }
            rows.add(new String[] {Integer.toString(g.fromCode()), Integer.toString(g.toCode()),
                Integer.toString(g.toggleCount()), Integer.toString(g.worstCode()),
                Integer.toString(g.excursionLsb()), SiValue.format(g.excursionUnit(), r.coding().unit())});
        }
        for (GlitchAdvice a : r.coding().glitch().advice()) {
            rows.add(new String[] {"advice", a.remedy(), "", "", "", a.text()});
        }
        return rows;
    }

    static String[] figureHeaders() {
        return new String[] {"Figure", "Value", "Definition / method"};
    }

    /** Key figures; INL is listed under {@code preferred} and under the field's own definition. */
    static List<String[]> figures(FieldReport r, InlDefinition preferred, int stage) {
        List<String[]> rows = new ArrayList<>();
        CodingReport c = r.coding();
        rows.add(new String[] {"Codes", Integer.toString(c.stepTable().size()), key(c.coding().scheme()) + ", "
            + key(c.coding().signedFormat())});
        rows.add(new String[] {"Decoder NAND2 equivalents", fmt(c.cost().nand2Equivalent()), c.cost().method()});
        rows.add(new String[] {"Worst glitch excursion", c.glitch().worstExcursionLsb() + " LSB",
            "largest intermediate value any bit skew can reach, per adjacent step"});
        if (r.mismatch().isEmpty()) {
            rows.add(new String[] {"Mismatch statistics", "none", "the field has no unit element"});
            return rows;
        }
        MismatchReport m = r.mismatch().get();
        MismatchReport.Monotonicity mono = m.monotonic();
        rows.add(new String[] {"Monotonic by construction", mono.guaranteed() ? "yes" : "no", mono.method()});
        if (!mono.guaranteed()) {
            rows.add(new String[] {"P(non-monotonic), union bound", sci(mono.unionBound()),
                "exact Gaussian per distinct step, summed"});
            rows.add(new String[] {"P(non-monotonic), Monte Carlo", sci(mono.monteCarlo().estimate()) + "  ["
                + sci(mono.monteCarlo().ci95Low()) + ", " + sci(mono.monteCarlo().ci95High()) + "]",
                "95 % " + mono.monteCarlo().interval() + " interval, " + mono.monteCarlo().trials() + " trials"});
        }
        r.exactMonotonic().ifPresent(x -> rows.add(new String[] {"P(non-monotonic), exact",
            sci(x.probabilityNonMonotonic()) + " \u00B1 " + sci(x.numericalError()), x.method()}));
        rows.add(new String[] {"DNL sigma, worst step", fmt(m.dnl().sigmaWorst()) + " LSB", m.dnl().definition()
            + "; " + m.dnl().worstTransition()});
        rows.add(new String[] {"Yield max|DNL| < " + fmt(m.dnl().limit()) + " LSB", pct(m.dnl().yield()),
            "Monte Carlo fraction"});
        for (InlDefinition d : preferred == m.limits().inlDefinition() ? new InlDefinition[] {preferred}
                : new InlDefinition[] {preferred, m.limits().inlDefinition()}) {
            MismatchReport.InlFigures f = m.inl().get(d);
            rows.add(new String[] {"INL sigma, worst level (" + d.key() + ")", fmt(f.sigmaWorst()) + " LSB",
                "first-order analytic, " + f.definition()});
            rows.add(new String[] {"Yield max|INL| < " + fmt(f.limit()) + " LSB (" + d.key() + ")", pct(f.yield()),
                "Monte Carlo fraction"});
        }
        MismatchReport.RunFacts run = m.run();
        rows.add(new String[] {"Monte Carlo run", run.trials() + " trials, seed " + run.seed() + ", "
            + String.format(Locale.ROOT, "%.2f s", run.seconds()), run.method()
            + (stage == 2 ? " (preview; full run follows)" : "")});
        return rows;
    }

    static String key(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    static String sci(double v) {
        return v == 0 ? "0" : String.format(Locale.ROOT, "%.3e", v);
    }

    static String pct(double v) {
        return String.format(Locale.ROOT, "%.3f %%", 100 * v);
    }
}
