package org.trimwright.analysis;

import java.util.Optional;

import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.mismatch.MismatchReport;

/**
 * Everything computed for one field, immutable. UI, validation and export read it; none of them recompute.
 *
 * @param inputs         the engine's view of the field (coding and scale)
 * @param settings       the settings the figures were computed with
 * @param coding         step table, decoder cost, glitch exposure, Verilog
 * @param mismatch       mismatch statistics (fields with a unit element)
 * @param exactMonotonic exact P(non-monotonic) with its numerical error (binary, Gray, segmented, unary fields)
 * @param exactDnl       exact P(max|DNL| &lt; limit), nominal-LSB definition (where the exact method applies)
 */
public record FieldReport(FieldInputs inputs, AnalysisSettings settings, CodingReport coding,
        Optional<MismatchReport> mismatch, Optional<ExactMonotonicity> exactMonotonic,
        Optional<ExactDnlYield> exactDnl) {
}
