package org.trimwright.ui.internal.export;

import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.nio.file.Paths;

/**
 * Checks a folder typed into the export wizard before anything is written. A folder is usable when it is an
 * absolute path and either an existing, writable folder, or a path that does not exist yet whose nearest existing
 * parent is a writable folder (the export creates the missing folders).
 */
public final class OutputFolder {

    private OutputFolder() {
    }

    /** Why {@code text} is not a usable output folder, or null when it is. */
    public static String problem(String text) {
        if (text == null || text.isBlank()) {
            return "Choose an output folder.";
        }
        Path p;
        try {
            p = Paths.get(text.strip());
        } catch (InvalidPathException e) {
            return "'" + text.strip() + "' is not a valid path: " + e.getReason() + ".";
        }
        if (!p.isAbsolute()) {
            return "Give the output folder as a full path (e.g. /home/me/exports/chip), not '" + text.strip() + "'.";
        }
        if (Files.exists(p)) {
            if (!Files.isDirectory(p)) {
                return p + " is a file, not a folder.";
            }
            return Files.isWritable(p) ? null : "Cannot write in " + p + " (no permission).";
        }
        Path parent = p.getParent();
        while (parent != null && !Files.exists(parent)) {
            parent = parent.getParent();
        }
        if (parent == null) {
            return "No part of " + p + " exists.";
        }
        if (!Files.isDirectory(parent)) {
            return "Cannot create " + p + ": " + parent + " is a file, not a folder.";
        }
        return Files.isWritable(parent) ? null : "Cannot create " + p + ": no permission to write in " + parent + ".";
    }
}
