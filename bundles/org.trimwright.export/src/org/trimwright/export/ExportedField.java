package org.trimwright.export;

import org.trimwright.analysis.FieldReport;
import org.trimwright.model.Block;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/**
 * One field as every format sees it.
 *
 * @param block    its block
 * @param register its register
 * @param field    the field
 * @param path     BLOCK/REGISTER/FIELD
 * @param address  block base address + register offset
 * @param report   the analysis report, or null when the field could not be analysed
 * @param error    why it could not be analysed, or null
 */
public record ExportedField(Block block, Register register, Field field, String path, long address,
        FieldReport report, String error) {

    /** Register value with this field at {@code code} and every other bit zero. */
    public long registerValue(long code) {
        return (code & ((1L << field.getWidth()) - 1)) << field.getBitOffset();
    }

    /** Mask of the field's bits in the register. */
    public long mask() {
        return ((1L << field.getWidth()) - 1) << field.getBitOffset();
    }
}
