package org.trimwright.export.doc;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.Tick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYDifferenceRenderer;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.renderer.xy.XYStepRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.TextTitle;

/**
 * Makes a chart of {@code org.trimwright.charts} cheaper to draw into a document, without changing what it shows:
 * <ul>
 * <li>no tick marks outside the axes (the grid lines mark the ticks), and tick labels formatted without
 * {@code DecimalFormat} ({@link FastTickUnits});</li>
 * <li>line and step series are drawn as one path per series instead of one element per segment (far fewer SVG elements
 * and PDF operators; {@link PathStepRenderer}, {@link PathBandRenderer} for the outlines of a band);</li>
 * <li>logarithmic axes label their decades as plain text {@code 1e-6} instead of a superscript exponent: the
 * superscript goes through a {@code TextLayout}, which JFreeSVG and OpenPDF draw as glyph outlines (large, slow, and
 * not searchable), plain labels stay text;</li>
 * <li>axis titles (and every other string JFreeChart draws through {@code TextUtils.drawRotatedString}) are drawn
 * with {@code Graphics2D.drawString} instead of JFreeChart's default work-around for an old JDK bug with rotated
 * text (a {@code TextLayout}, which JFreeSVG and OpenPDF again draw as glyph outlines). This is a process-wide
 * JFreeChart setting; the text is the same, now as text.</li>
 * </ul>
 */
final class ChartTuning {

    static {
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private ChartTuning() {
    }

    /**
     * Removes the chart's text subtitles and returns their text joined by "; " (empty when there are none). Our
     * charts carry the definition or method of their figures in a subtitle; a document prints that text in the
     * figure caption instead, as searchable text beside the chart, and the chart keeps its plot area.
     */
    static String takeNotes(JFreeChart chart) {
        List<String> notes = new ArrayList<>();
        for (int i = chart.getSubtitleCount() - 1; i >= 0; i--) {
            if (chart.getSubtitle(i) instanceof TextTitle t) {
                notes.add(0, t.getText());
                chart.removeSubtitle(t);
            }
        }
        return String.join("; ", notes);
    }

    /** Tunes {@code chart} in place and returns it. */
    static JFreeChart forDocument(JFreeChart chart) {
        tune(chart.getPlot());
        return chart;
    }

    private static void tune(Plot plot) {
        if (plot instanceof CombinedDomainXYPlot c) {
            for (XYPlot p : c.getSubplots()) {
                tune(p);
            }
        }
        if (plot instanceof XYPlot p) {
            for (int i = 0; i < p.getRendererCount(); i++) {
                XYItemRenderer r = p.getRenderer(i);
                if (r != null && r.getClass() == XYStepRenderer.class && p.getDataset(i) != null) {
                    p.setRenderer(i, PathStepRenderer.copyOf((XYStepRenderer) r, p.getDataset(i).getSeriesCount()),
                            false);
                } else if (r != null && r.getClass() == XYDifferenceRenderer.class && p.getDataset(i) != null) {
                    p.setRenderer(i, new PathBandRenderer((XYDifferenceRenderer) r,
                            p.getDataset(i).getSeriesCount()), false);
                } else if (r instanceof XYLineAndShapeRenderer l && !(r instanceof XYStepRenderer)) {
                    l.setDrawSeriesLineAsPath(true);
                }
            }
            for (int i = 0; i < p.getRangeAxisCount(); i++) {
                fastLabels(p.getRangeAxis(i));
                noTickMarks(p.getRangeAxis(i));
            }
            for (int i = 0; i < p.getDomainAxisCount(); i++) {
                fastLabels(p.getDomainAxis(i));
                noTickMarks(p.getDomainAxis(i));
            }
            for (int i = 0; i < p.getRangeAxisCount(); i++) {
                if (p.getRangeAxis(i) != null && p.getRangeAxis(i).getClass() == LogAxis.class) {
                    p.setRangeAxis(i, PlainLogAxis.copyOf((LogAxis) p.getRangeAxis(i)), false);
                }
            }
            for (int i = 0; i < p.getDomainAxisCount(); i++) {
                if (p.getDomainAxis(i) != null && p.getDomainAxis(i).getClass() == LogAxis.class) {
                    p.setDomainAxis(i, PlainLogAxis.copyOf((LogAxis) p.getDomainAxis(i)), false);
                }
            }
        }
    }

    /**
     * No tick marks outside the axes: the grid lines already mark every tick, and in a document of thousands of
     * charts the marks were a tenth of all drawing calls.
     */
    private static void noTickMarks(ValueAxis a) {
        if (a != null) {
            a.setTickMarksVisible(false);
            a.setMinorTickMarksVisible(false);
        }
    }

    /** Number axes choose among the same tick units, labelled without {@code DecimalFormat} ({@link FastTickUnits}). */
    private static void fastLabels(ValueAxis a) {
        // our charts never give NumberTickUnitSource a formatter of its own; its labels follow the size rule
        if (a instanceof NumberAxis n && n.getNumberFormatOverride() == null && n.isAutoTickUnitSelection()
                && n.getStandardTickUnits() != null
                && n.getStandardTickUnits().getClass() == org.jfree.chart.axis.NumberTickUnitSource.class) {
            n.setStandardTickUnits(new FastTickUnits(n.getStandardTickUnits()));
        }
    }

    /** A log axis whose tick labels are plain strings ("1e-6"), drawn as text. */
    static final class PlainLogAxis extends LogAxis {

        private static final long serialVersionUID = 1L;

        PlainLogAxis(String label) {
            super(label);
        }

        static PlainLogAxis copyOf(LogAxis a) {
            PlainLogAxis p = new PlainLogAxis(a.getLabel());
            p.setBase(a.getBase());
            p.setSmallestValue(a.getSmallestValue());
            p.setLowerMargin(a.getLowerMargin());
            p.setUpperMargin(a.getUpperMargin());
            p.setAutoRange(a.isAutoRange());
            if (!a.isAutoRange()) {
                p.setRange(a.getRange(), false, false);
            }
            p.setInverted(a.isInverted());
            p.setVisible(a.isVisible());
            p.setLabelFont(a.getLabelFont());
            p.setLabelPaint(a.getLabelPaint());
            p.setLabelInsets(a.getLabelInsets(), false);
            p.setTickLabelFont(a.getTickLabelFont());
            p.setTickLabelPaint(a.getTickLabelPaint());
            p.setTickLabelInsets(a.getTickLabelInsets());
            p.setTickLabelsVisible(a.isTickLabelsVisible());
            p.setAxisLineVisible(a.isAxisLineVisible());
            p.setAxisLinePaint(a.getAxisLinePaint());
            p.setAxisLineStroke(a.getAxisLineStroke());
            p.setTickMarksVisible(a.isTickMarksVisible());
            p.setTickMarkPaint(a.getTickMarkPaint());
            p.setTickMarkStroke(a.getTickMarkStroke());
            p.setMinorTickMarksVisible(a.isMinorTickMarksVisible());
            p.setMinorTickCount(a.getMinorTickCount());
            p.setAutoTickUnitSelection(a.isAutoTickUnitSelection(), false);
            if (!a.isAutoTickUnitSelection()) {
                p.setTickUnit(a.getTickUnit(), false, false);
            }
            return p;
        }

        /** Not used: {@link #refreshTicks} labels the ticks itself (LogAxis would format a superscript first). */
        @Override
        protected java.text.AttributedString createTickLabel(double value) {
            return EMPTY;
        }

        private static final java.text.AttributedString EMPTY = new java.text.AttributedString("");

        @Override
        @SuppressWarnings({"rawtypes", "unchecked"})
        public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea,
                org.jfree.chart.ui.RectangleEdge edge) {
            List<Tick> plain = new ArrayList<>();
            for (Object o : super.refreshTicks(g2, state, dataArea, edge)) {
                ValueTick t = (ValueTick) o;
                boolean major = t.getTickType() == TickType.MAJOR;
                plain.add(new NumberTick(t.getTickType(), t.getValue(), major ? label(t.getValue()) : "",
                        t.getTextAnchor(), t.getRotationAnchor(), t.getAngle()));
            }
            return plain;
        }

        /** "1e-6" for 10^-6 (other bases: the value in Java's shortest form). */
        String label(double value) {
            if (getBase() == 10) {
                long e = Math.round(Math.log10(value));
                if (Math.abs(Math.pow(10, e) - value) <= 1e-9 * value) {
                    return e == 0 ? "1" : e == 1 ? "10" : "1e" + e;
                }
            }
            return Double.toString(value);
        }
    }
}
