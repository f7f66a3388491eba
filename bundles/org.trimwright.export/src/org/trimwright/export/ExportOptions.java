package org.trimwright.export;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.trimwright.analysis.AnalysisSettings;

/**
 * What to export and how.
 *
 * @param formats        formats to write
 * @param settings       analysis settings (Monte Carlo trials, seed, gate library)
 * @param date           date printed on the title page
 * @param problemSources sources of validation problems (structural problems are always included: by a source that
 *                       {@link ProblemSource#coversStructure() covers them}, else by {@link StructuralProblems})
 */
public record ExportOptions(Set<ExportFormat> formats, AnalysisSettings settings, LocalDate date,
        List<ProblemSource> problemSources) {

    public ExportOptions {
        formats = Set.copyOf(formats);
        problemSources = List.copyOf(problemSources);
    }

    /** Every format, default settings, today, the analysis validation ({@link ValidationProblems}). */
    public static ExportOptions defaults() {
        return new ExportOptions(EnumSet.allOf(ExportFormat.class), AnalysisSettings.DEFAULTS, LocalDate.now(),
                List.of(new ValidationProblems()));
    }

    /** Replaces the problem sources (an empty list: structural problems only). */
    public ExportOptions withProblemSources(List<ProblemSource> sources) {
        return new ExportOptions(formats, settings, date, sources);
    }

    public ExportOptions withFormats(Set<ExportFormat> f) {
        return new ExportOptions(f, settings, date, problemSources);
    }

    public ExportOptions withSettings(AnalysisSettings s) {
        return new ExportOptions(formats, s, date, problemSources);
    }

    public ExportOptions withDate(LocalDate d) {
        return new ExportOptions(formats, settings, d, problemSources);
    }

    /** Adds a source of validation problems (the hook for the analysis validation). */
    public ExportOptions withProblemSource(ProblemSource source) {
        List<ProblemSource> l = new ArrayList<>(problemSources);
        l.add(source);
        return new ExportOptions(formats, settings, date, l);
    }
}
