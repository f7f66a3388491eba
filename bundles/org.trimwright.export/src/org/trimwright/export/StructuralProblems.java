package org.trimwright.export;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EObject;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.spec.ElementPaths;
import org.trimwright.model.spec.SpecChecks;

/** The model's structural diagnostics ({@link SpecChecks}) as document problems. */
public final class StructuralProblems implements ProblemSource {

    @Override
    public String name() {
        return "structural checks of the register map";
    }

    @Override
    public List<Problem> problems(ChipSpec spec) {
        List<Problem> out = new ArrayList<>();
        collect(SpecChecks.validate(spec), out);
        return out;
    }

    private static void collect(Diagnostic d, List<Problem> out) {
        if (d.getChildren().isEmpty()) {
            if (d.getSeverity() != Diagnostic.OK) {
                String path = "";
                if (!d.getData().isEmpty() && d.getData().get(0) instanceof EObject e) {
                    path = ElementPaths.of(e);
                }
                out.add(new Problem(severity(d.getSeverity()), path, d.getMessage(), "structure"));
            }
            return;
        }
        for (Diagnostic c : d.getChildren()) {
            collect(c, out);
        }
    }

    private static String severity(int s) {
        if (s >= Diagnostic.ERROR) {
            return "error";
        }
        return s == Diagnostic.WARNING ? "warning" : "info";
    }
}
