package org.trimwright.export;

import java.util.List;

import org.trimwright.analysis.ReportCache;
import org.trimwright.model.ChipSpec;

/**
 * The hook through which validation problems reach the document. {@link ExportOptions#defaults()} uses
 * {@link ValidationProblems} (the analysis validation, structural findings included); further sources are added
 * with {@link ExportOptions#withProblemSource(ProblemSource)}. When no source {@link #coversStructure() covers the
 * structure}, the exporter adds {@link StructuralProblems}, so the structural problems are always in the document.
 */
public interface ProblemSource {

    /** Name of the checks, shown in the document (e.g. "structural checks of the register map"). */
    default String name() {
        return getClass().getSimpleName();
    }

    /** True when this source reports the structural problems of the register map itself. */
    default boolean coversStructure() {
        return false;
    }

    /** Every problem of the spec; the document groups them by path. */
    List<Problem> problems(ChipSpec spec);

    /**
     * Every problem of the spec, reading field reports from {@code cache} (the one the export's digest filled, so
     * nothing is computed twice). Sources that need no reports ignore the cache.
     */
    default List<Problem> problems(ChipSpec spec, ReportCache cache) {
        return problems(spec);
    }
}
