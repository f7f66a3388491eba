package org.trimwright.engine.glitch;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.engine.coding.CodeMap;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.logic.GateType;

/**
 * A remedy for glitches and what it costs.
 *
 * @param remedy          short key: {@code gray-register} or {@code resample-outputs}
 * @param text            what to do, when it helps, and how the cost was counted
 * @param flops           flip-flops added (0 for the Gray remedy)
 * @param xorGates        XOR2 gates added (0 for resampling)
 * @param nand2Equivalent logic cost in NAND2 equivalents (transistors / 4); flops are given as a count only
 */
public record GlitchAdvice(String remedy, String text, int flops, int xorGates, double nand2Equivalent) {

    /** Transistors of one XOR2 built from four NAND2 (the mapping used by the decoder synthesis). */
    public static final int XOR_TRANSISTORS = 4 * GateType.NAND2.transistors();

    /** Advice for a field whose steps are {@code steps}; empty when no step can glitch. */
    static List<GlitchAdvice> of(CodeMap map, List<GlitchStep> steps) {
        List<GlitchAdvice> out = new ArrayList<>();
        if (steps.stream().noneMatch(s -> s.excursionLsb() > 0)) {
            return out;
        }
        int n = map.coding().bits();
        int outputs = map.layout().size();
        if (map.coding().scheme() != CodingScheme.GRAY) {
            int xor = n - 1;
            out.add(new GlitchAdvice("gray-register", "For a field stepped one code at a time: hold the code in Gray"
                    + " form and convert it back with an XOR chain in front of the decoder (" + xor + " XOR2, each"
                    + " four NAND2 = " + XOR_TRANSISTORS + " transistors). Adjacent Gray codes differ in one bit, so"
                    + " no intermediate code exists; jumps of more than one code still toggle several bits.", 0, xor,
                    xor * XOR_TRANSISTORS / 4.0));
        }
        out.add(new GlitchAdvice("resample-outputs", "Resample the " + outputs + " decoder outputs in a register"
                + " clocked after the field settles: " + outputs + " flip-flops (one per decoder output), which also"
                + " hides decoder hazards. A shadow register of the " + n + " field bits (" + n + " flip-flops)"
                + " removes only write skew between register bits, not skew in the decoder paths.", outputs, 0, 0));
        return out;
    }
}
