package org.trimwright.engine.logic;

/**
 * Static CMOS gates of the decoder netlist with their transistor counts: an n-input NAND or NOR has n series
 * and n parallel devices (2n), an inverter 2. A NAND2 equivalent is 4 transistors (common practice, no source).
 */
public enum GateType {
    INV(1, "not"),
    NAND2(2, "nand"),
    NOR2(2, "nor"),
    NAND3(3, "nand"),
    NOR3(3, "nor");

    private final int inputs;
    private final String primitive;

    GateType(int inputs, String primitive) {
        this.inputs = inputs;
        this.primitive = primitive;
    }

    public int inputs() {
        return inputs;
    }

    /** Transistors of the static CMOS gate: 2 per input. */
    public int transistors() {
        return 2 * inputs;
    }

    /** The Verilog-2005 gate primitive ({@code not}, {@code nand}, {@code nor}). */
    public String primitive() {
        return primitive;
    }

    /** The NAND gate with {@code inputs} inputs (2 or 3). */
    public static GateType nand(int inputs) {
        return inputs == 2 ? NAND2 : inputsOf(inputs, NAND3);
    }

    /** The NOR gate with {@code inputs} inputs (2 or 3). */
    public static GateType nor(int inputs) {
        return inputs == 2 ? NOR2 : inputsOf(inputs, NOR3);
    }

    private static GateType inputsOf(int inputs, GateType three) {
        if (inputs != 3) {
            throw new IllegalArgumentException("no " + inputs + "-input gate in the library");
        }
        return three;
    }
}
