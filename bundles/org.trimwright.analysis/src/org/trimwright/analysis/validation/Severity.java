package org.trimwright.analysis.validation;

import org.eclipse.emf.common.util.Diagnostic;

/** How bad a finding is: an error breaks a stated requirement; a warning asks the designer to look. */
public enum Severity {
    ERROR("error", Diagnostic.ERROR),
    WARNING("warning", Diagnostic.WARNING);

    private final String key;
    private final int diagnosticSeverity;

    Severity(String key, int diagnosticSeverity) {
        this.key = key;
        this.diagnosticSeverity = diagnosticSeverity;
    }

    /** Lower-case key used in text and JSON output. */
    public String key() {
        return key;
    }

    /** The matching {@link Diagnostic} severity. */
    public int diagnosticSeverity() {
        return diagnosticSeverity;
    }

    /** The severity of an EMF diagnostic severity (INFO and OK count as warnings: only errors and warnings occur). */
    public static Severity of(int diagnosticSeverity) {
        return diagnosticSeverity >= Diagnostic.ERROR ? ERROR : WARNING;
    }
}
