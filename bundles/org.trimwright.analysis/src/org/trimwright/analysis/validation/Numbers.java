package org.trimwright.analysis.validation;

import java.util.Locale;

import org.trimwright.analysis.FieldReport;
import org.trimwright.engine.units.SiValue;

/** Number formatting for messages. */
final class Numbers {

    private Numbers() {
    }

    /** A value in the field's unit with an SI prefix, e.g. 16 mV. */
    static String value(FieldReport r, double v) {
        return SiValue.format(v, r.inputs().unit());
    }

    /** A probability or fraction in compact scientific or percent form. */
    static String probability(double p) {
        if (p == 0) {
            return "0";
        }
        if (p >= 1e-3) {
            return String.format(Locale.ROOT, "%.4g", p);
        }
        return String.format(Locale.ROOT, "%.2e", p);
    }

    /** A yield in percent, e.g. 99.12 %. */
    static String percent(double y) {
        return String.format(Locale.ROOT, "%.2f %%", 100 * y);
    }

    /** A number of LSB, e.g. 0.53. */
    static String lsb(double x) {
        return String.format(Locale.ROOT, "%.3g", x);
    }
}
