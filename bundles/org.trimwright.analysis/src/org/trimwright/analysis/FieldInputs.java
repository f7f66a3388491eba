package org.trimwright.analysis;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Coding;
import org.trimwright.model.Field;
import org.trimwright.model.SwitchPolarity;
import org.trimwright.model.spec.ElementPaths;

/**
 * The engine's view of one model field: coding and analog scale. A field without a coding is treated as a
 * plain binary field; one without a target as a unitless count (0 at code 0, step 1).
 *
 * @param path   BLOCK/REGISTER/FIELD
 * @param coding the digital side
 * @param atZero value at signed step count 0, in {@code unit}
 * @param step   value of one step, in {@code unit}
 * @param unit   the target's unit
 */
public record FieldInputs(String path, FieldCoding coding, double atZero, double step, SiUnit unit) {

    /** Maps a model field; throws {@link FieldMappingException} naming the path and value when it cannot. */
    public static FieldInputs of(Field field) {
        String path = ElementPaths.of(field);
        int bits = field.getWidth();
        if (bits < 1 || bits > FieldCoding.MAX_BITS) {
            throw new FieldMappingException(path, "width " + bits + " bits is outside 1.." + FieldCoding.MAX_BITS
                    + " that the engine analyses");
        }
        Coding c = field.getCoding();
        AnalogTarget t = field.getTarget();
        CodingScheme scheme = c == null ? CodingScheme.BINARY : scheme(c);
        SignedFormat format = t == null ? SignedFormat.UNSIGNED : format(t);
        int unary = scheme == CodingScheme.SEGMENTED ? c.getUnaryBits() : 0;
        boolean zero = c != null && c.isZeroState() && scheme.isSelect();
        boolean low = c != null && c.getPolarity() == SwitchPolarity.ACTIVE_LOW;
        FieldCoding coding;
        try {
            coding = new FieldCoding(bits, scheme, unary, format, zero, low);
        } catch (IllegalArgumentException e) {
            throw new FieldMappingException(path, e.getMessage());
        }
        if (t == null) {
            return new FieldInputs(path, coding, 0, 1, SiUnit.NONE);
        }
        SiUnit unit;
        try {
            unit = SiUnit.fromSymbol(t.getUnit());
        } catch (IllegalArgumentException e) {
            throw new FieldMappingException(path, "unit '" + t.getUnit() + "': " + e.getMessage());
        }
        if (!Double.isFinite(t.getValueAtZero()) || !Double.isFinite(t.getStep())) {
            throw new FieldMappingException(path, "value at zero " + t.getValueAtZero() + " and step " + t.getStep()
                    + " must be finite numbers");
        }
        return new FieldInputs(path, coding, t.getValueAtZero(), t.getStep(), unit);
    }

    /** The engine scheme of a model coding. */
    public static CodingScheme scheme(Coding c) {
        switch (c.getScheme()) {
            case BINARY:
                return CodingScheme.BINARY;
            case THERMOMETER:
                return CodingScheme.THERMOMETER;
            case ONE_HOT:
                return CodingScheme.ONE_HOT;
            case ONE_COLD:
                return CodingScheme.ONE_COLD;
            case GRAY:
                return CodingScheme.GRAY;
            case SEGMENTED:
                return CodingScheme.SEGMENTED;
            default:
                throw new IllegalStateException(c.getScheme().toString());
        }
    }

    /** The engine signed format of a model target. */
    public static SignedFormat format(AnalogTarget t) {
        switch (t.getSignedFormat()) {
            case UNSIGNED:
                return SignedFormat.UNSIGNED;
            case OFFSET_BINARY:
                return SignedFormat.OFFSET_BINARY;
            case TWOS_COMPLEMENT:
                return SignedFormat.TWOS_COMPLEMENT;
            case SIGN_MAGNITUDE:
                return SignedFormat.SIGN_MAGNITUDE;
            default:
                throw new IllegalStateException(t.getSignedFormat().toString());
        }
    }
}
