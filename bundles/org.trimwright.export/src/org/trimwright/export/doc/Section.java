package org.trimwright.export.doc;

import java.util.ArrayList;
import java.util.List;

/**
 * A titled piece of the document.
 *
 * @param id    anchor (HTML id, PDF destination)
 * @param title heading text
 * @param level 1 for chapters, 2 for subsections
 * @param parts content
 */
public record Section(String id, String title, int level, List<Part> parts) {

    public Section {
        parts = List.copyOf(parts);
    }

    /** A builder collecting parts. */
    public static final class Builder {
        private final String id;
        private final String title;
        private final int level;
        private final List<Part> parts = new ArrayList<>();

        public Builder(String id, String title, int level) {
            this.id = id;
            this.title = title;
            this.level = level;
        }

        public Builder para(String text) {
            parts.add(new Part.Para(text));
            return this;
        }

        public Builder add(Part p) {
            parts.add(p);
            return this;
        }

        public Section build() {
            return new Section(id, title, level, parts);
        }
    }
}
