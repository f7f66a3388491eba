package org.trimwright.analysis.diff;

import java.util.List;

/**
 * How one field differs between two specs.
 *
 * @param kind        {@code added}, {@code removed}, {@code moved} (bits or address changed, nothing else) or
 *                    {@code changed}
 * @param path        BLOCK/REGISTER/FIELD in the new spec (the old one for removed fields)
 * @param oldPath     the path in the old spec (differs when the field moved to another register), or null
 * @param changes     the attributes that differ (empty for added and removed)
 * @param consequence what the change does, or null (added, removed, moved, or not analysable)
 */
public record FieldDiff(String kind, String path, String oldPath, List<Change> changes, Consequence consequence) {

    public FieldDiff {
        changes = List.copyOf(changes);
    }
}
