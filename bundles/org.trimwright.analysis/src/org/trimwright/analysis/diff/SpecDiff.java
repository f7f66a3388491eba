package org.trimwright.analysis.diff;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.trimwright.analysis.FieldReport;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.MonotonicRisk;
import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.ElementPaths;

/**
 * Compares the fields of two specs. Fields are matched by BLOCK/REGISTER/FIELD; a field missing in one register
 * but present under the same block and name in another register counts as moved. Spec and register metadata
 * (names, revisions, descriptions) are not compared. Consequences come from the two versions' field reports.
 */
public final class SpecDiff {

    /** Relative tolerance under which two nominal values count as equal. */
    static final double VALUE_TOLERANCE = 1e-12;

    private SpecDiff() {
    }

    /** The field differences, in the new spec's order, then removed fields in the old spec's order. */
    public static List<FieldDiff> compare(ChipSpec oldSpec, ChipSpec newSpec, ReportCache oldCache,
            ReportCache newCache) {
        Map<String, Field> oldFields = fields(oldSpec);
        Map<String, Field> newFields = fields(newSpec);
        List<FieldDiff> out = new ArrayList<>();
        List<String> matchedOld = new ArrayList<>();
        for (Map.Entry<String, Field> e : newFields.entrySet()) {
            Field nf = e.getValue();
            Field of = oldFields.get(e.getKey());
            if (of == null) {
                of = movedFrom(nf, oldFields, newFields);
            }
            if (of == null) {
                out.add(new FieldDiff("added", e.getKey(), null, List.of(), null));
                continue;
            }
            String oldPath = ElementPaths.of(of);
            matchedOld.add(oldPath);
            List<Change> changes = changes(of, nf);
            if (!oldPath.equals(e.getKey())) {
                changes.add(0, new Change("position", "register", oldPath, e.getKey()));
            }
            if (changes.isEmpty()) {
                continue;
            }
            boolean onlyPosition = changes.stream().allMatch(c -> c.category().equals("position"));
            out.add(new FieldDiff(onlyPosition ? "moved" : "changed", e.getKey(), oldPath, changes,
                    onlyPosition ? null : consequence(of, nf, oldCache, newCache)));
        }
        for (Map.Entry<String, Field> e : oldFields.entrySet()) {
            if (!matchedOld.contains(e.getKey())) {
                out.add(new FieldDiff("removed", e.getKey(), e.getKey(), List.of(), null));
            }
        }
        return out;
    }

    private static Field movedFrom(Field nf, Map<String, Field> oldFields, Map<String, Field> newFields) {
        for (Field of : oldFields.values()) {
            if (Objects.equals(of.getName(), nf.getName()) && !newFields.containsKey(ElementPaths.of(of))
                    && block(of).equals(block(nf))) {
                return of;
            }
        }
        return null;
    }

    private static String block(Field f) {
        return ElementPaths.of(f).split("/")[0];
    }

    private static Map<String, Field> fields(ChipSpec spec) {
        Map<String, Field> m = new LinkedHashMap<>();
        for (Block b : spec.getBlocks()) {
            for (Register r : b.getRegisters()) {
                for (Field f : r.getFields()) {
                    m.putIfAbsent(ElementPaths.of(f), f);
                }
            }
        }
        return m;
    }

    /** The attribute differences of two versions of a field. */
    static List<Change> changes(Field a, Field b) {
        List<Change> out = new ArrayList<>();
        compare(out, "", a, b);
        long addrA = address(a);
        long addrB = address(b);
        if (addrA != addrB) {
            out.add(new Change("position", "address", "0x" + Long.toHexString(addrA), "0x" + Long.toHexString(addrB)));
        }
        return out;
    }

    private static long address(Field f) {
        if (f.eContainer() instanceof Register r && r.eContainer() instanceof Block b) {
            return b.getBaseAddress() + r.getAddressOffset();
        }
        return -1;
    }

    private static void compare(List<Change> out, String prefix, EObject a, EObject b) {
        EObject any = a != null ? a : b;
        for (EAttribute attr : any.eClass().getEAllAttributes()) {
            String name = prefix + attr.getName();
            if (attr.getName().equals("description") || (prefix.isEmpty() && attr.getName().equals("name"))) {
                continue;
            }
            String va = text(a, attr);
            String vb = text(b, attr);
            if (!va.equals(vb)) {
                out.add(new Change(category(prefix, attr.getName()), name, va, vb));
            }
        }
        if (prefix.isEmpty()) {
            Field fa = (Field) a;
            Field fb = (Field) b;
            child(out, "target.", fa.getTarget(), fb.getTarget());
            child(out, "coding.", fa.getCoding(), fb.getCoding());
            child(out, "element.", fa.getElement(), fb.getElement());
            child(out, "limits.", fa.getLimits(), fb.getLimits());
        }
    }

    private static void child(List<Change> out, String prefix, EObject a, EObject b) {
        if (a == null && b == null) {
            return;
        }
        compare(out, prefix, a, b);
    }

    private static String text(EObject o, EAttribute attr) {
        if (o == null || (attr.isUnsettable() && !o.eIsSet(attr))) {
            return "-";
        }
        return String.valueOf(o.eGet(attr));
    }

    /** The change category of an attribute (see {@link Change#category()}). */
    static String category(String prefix, String attr) {
        switch (prefix) {
            case "coding.":
                return "coding";
            case "element.":
                return "element";
            case "limits.":
                return "limits";
            case "target.":
                switch (attr) {
                    case "step":
                    case "valueAtZero":
                    case "unit":
                    case "quantity":
                        return "step";
                    case "signedFormat":
                        return "coding";
                    case "safeMin":
                    case "safeMax":
                        return "limits";
                    default:
                        return "range";
                }
            default:
                return attr.equals("bitOffset") || attr.equals("width") ? "position" : "field";
        }
    }

    private static Consequence consequence(Field of, Field nf, ReportCache oldCache, ReportCache newCache) {
        FieldReport a;
        FieldReport b;
        try {
            a = oldCache.get(of);
            b = newCache.get(nf);
        } catch (IllegalArgumentException e) {
            return null;
        }
        StepTable ta = a.coding().stepTable();
        StepTable tb = b.coding().stepTable();
        List<Integer> changed = new ArrayList<>();
        int common = Math.min(ta.size(), tb.size());
        for (int c = 0; c < common; c++) {
            double va = ta.value(c);
            double vb = tb.value(c);
            if (Math.abs(va - vb) > VALUE_TOLERANCE * Math.max(Math.abs(va), Math.abs(vb))) {
                changed.add(c);
            }
        }
        double pa = Double.NaN;
        double pb = Double.NaN;
        String method = null;
        double da = Double.NaN;
        double db = Double.NaN;
        double ia = Double.NaN;
        double ib = Double.NaN;
        String def = null;
        if (a.mismatch().isPresent()) {
            MismatchReport m = a.mismatch().get();
            pa = MonotonicRisk.of(a, m).probability();
            da = dnlYield(a, m);
            ia = m.inl().get(m.limits().inlDefinition()).yield();
        }
        if (b.mismatch().isPresent()) {
            MismatchReport m = b.mismatch().get();
            MonotonicRisk r = MonotonicRisk.of(b, m);
            pb = r.probability();
            method = r.method();
            db = dnlYield(b, m);
            ib = m.inl().get(m.limits().inlDefinition()).yield();
            def = m.limits().inlDefinition().key();
        }
        return new Consequence(ta.size(), tb.size(), changed, pa, pb, method, da, db, ia, ib, def);
    }

    /** Exact DNL yield where the engine has it for the field's limit, else Monte Carlo. */
    private static double dnlYield(FieldReport r, MismatchReport m) {
        if (r.exactDnl().isPresent() && r.exactDnl().get().limitLsb() == m.dnl().limit()) {
            return r.exactDnl().get().yield();
        }
        return m.dnl().yield();
    }
}
