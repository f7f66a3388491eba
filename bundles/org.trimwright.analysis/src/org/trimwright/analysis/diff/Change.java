package org.trimwright.analysis.diff;

/**
 * One attribute that differs between the old and the new version of a field.
 *
 * @param category  {@code position} (bits or address), {@code coding}, {@code step}, {@code range},
 *                  {@code element}, {@code limits} or {@code field} (access, role, reset code, search, stepping)
 * @param attribute the attribute, e.g. {@code coding.scheme} or {@code bitOffset}
 * @param oldValue  the old value as text ("-" when unset or absent)
 * @param newValue  the new value as text
 */
public record Change(String category, String attribute, String oldValue, String newValue) {
}
