package org.trimwright.analysis.validation;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.TreeIterator;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.trimwright.analysis.ReportCache;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.rules.FieldRuleProvider;
import org.trimwright.model.rules.FieldRules;
import org.trimwright.model.rules.StructuralRules;
import org.trimwright.model.spec.ElementPaths;

/**
 * The one place validation is wired: the model's generated validator runs the structural rules itself and
 * delegates the analysis constraints to rules reading a {@link ReportCache}. The command line and the workbench
 * call {@link #install(ReportCache)} once (for validation started by EMF, e.g. an editor) or {@link #validate}
 * (one run with its own cache, no global state).
 */
public final class SpecValidation {

    /** Diagnostic source of the analysis findings. */
    public static final String SOURCE = "org.trimwright.analysis";

    private SpecValidation() {
    }

    /** Makes every EMF validation of a spec run the analysis constraints on {@code cache}'s reports. */
    public static void install(ReportCache cache) {
        FieldRules.install(new AnalysisRules(cache));
    }

    /**
     * All findings of {@code spec} in spec order (structural and analysis). Quick reports missing from the cache
     * are computed first, field by field in parallel; full reports only for the fields a rule cannot clear.
     */
    public static List<Finding> validate(ChipSpec spec, ReportCache cache) {
        TrimwrightPackage.eINSTANCE.eClass();
        warm(spec, cache);
        Map<Object, Object> context = new HashMap<>();
        context.put(FieldRuleProvider.class, new AnalysisRules(cache));
        Diagnostic d = Diagnostician.INSTANCE.validate(spec, context);
        return findings(d);
    }

    /** The findings held by a validator diagnostic (analysis findings as they are, EMF ones translated). */
    public static List<Finding> findings(Diagnostic root) {
        List<Finding> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(Diagnostic d, List<Finding> out) {
        if (d.getData().size() >= 2 && d.getData().get(1) instanceof Finding f) {
            out.add(f);
        } else if (d.getSeverity() != Diagnostic.OK && d.getChildren().isEmpty()) {
            out.add(translate(d));
        }
        for (Diagnostic c : d.getChildren()) {
            collect(c, out);
        }
    }

    private static Finding translate(Diagnostic d) {
        EObject element = d.getData().isEmpty() || !(d.getData().get(0) instanceof EObject e) ? null : e;
        String path = element == null ? "?" : ElementPaths.of(element);
        String message = d.getMessage();
        if (message.startsWith(path + ": ")) {
            message = message.substring(path.length() + 2);
        }
        String id = StructuralRules.SOURCE.equals(d.getSource()) ? structuralId(d.getCode()) : "model.emf-" + d.getCode();
        return Finding.of(id, Severity.of(d.getSeverity()), path, message);
    }

    /** Stable ids of the structural rules (a contract: docs/check-and-diff.md). */
    static String structuralId(int code) {
        switch (code) {
            case StructuralRules.WIDTH:
                return "structure.register-width";
            case StructuralRules.OVERLAP:
                return "structure.overlapping-bits";
            case StructuralRules.DUPLICATE_NAME:
                return "structure.duplicate-name";
            case StructuralRules.DUPLICATE_ADDRESS:
                return "structure.duplicate-address";
            case StructuralRules.OUTSIDE_REGISTER:
                return "structure.field-outside-register";
            case StructuralRules.RESET_RANGE:
                return "structure.reset-code-outside-field";
            case StructuralRules.TRIM_NOT_WRITABLE:
                return "structure.trim-not-writable";
            default:
                return "structure.rule-" + code;
        }
    }

    private static void warm(ChipSpec spec, ReportCache cache) {
        List<Field> fields = new ArrayList<>();
        for (TreeIterator<EObject> it = spec.eAllContents(); it.hasNext();) {
            EObject o = it.next();
            if (o instanceof Field f) {
                fields.add(f);
                it.prune();
            }
        }
        fields.parallelStream().forEach(f -> {
            try {
                cache.quick(f);
            } catch (IllegalArgumentException e) {
                // reported by the 'analysable' constraint
            }
        });
    }
}
