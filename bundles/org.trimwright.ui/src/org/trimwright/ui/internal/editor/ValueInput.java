package org.trimwright.ui.internal.editor;

import org.trimwright.engine.units.SiUnit;
import org.trimwright.engine.units.SiValue;

/**
 * Reads what a designer types into a number box. Kinds: a value in the target's unit ("4mV", "1.5uA", "10k" for
 * 10 kOhm when the unit is Ohm; a bare number is taken in the base unit), a percentage ("0.5%" or "0.5"), a
 * fraction that may be written as a percentage ("99%" = 0.99), or a plain number (LSB, um^2, counts).
 * Messages name the field, the text and what was expected.
 */
public final class ValueInput {

    /** How a number box reads its text. */
    public enum Kind {
        /** A value in the unit of the field's analog target. */
        UNIT,
        /** A number of percent. */
        PERCENT,
        /** A fraction 0..1, also accepted as a percentage. */
        FRACTION,
        /** A plain number without unit. */
        PLAIN,
        /** A whole number (decimal or 0x hex). */
        INTEGER
    }

    private ValueInput() {
    }

    /**
     * Parses {@code text}.
     *
     * @param label what the box is called, for messages
     * @param unit  the target's unit (used with {@link Kind#UNIT})
     * @throws IllegalArgumentException with a message for the designer
     */
    public static double parse(String label, String text, Kind kind, SiUnit unit) {
        String t = text == null ? "" : text.strip();
        if (kind == Kind.INTEGER) {
            try {
                boolean hex = t.startsWith("0x") || t.startsWith("0X");
                return hex ? Long.parseLong(t.substring(2), 16) : Long.parseLong(t);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException(label + ": '" + text + "' is not a whole number (e.g. 12 or 0x0C)");
            }
        }
        SiValue v;
        try {
            v = SiValue.parse(t);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(label + ": " + e.getMessage());
        }
        switch (kind) {
            case UNIT:
                if (v.unit() != SiUnit.NONE && v.unit() != unit) {
                    throw new IllegalArgumentException(label + ": '" + text + "' is in " + v.unit().symbol()
                            + " but this field's target is in " + (unit == SiUnit.NONE ? "no unit" : unit.symbol())
                            + (unit == SiUnit.NONE ? "" : " (e.g. " + SiValue.format(v.value(), unit) + ")"));
                }
                return v.value();
            case PERCENT:
                if (v.unit() != SiUnit.NONE && v.unit() != SiUnit.PERCENT) {
                    throw new IllegalArgumentException(label + ": '" + text + "' should be a percentage, e.g. 0.5%");
                }
                return v.value();
            case FRACTION:
                if (v.unit() == SiUnit.PERCENT) {
                    return v.value() / 100.0;
                }
                if (v.unit() != SiUnit.NONE) {
                    throw new IllegalArgumentException(label + ": '" + text + "' should be a fraction or percentage,"
                            + " e.g. 0.99 or 99%");
                }
                return v.value();
            default:
                if (v.unit() != SiUnit.NONE) {
                    throw new IllegalArgumentException(label + ": '" + text + "' takes a plain number without unit");
                }
                return v.value();
        }
    }

    /** Formats a value the way {@link #parse} reads it back. */
    public static String format(double value, Kind kind, SiUnit unit) {
        switch (kind) {
            case UNIT:
                return unit == SiUnit.NONE ? plain(value) : SiValue.format(value, unit);
            case PERCENT:
                return plain(value) + "%";
            case INTEGER:
                return Long.toString((long) value);
            default:
                return plain(value);
        }
    }

    /** Shortest exact decimal text of a double ("0.5", "1e-06" as "1.0E-6"). */
    static String plain(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
