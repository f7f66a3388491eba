package org.trimwright.export;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.analysis.validation.Finding;
import org.trimwright.analysis.validation.SpecValidation;
import org.trimwright.model.ChipSpec;

/**
 * The analysis validation ({@link SpecValidation#validate}, the same findings as {@code trimwright check}) as
 * document problems: each {@link Finding} keeps its rule id, severity, path, message and advice. It includes the
 * structural findings ({@code structure.*} ids), so the exporter does not add {@link StructuralProblems} beside it.
 */
public final class ValidationProblems implements ProblemSource {

    /** Value of {@link Problem#source()} for these problems. */
    public static final String SOURCE = "validation";

    @Override
    public String name() {
        return "validation of the spec (structure, range, linearity, coding fit, safe limits; as trimwright check)";
    }

    @Override
    public boolean coversStructure() {
        return true;
    }

    /** Validates with a cache of its own (default settings); the exporter calls the cached variant instead. */
    @Override
    public List<Problem> problems(ChipSpec spec) {
        return problems(spec, new ReportCache(AnalysisSettings.DEFAULTS));
    }

    @Override
    public List<Problem> problems(ChipSpec spec, ReportCache cache) {
        List<Problem> out = new ArrayList<>();
        for (Finding f : SpecValidation.validate(spec, cache)) {
            out.add(of(f));
        }
        return out;
    }

    /** One finding as a document problem. */
    public static Problem of(Finding f) {
        return new Problem(f.severity().key(), f.path(), f.message(), SOURCE, f.ruleId(), f.advice());
    }
}
