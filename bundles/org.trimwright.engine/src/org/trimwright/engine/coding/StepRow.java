package org.trimwright.engine.coding;

import java.util.BitSet;
import java.util.List;

/**
 * One row of a step table: a register code and what it does. See {@link CodeMap} for the definitions.
 *
 * @param code           the register code
 * @param registerBits   the register contents, MSB first (n characters of 0/1)
 * @param signedSteps    s, the signed step count
 * @param level          position in value order (0 = lowest value)
 * @param outputs        electrical decoder outputs; bit i is output i (see {@link OutputLayout})
 * @param closedSwitches names of the switches closed, in port order
 * @param unitsInUse     unit elements in use (the array level L)
 * @param tap            selected tap of a select decoder, -1 for none or another scheme
 * @param value          nominal analog value, atZero + s * step, in the target's unit
 */
public record StepRow(int code, String registerBits, int signedSteps, int level, BitSet outputs,
        List<String> closedSwitches, int unitsInUse, int tap, double value) {

    public StepRow {
        outputs = (BitSet) outputs.clone();
        closedSwitches = List.copyOf(closedSwitches);
    }

    @Override
    public BitSet outputs() {
        return (BitSet) outputs.clone();
    }

    /** The outputs as a bit string with output {@code count-1} first (the order of a Verilog literal). */
    public String outputBits(int count) {
        StringBuilder sb = new StringBuilder(count);
        for (int i = count - 1; i >= 0; i--) {
            sb.append(outputs.get(i) ? '1' : '0');
        }
        return sb.toString();
    }
}
