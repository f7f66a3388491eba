package org.trimwright.export.doc;

import java.awt.geom.Rectangle2D;
import java.util.function.Supplier;

import org.jfree.chart.JFreeChart;
import org.trimwright.export.picture.Picture;
import org.trimwright.export.picture.RecordingGraphics;

/**
 * A chart of the document. On first use it is built, tuned for documents ({@link ChartTuning}), laid out and
 * recorded once as a {@link Picture}; every medium (SVG in HTML, vector graphics in PDF) then paints that picture,
 * so the chart's data, layout and text are computed once and are the same in every output. The chart's subtitle
 * (the definition or method of its figures) moves into the caption as the {@link Drawn#note}.
 * <p>
 * Thread-safe: the first caller records, later callers get the same picture.
 */
public final class ChartFigure {

    /** The recorded chart and the text of its subtitles. */
    public record Drawn(Picture picture, String note) {
    }

    private final Supplier<JFreeChart> build;
    private Drawn drawn;

    /** A figure of the chart {@code build} makes (called at most once). */
    public ChartFigure(Supplier<JFreeChart> build) {
        this.build = build;
    }

    /** The recorded chart, recorded on the first call. */
    public synchronized Drawn drawn() {
        if (drawn == null) {
            JFreeChart chart = ChartTuning.forDocument(build.get());
            String note = ChartTuning.takeNotes(chart);
            drawn = new Drawn(record(chart), note);
        }
        return drawn;
    }

    /** {@code chart} laid out and recorded at the document chart size. */
    static Picture record(JFreeChart chart) {
        // grid lines (and any other run of lines in one style) become one path each
        RecordingGraphics g = new RecordingGraphics(ChartSvg.WIDTH, ChartSvg.HEIGHT, true);
        chart.draw(g, new Rectangle2D.Double(0, 0, ChartSvg.WIDTH, ChartSvg.HEIGHT));
        g.dispose();
        return g.picture();
    }

    /** The caption followed by the chart's note, if any. */
    public String caption(String caption) {
        String note = drawn().note();
        return note.isEmpty() ? caption : caption + " \u2014 " + note;
    }
}
