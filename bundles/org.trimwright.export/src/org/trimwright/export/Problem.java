package org.trimwright.export;

/**
 * One validation problem shown in the document.
 *
 * @param severity "error", "warning" or "info"
 * @param path     BLOCK/REGISTER/FIELD (or a shorter path) of the element
 * @param message  the problem in words
 * @param source   who found it (e.g. "structure", "validation")
 * @param ruleId   stable id of the rule that found it (docs/check-and-diff.md), or null when the source has none
 * @param advice   a fix computed by the engine, or null
 */
public record Problem(String severity, String path, String message, String source, String ruleId, String advice) {

    /** A problem without rule id and advice. */
    public Problem(String severity, String path, String message, String source) {
        this(severity, path, message, source, null, null);
    }

    /** "source" or "source [rule id]", as the document shows who found it. */
    public String foundBy() {
        return ruleId == null ? source : source + " [" + ruleId + "]";
    }
}
