package org.trimwright.analysis;

/** A model field cannot be mapped onto the engine: the message names the field's path and the bad value. */
public class FieldMappingException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String path;

    public FieldMappingException(String path, String message) {
        super(path + ": " + message);
        this.path = path;
    }

    public String getPath() {
        return path;
    }
}
