package org.trimwright.model.spec;

import java.io.IOException;
import java.nio.file.Path;

/** A spec file could not be read: names the file and, where known, the line and column. */
public class SpecLoadException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final int column;

    public SpecLoadException(Path file, int line, int column, String reason, Throwable cause) {
        super(format(file, line, column, reason), cause);
        this.file = file;
        this.line = line;
        this.column = column;
    }

    private static String format(Path file, int line, int column, String reason) {
        StringBuilder sb = new StringBuilder(String.valueOf(file));
        if (line > 0) {
            sb.append(':').append(line);
            if (column > 0) {
                sb.append(':').append(column);
            }
        }
        return sb.append(": ").append(reason).toString();
    }

    public Path getFile() {
        return file;
    }

    /** 1-based line of the problem, or 0 when unknown. */
    public int getLine() {
        return line;
    }

    /** 1-based column of the problem, or 0 when unknown. */
    public int getColumn() {
        return column;
    }
}
