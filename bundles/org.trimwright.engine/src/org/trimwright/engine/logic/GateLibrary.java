package org.trimwright.engine.logic;

/**
 * The gates a decoder is mapped to: INV, NAND2, NOR2, and NAND3/NOR3 when {@code maxFanIn} is 3.
 *
 * @param maxFanIn     largest gate fan-in, 2 or 3
 * @param inputBuffers true: every register input used gets a local buffer pair (an inverter for the
 *                     inverted copy and a second inverter for the true copy, 2 INV); false: gates read the
 *                     register output directly and an inverter is added only where the complement is used
 */
public record GateLibrary(int maxFanIn, boolean inputBuffers) {

    /** INV, NAND2, NOR2 with local input buffers. */
    public static final GateLibrary TWO_INPUT = new GateLibrary(2, true);
    /** INV, NAND2/3, NOR2/3 with local input buffers. */
    public static final GateLibrary THREE_INPUT = new GateLibrary(3, true);

    public GateLibrary {
        if (maxFanIn != 2 && maxFanIn != 3) {
            throw new IllegalArgumentException("gate fan-in must be 2 or 3, got " + maxFanIn);
        }
    }
}
