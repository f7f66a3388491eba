package org.trimwright.analysis.validation;

import java.util.List;

import org.trimwright.analysis.FieldReport;
import org.trimwright.model.Field;

/**
 * One analysis constraint of a field. It reads the field's cached {@link FieldReport} and never recomputes what the
 * engine has already computed.
 */
interface FieldRule {

    /** The constraint's name in trimwright.ecore. */
    String constraint();

    /** The findings for {@code field} (empty when it meets the constraint or the constraint does not apply). */
    List<Finding> check(Field field, FieldReport report);
}
