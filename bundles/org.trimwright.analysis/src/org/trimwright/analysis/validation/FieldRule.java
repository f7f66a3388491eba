package org.trimwright.analysis.validation;

import java.util.List;
import java.util.function.Supplier;

import org.trimwright.analysis.FieldReport;
import org.trimwright.model.Field;

/**
 * One analysis constraint of a field. It reads the field's cached reports and never recomputes what the engine has
 * already computed: first the quick report (no segmentation advice, no exact figures), and the full one only when
 * the quick one cannot clear the field.
 */
interface FieldRule {

    /** The constraint's name in trimwright.ecore. */
    String constraint();

    /**
     * The findings for {@code field} (empty when it meets the constraint or the constraint does not apply).
     *
     * @param report the quick report (or the full one when it is cached)
     * @param full   the full report, computed once on first request
     */
    List<Finding> check(Field field, FieldReport report, Supplier<FieldReport> full);
}
