package org.trimwright.model.rules;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.trimwright.model.Field;

/**
 * Hand-written checks behind the field constraints that need analysis figures (range, resolution, linearity,
 * coding fit, safe limits). The model does not know how the figures are computed: a bundle that does (the analysis
 * bundle) installs a provider in {@link FieldRules}; with none installed these constraints pass.
 */
public interface FieldRuleProvider {

    /**
     * Checks one constraint of one field.
     *
     * @param constraint  the constraint's name as declared in trimwright.ecore (e.g. {@code rangeCoversSpread})
     * @param field       the field
     * @param diagnostics where findings go (may be null: then only the result counts)
     * @param context     the validation context of the EMF Diagnostician
     * @return true when the field meets the constraint
     */
    boolean check(String constraint, Field field, DiagnosticChain diagnostics, Map<Object, Object> context);
}
