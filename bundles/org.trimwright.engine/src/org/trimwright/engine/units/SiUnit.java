package org.trimwright.engine.units;

/**
 * The units a trim target may carry: volt, ampere, ohm, hertz, second, farad, percent, or none (a ratio).
 * Each unit has the symbol used when formatting and the spellings accepted when parsing.
 */
public enum SiUnit {
    VOLT("V"),
    AMPERE("A"),
    OHM("Ohm", "\u03A9", "ohm"),
    HERTZ("Hz"),
    SECOND("s"),
    FARAD("F"),
    PERCENT("%"),
    NONE("");

    private final String symbol;
    private final String[] spellings;

    SiUnit(String symbol, String... aliases) {
        this.symbol = symbol;
        this.spellings = new String[aliases.length + 1];
        this.spellings[0] = symbol;
        System.arraycopy(aliases, 0, this.spellings, 1, aliases.length);
    }

    /** The symbol written when formatting (e.g. {@code Ohm}); empty for a unitless ratio. */
    public String symbol() {
        return symbol;
    }

    /** True when {@code text} ends with one of this unit's spellings (never for {@link #NONE}). */
    boolean isSuffixOf(String text) {
        if (this == NONE) {
            return false;
        }
        for (String s : spellings) {
            if (text.endsWith(s)) {
                return true;
            }
        }
        return false;
    }

    /** Length of the spelling {@code text} ends with; 0 if none matches. */
    int suffixLength(String text) {
        int best = 0;
        for (String s : spellings) {
            if (this != NONE && text.endsWith(s) && s.length() > best) {
                best = s.length();
            }
        }
        return best;
    }

    /**
     * Parses a unit symbol ("V", "A", "Ohm", "\u03A9", "Hz", "s", "F", "%", or "" for none).
     *
     * @throws IllegalArgumentException naming the text when it is not a known unit
     */
    public static SiUnit fromSymbol(String text) {
        if (text == null || text.isEmpty()) {
            return NONE;
        }
        for (SiUnit u : values()) {
            for (String s : u.spellings) {
                if (s.equals(text)) {
                    return u;
                }
            }
        }
        throw new IllegalArgumentException("unknown unit '" + text + "' (expected V, A, Ohm, Hz, s, F or %)");
    }
}
