package org.trimwright.export;

import java.util.List;

import org.trimwright.model.ChipSpec;

/**
 * The hook through which validation problems reach the document. The exporter always uses
 * {@link StructuralProblems} (the model's structural diagnostics); the analysis validation adds its own source
 * through {@link ExportOptions#withProblemSource(ProblemSource)} (that is where the lead plugs in the analysis
 * problems after the validation branch is merged).
 */
public interface ProblemSource {

    /** Name of the checks, shown in the document (e.g. "structural checks of the register map"). */
    default String name() {
        return getClass().getSimpleName();
    }

    /** Every problem of the spec; the document groups them by path. */
    List<Problem> problems(ChipSpec spec);
}
