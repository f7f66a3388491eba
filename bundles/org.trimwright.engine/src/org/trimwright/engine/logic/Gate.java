package org.trimwright.engine.logic;

import java.util.List;

/**
 * One gate instance of a {@link Netlist}.
 *
 * @param type   the gate type
 * @param output the net it drives
 * @param inputs the nets it reads, {@code type.inputs()} of them
 */
public record Gate(GateType type, String output, List<String> inputs) {

    public Gate {
        inputs = List.copyOf(inputs);
        if (inputs.size() != type.inputs()) {
            throw new IllegalArgumentException(type + " needs " + type.inputs() + " inputs, got " + inputs.size());
        }
    }
}
