package org.trimwright.engine.units;


/**
 * A number with an SI unit, e.g. {@code 1.2V}, {@code 4mV}, {@code 1.5uA}, {@code 10kOhm}, {@code 2.5MHz},
 * {@code 0.5%} or a unitless ratio {@code 0.25}. {@link #value()} is in the base unit (volt, ampere, ...);
 * a percentage keeps its number of percent (0.5% has value 0.5).
 * <p>
 * Accepted prefixes: f p n u \u00B5 m k M G (10^-15 .. 10^9). Prefixes are not applied to {@code %} or to
 * unitless numbers. Spaces between number, prefix and unit are allowed.
 *
 * @param value the magnitude in the base unit
 * @param unit  the unit
 */
public record SiValue(double value, SiUnit unit) {

    private static final String PREFIXES = "fpnu\u00B5mkMG";
    private static final int[] EXPONENTS = {-15, -12, -9, -6, -6, -3, 3, 6, 9};
    private static final String[] FORMAT_PREFIXES = {"f", "p", "n", "u", "m", "", "k", "M", "G"};

    public SiValue {
        if (unit == null) {
            throw new IllegalArgumentException("unit is required");
        }
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be finite, got " + value);
        }
    }

    /**
     * Parses text such as {@code "1.2V"}, {@code "-4 mV"}, {@code "10kOhm"}, {@code "3ns"}, {@code "0.5%"}.
     *
     * @throws IllegalArgumentException naming the text when it cannot be read
     */
    public static SiValue parse(String text) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("empty value: expected a number with an optional SI prefix and unit,"
                    + " e.g. 1.2V or 4mV");
        }
        String t = text.strip();
        SiUnit unit = SiUnit.NONE;
        int cut = 0;
        for (SiUnit u : SiUnit.values()) {
            int len = u.suffixLength(t);
            if (len > cut) {
                cut = len;
                unit = u;
            }
        }
        String rest = t.substring(0, t.length() - cut).strip();
        // "m" alone ends "1m" (milli, unitless) but "s" could also be second after a prefix: handled above.
        double scale = 1.0;
        if (!rest.isEmpty() && unit != SiUnit.PERCENT) {
            char last = rest.charAt(rest.length() - 1);
            int p = PREFIXES.indexOf(last);
            if (p >= 0) {
                scale = Math.pow(10, EXPONENTS[p]);
                rest = rest.substring(0, rest.length() - 1).strip();
            }
        }
        double number;
        try {
            if (rest.isEmpty() || !rest.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
                throw new NumberFormatException();
            }
            number = Double.parseDouble(rest);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("cannot read '" + text + "' as a value: expected a number with an"
                    + " optional SI prefix (f p n u m k M G) and unit (V, A, Ohm, Hz, s, F, %), e.g. 1.2V or 4mV");
        }
        return new SiValue(number * scale, unit);
    }

    /** Formats with an engineering prefix and up to 4 significant digits, e.g. {@code 1.5uA}. */
    public String format() {
        return format(value, unit);
    }

    /** Formats {@code v} in {@code unit} with an engineering prefix (no prefix for % and unitless values). */
    public static String format(double v, SiUnit unit) {
        if (unit == SiUnit.PERCENT || unit == SiUnit.NONE) {
            return plain(v) + unit.symbol();
        }
        if (v == 0) {
            return "0" + unit.symbol();
        }
        int exp3 = (int) Math.floor(Math.log10(Math.abs(v)) / 3) * 3;
        exp3 = Math.max(-15, Math.min(9, exp3));
        double scaled = v / Math.pow(10, exp3);
        // rounding to 4 significant digits can reach 1000: move to the next prefix
        if (Math.abs(Double.parseDouble(plain(scaled))) >= 1000 && exp3 < 9) {
            exp3 += 3;
            scaled = v / Math.pow(10, exp3);
        }
        return plain(scaled) + FORMAT_PREFIXES[(exp3 + 15) / 3] + unit.symbol();
    }

    /**
     * 4 significant digits ({@code %.4g}), trailing zeros dropped; {@code %.3e} where {@code %.4g} is scientific
     * (the same text: both round the same digits).
     */
    private static String plain(double v) {
        String s = Significant.general(v, 4);
        if (s.indexOf('e') >= 0) {
            return s;
        }
        if (s.indexOf('.') >= 0) {
            int end = s.length();
            while (s.charAt(end - 1) == '0') {
                end--;
            }
            if (s.charAt(end - 1) == '.') {
                end--;
            }
            s = s.substring(0, end);
        }
        return s.equals("-0") ? "0" : s;
    }

    @Override
    public String toString() {
        return format();
    }
}
