package org.trimwright.export.doc;

import java.util.Locale;

import org.trimwright.engine.memo.BoundedMemo;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.engine.units.Significant;
import org.trimwright.engine.units.SiValue;

/** Number formats of the document. */
public final class Numbers {

    private Numbers() {
    }

    /** A probability or yield: 4 significant digits, scientific below 1e-3. */
    public static String p(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        if (v == 0) {
            return "0";
        }
        if (Math.abs(v) < 1e-3) {
            return Significant.scientific(v, 3);
        }
        return Significant.general(v, 4);
    }

    /** A value in LSB, 3 decimals. */
    public static String lsb(double v) {
        return String.format(Locale.ROOT, "%.3f LSB", v);
    }

    /** A plain number, 4 significant digits. */
    public static String g(double v) {
        return Significant.general(v, 4);
    }

    /** A physical value with engineering prefix. */
    public static String si(double v, SiUnit unit) {
        return SI.get(new SiKey(Double.doubleToLongBits(v), unit), k -> SiValue.format(v, unit));
    }

    /** A value and its unit, compared bit for bit. */
    private record SiKey(long bits, SiUnit unit) {
    }

    /**
     * Formatted values: step tables of many fields repeat the same values, and {@code SiValue.format} (a
     * {@code String.format} and two regular expressions) was 7 % of an export. Bounded; the text is unchanged.
     */
    private static final BoundedMemo<SiKey, String> SI = new BoundedMemo<>(16_384);

    /** A physical value in a unit given by its symbol (unknown symbols are appended as text). */
    public static String si(double v, String unit) {
        try {
            return si(v, SiUnit.fromSymbol(unit == null ? "" : unit));
        } catch (IllegalArgumentException e) {
            return g(v) + " " + unit;
        }
    }

    /** An address as 0x hex, 8 digits. */
    public static String hex(long v) {
        return String.format(Locale.ROOT, "0x%08X", v);
    }

    /** A bit range msb:lsb. */
    public static String bits(int offset, int width) {
        return width == 1 ? "[" + offset + "]" : "[" + (offset + width - 1) + ":" + offset + "]";
    }
}
