package org.trimwright.engine.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The text {@code String.format(Locale.ROOT, "%.Pg", v)} and {@code "%.Pe"} give, without the format-string parsing
 * and formatter objects behind them (a report formats tens of thousands of numbers). Same rule as
 * {@code java.util.Formatter}: the shortest decimal digits of the double (as {@code Double.toString}) rounded half up
 * to P significant digits; {@code %g} prints them in positional form when the rounded value is at least 1e-4 and
 * below 10^P, otherwise as {@code %e} does, with P - 1 decimals and an exponent of at least two digits. Checked
 * against {@code Formatter} over a million values.
 */
public final class Significant {

    private Significant() {
    }

    /** {@code String.format(Locale.ROOT, "%." + precision + "g", v)}; precision 1..17. */
    public static String general(double v, int precision) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity";
        }
        if (v == 0) {
            return (Double.doubleToRawLongBits(v) < 0 ? "-0" : "0") + (precision > 1 ? "." : "")
                    + "0".repeat(precision - 1);
        }
        BigDecimal r = rounded(v, precision);
        int e = r.precision() - r.scale() - 1;
        if (e >= -4 && e < precision) {
            return sign(v) + r.setScale(precision - 1 - e, RoundingMode.UNNECESSARY).toPlainString();
        }
        return sign(v) + scientific(r, e, precision - 1);
    }

    /** {@code String.format(Locale.ROOT, "%." + decimals + "e", v)}; decimals 0..16. */
    public static String scientific(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "NaN" : v > 0 ? "Infinity" : "-Infinity";
        }
        if (v == 0) {
            String m = decimals == 0 ? "0" : "0." + "0".repeat(decimals);
            return (Double.doubleToRawLongBits(v) < 0 ? "-" : "") + m + "e+00";
        }
        BigDecimal r = rounded(v, decimals + 1);
        return sign(v) + scientific(r, r.precision() - r.scale() - 1, decimals);
    }

    /** |v| as its shortest decimal digits, rounded half up to {@code digits} significant digits. */
    private static BigDecimal rounded(double v, int digits) {
        return new BigDecimal(Double.toString(Math.abs(v))).round(new MathContext(digits, RoundingMode.HALF_UP));
    }

    private static String sign(double v) {
        return v < 0 ? "-" : "";
    }

    private static String scientific(BigDecimal r, int exponent, int decimals) {
        String mantissa = r.movePointLeft(exponent).setScale(decimals, RoundingMode.UNNECESSARY).toPlainString();
        int a = Math.abs(exponent);
        return mantissa + (exponent < 0 ? "e-" : "e+") + (a < 10 ? "0" : "") + a;
    }
}
