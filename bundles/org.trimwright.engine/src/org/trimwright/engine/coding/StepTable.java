package org.trimwright.engine.coding;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * The step table of a field: one {@link StepRow} per register code 0..2^n-1, with the nominal value
 * atZero + s * step in the target's unit. Rows are computed on demand, so a 16-bit thermometer field does not
 * hold 2^16 output vectors of 2^16 bits at once.
 */
public final class StepTable {

    private final CodeMap map;
    private final double atZero;
    private final double step;

    /**
     * @param map    the field's code map
     * @param atZero value at s = 0, in the target's unit
     * @param step   value of one step (1 LSB), in the target's unit
     */
    public StepTable(CodeMap map, double atZero, double step) {
        if (!Double.isFinite(atZero) || !Double.isFinite(step)) {
            throw new IllegalArgumentException("at-zero value and step must be finite");
        }
        this.map = map;
        this.atZero = atZero;
        this.step = step;
    }

    public CodeMap map() {
        return map;
    }

    public double atZero() {
        return atZero;
    }

    public double step() {
        return step;
    }

    /** Number of rows, 2^n. */
    public int size() {
        return map.coding().codeCount();
    }

    /** Nominal value of {@code code}. */
    public double value(int code) {
        return atZero + map.signedSteps(code) * step;
    }

    /** The row of {@code code}. */
    public StepRow row(int code) {
        if (code < 0 || code >= size()) {
            throw new IllegalArgumentException("code " + code + " outside 0.." + (size() - 1));
        }
        int n = map.coding().bits();
        StringBuilder bits = new StringBuilder(n);
        for (int i = n - 1; i >= 0; i--) {
            bits.append((code >> i) & 1);
        }
        BitSet closed = map.closedSwitches(code);
        List<String> names = new ArrayList<>();
        for (int i = closed.nextSetBit(0); i >= 0; i = closed.nextSetBit(i + 1)) {
            names.add(map.layout().names().get(i));
        }
        return new StepRow(code, bits.toString(), map.signedSteps(code), map.level(code), map.outputs(code), names,
                map.unitsInUse(code), map.tap(code), value(code));
    }

    /** All rows in code order, computed as they are read. */
    public List<StepRow> rows() {
        return new AbstractList<>() {
            @Override
            public StepRow get(int index) {
                return row(index);
            }

            @Override
            public int size() {
                return StepTable.this.size();
            }
        };
    }
}
