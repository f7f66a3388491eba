package org.trimwright.analysis.validation;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.trimwright.analysis.FieldReport;
import org.trimwright.analysis.ReportCache;
import org.trimwright.model.Field;
import org.trimwright.model.rules.FieldRuleProvider;
import org.trimwright.model.spec.ElementPaths;

/**
 * The analysis constraints of the generated validator: each reads the field's reports from a {@link ReportCache}
 * (the quick report first, the full one only where a rule needs it).
 * A diagnostic's data holds the field first and its {@link Finding} second.
 */
final class AnalysisRules implements FieldRuleProvider {

    private final ReportCache cache;
    private final Map<String, FieldRule> rules = new LinkedHashMap<>();

    AnalysisRules(ReportCache cache) {
        this.cache = cache;
        for (FieldRule r : List.of(new RangeRules.SpreadCoverage(), new RangeRules.StepResolution(),
                new RangeRules.ResidualAfterTrim(), new LinearityRules.MonotonicRiskRule(),
                new LinearityRules.YieldRule(), new CodingFitRules.SelectCodes(), new CodingFitRules.GlitchLimit(),
                new CodingFitRules.BinarySearch(), new SafeLimitsRule())) {
            rules.put(r.constraint(), r);
        }
    }

    @Override
    public boolean check(String constraint, Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
        if (constraint.equals("analysable")) {
            try {
                cache.quick(field);
                return true;
            } catch (IllegalArgumentException e) {
                String path = ElementPaths.of(field);
                add(diagnostics, field, Finding.of("analysis.field-not-analysable", Severity.ERROR, path,
                        "the engine cannot analyse this field: " + e.getMessage()));
                return false;
            }
        }
        FieldRule rule = rules.get(constraint);
        if (rule == null) {
            return true;
        }
        FieldReport report;
        try {
            report = cache.quick(field);
        } catch (IllegalArgumentException e) {
            return true;
        }
        List<Finding> found = rule.check(field, report, () -> cache.get(field));
        for (Finding f : found) {
            add(diagnostics, field, f);
        }
        return found.isEmpty();
    }

    private static void add(DiagnosticChain d, Field field, Finding f) {
        if (d != null) {
            d.add(new BasicDiagnostic(f.severity().diagnosticSeverity(), SpecValidation.SOURCE, 0,
                    f.path() + ": " + f.message(), new Object[] {field, f}));
        }
    }
}
