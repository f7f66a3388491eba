package org.trimwright.export.doc;

import java.util.ArrayList;
import java.util.List;

/**
 * One table row broken into lines per cell ({@link CellLines}). Within a cell the lines are one font size apart (the
 * leading {@code PdfPTable} gave its cells); {@code base} is the height of a one-line row (padding, the largest
 * font's ascent and descent, room for the rule); the row is as tall as its tallest cell. A row taller than the space
 * left on a page splits between lines: {@link #head} is what fits, {@link #tail} the rest.
 */
record RowLines(List<List<String>> cells, float[] sizes, float base) {

    float height() {
        float h = base;
        for (int i = 0; i < cells.size(); i++) {
            h = Math.max(h, base + Math.max(0, cells.get(i).size() - 1) * sizes[i]);
        }
        return h;
    }

    /** Whether no cell has a line left. */
    boolean isEmpty() {
        return cells.stream().allMatch(List::isEmpty);
    }

    /** The first lines of each cell that fit into {@code space} points (at least one line of each cell). */
    RowLines head(float space) {
        List<List<String>> c = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            c.add(cells.get(i).subList(0, taken(i, space)));
        }
        return new RowLines(c, sizes, base);
    }

    /** The lines left after {@link #head}. */
    RowLines tail(float space) {
        List<List<String>> c = new ArrayList<>();
        for (int i = 0; i < cells.size(); i++) {
            List<String> lines = cells.get(i);
            c.add(List.copyOf(lines.subList(taken(i, space), lines.size())));
        }
        return new RowLines(c, sizes, base);
    }

    private int taken(int cell, float space) {
        int n = cells.get(cell).size();
        int fit = 1 + (int) Math.floor((space - base) / sizes[cell]);
        return Math.min(n, Math.max(1, fit));
    }
}
