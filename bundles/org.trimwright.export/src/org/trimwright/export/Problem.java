package org.trimwright.export;

/**
 * One validation problem shown in the document.
 *
 * @param severity "error", "warning" or "info"
 * @param path     BLOCK/REGISTER/FIELD (or a shorter path) of the element
 * @param message  the problem in words
 * @param source   who found it (e.g. "structure")
 */
public record Problem(String severity, String path, String message, String source) {
}
