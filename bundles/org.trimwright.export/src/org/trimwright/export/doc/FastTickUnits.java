package org.trimwright.export.doc;

import java.text.DecimalFormatSymbols;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;

import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.TickUnit;
import org.jfree.chart.axis.TickUnitSource;

/**
 * The tick units of an axis, with labels formatted without {@code DecimalFormat}. JFreeChart formats every candidate
 * tick label through {@code DecimalFormat} while it chooses a tick unit and again while it draws; in a document of
 * thousands of charts that formatting was a fifth of laying a chart out. This source asks the axis's own source for
 * each unit (same sizes, same choice) and swaps a plain fixed-decimal format ({@link Fixed}) in for the
 * {@code DecimalFormat} that source uses for the unit's size (steps from 1e-4 to 1e6); other units (scientific
 * labels) are kept as they are. Only for axes whose source is JFreeChart's {@code NumberTickUnitSource} without a
 * formatter of its own (see {@code ChartTuning}).
 */
final class FastTickUnits implements TickUnitSource {


    private final TickUnitSource delegate;

    FastTickUnits(TickUnitSource delegate) {
        this.delegate = delegate;
    }

    @Override
    public TickUnit getLargerTickUnit(TickUnit unit) {
        TickUnit t = delegate.getCeilingTickUnit(unit.getSize());
        if (t.getSize() <= unit.getSize()) {
            t = delegate.getLargerTickUnit(t);
        }
        return fast(t);
    }

    @Override
    public TickUnit getCeilingTickUnit(TickUnit unit) {
        return fast(delegate.getCeilingTickUnit(unit.getSize()));
    }

    @Override
    public TickUnit getCeilingTickUnit(double size) {
        return fast(delegate.getCeilingTickUnit(size));
    }

    /**
     * {@code t} with a {@link Fixed} format in place of the one JFreeChart's {@code NumberTickUnitSource} gives a
     * unit of this size: sizes f * 10^p (f = 1, 2, 5) with p = -4..-1 get "0.0000".."0.0", p = 0..6 get "#,##0";
     * other sizes (scientific labels) keep their unit.
     */
    static TickUnit fast(TickUnit t) {
        if (!(t instanceof NumberTickUnit n) || n.getClass() != NumberTickUnit.class) {
            return t;
        }
        int power = (int) Math.floor(Math.log10(n.getSize()) + 1e-9);
        if (power < -4 || power > 6) {
            return t;
        }
        return new NumberTickUnit(n.getSize(), BY_POWER[power + 4], n.getMinorTickCount());
    }

    /** The format for sizes 10^p, p = -4..6 (as NumberTickUnitSource picks them, in this JVM's locale). */
    private static final Fixed[] BY_POWER = new Fixed[11];

    static {
        // NumberTickUnitSource's patterns: "0.0000" .. "0.0" below 1, "#,##0" from 1 (grouping by 3), in the
        // default format locale's symbols
        DecimalFormatSymbols s = DecimalFormatSymbols.getInstance();
        for (int p = -4; p <= 6; p++) {
            BY_POWER[p + 4] = new Fixed(Math.max(0, -p), p < 0 ? 0 : 3, s.getGroupingSeparator(),
                    s.getDecimalSeparator(), s.getMinusSign());
        }
    }

    /**
     * Fixed-point labels as a plain {@code DecimalFormat} pattern such as "0.00" or "#,##0" writes them (same digits,
     * grouping, symbols and half-even rounding of the exact value), except that a value rounding to zero prints
     * without a minus sign.
     */
    static final class Fixed extends NumberFormat {

        private static final long serialVersionUID = 1L;
        private static final long[] SCALE = {1, 10, 100, 1000, 10000};

        private final int decimals;
        private final int groupingSize;
        private final char grouping;
        private final char point;
        private final char minus;

        private Fixed(int decimals, int groupingSize, char grouping, char point, char minus) {
            this.decimals = decimals;
            this.groupingSize = groupingSize;
            this.grouping = grouping;
            this.point = point;
            this.minus = minus;
        }

        @Override
        public StringBuffer format(double v, StringBuffer to, FieldPosition pos) {
            if (!Double.isFinite(v) || Math.abs(v) >= 1e14) {
                return to.append(v);
            }
            long scale = SCALE[decimals];
            double scaled = Math.abs(v) * scale;
            long r = Math.round(scaled);
            if (Math.abs(scaled - Math.floor(scaled) - 0.5) < 1e-6) {
                // near a tie: round the exact binary value half-even, as DecimalFormat does
                r = new java.math.BigDecimal(Math.abs(v)).setScale(decimals, java.math.RoundingMode.HALF_EVEN)
                        .unscaledValue().longValueExact();
            }
            if (v < 0 && r != 0) {
                to.append(minus);
            }
            String whole = Long.toString(r / scale);
            if (groupingSize > 0) {
                for (int i = 0; i < whole.length(); i++) {
                    if (i > 0 && (whole.length() - i) % groupingSize == 0) {
                        to.append(grouping);
                    }
                    to.append(whole.charAt(i));
                }
            } else {
                to.append(whole);
            }
            if (decimals > 0) {
                to.append(point);
                String frac = Long.toString(r % scale);
                for (int i = frac.length(); i < decimals; i++) {
                    to.append('0');
                }
                to.append(frac);
            }
            return to;
        }

        @Override
        public StringBuffer format(long v, StringBuffer to, FieldPosition pos) {
            return format((double) v, to, pos);
        }

        @Override
        public Number parse(String source, ParsePosition pos) {
            throw new UnsupportedOperationException("tick labels are not parsed");
        }

        @Override
        public boolean equals(Object o) {
            return this == o;
        }

        @Override
        public int hashCode() {
            return System.identityHashCode(this);
        }
    }
}
