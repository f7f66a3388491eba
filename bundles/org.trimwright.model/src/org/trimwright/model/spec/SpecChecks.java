package org.trimwright.model.spec;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.TrimwrightPackage;

/** Runs the model's structural validation over a whole spec. */
public final class SpecChecks {

    private SpecChecks() {
    }

    /** The validator's diagnostics for the spec (children hold one finding each). */
    public static Diagnostic validate(ChipSpec spec) {
        TrimwrightPackage.eINSTANCE.eClass();
        return Diagnostician.INSTANCE.validate(spec);
    }
}
