package org.trimwright.export.doc;

import java.util.List;


/**
 * One piece of document content, rendered alike by the HTML and the PDF writer (so both carry the same text).
 * All strings are plain user or computed text; each writer escapes them for its medium.
 */
public sealed interface Part permits Part.Para, Part.KeyValues, Part.Table, Part.Chart, Part.Caution {

    /** A paragraph. */
    record Para(String text) implements Part {
    }

    /** Label/value rows. */
    record KeyValues(List<String[]> rows) implements Part {
        public KeyValues {
            rows = List.copyOf(rows);
        }
    }

    /** A table with a caption and a header row. */
    record Table(String caption, List<String> header, List<List<String>> rows) implements Part {
        public Table {
            header = List.copyOf(header);
            rows = List.copyOf(rows);
        }
    }

    /** A chart, built and recorded when a writer first draws it, and painted alike by every writer. */
    record Chart(String caption, ChartFigure figure) implements Part {
    }

    /** A caution: a code or setting that can hurt the chip. */
    record Caution(String text) implements Part {
    }
}
