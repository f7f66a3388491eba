package org.trimwright.export;

import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Coding;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.Limits;
import org.trimwright.model.Quantity;
import org.trimwright.model.Register;
import org.trimwright.model.SignedFormat;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.UnitElement;

/** Generates large specs for scale checks: blocks of 16-bit registers holding 4-bit and 6-bit trim fields. */
public final class LargeSpecs {

    private LargeSpecs() {
    }

    /** A spec of {@code fields} fields, optionally with {@code name} as every field's description. */
    public static ChipSpec generate(int fields, String description) {
        TrimwrightFactory f = TrimwrightFactory.eINSTANCE;
        ChipSpec spec = f.createChipSpec();
        spec.setName("GEN" + fields);
        spec.setRevision("A0");
        spec.setAuthor("generator");
        spec.setDescription("Generated spec with " + fields + " fields");
        CodingScheme[] schemes = {CodingScheme.BINARY, CodingScheme.THERMOMETER, CodingScheme.SEGMENTED,
            CodingScheme.GRAY, CodingScheme.ONE_HOT};
        int made = 0;
        int b = 0;
        while (made < fields) {
            Block blk = f.createBlock();
            blk.setName("B" + b);
            blk.setBaseAddress(0x1000L * b);
            spec.getBlocks().add(blk);
            for (int r = 0; r < 64 && made < fields; r++) {
                Register reg = f.createRegister();
                reg.setName("R" + r);
                reg.setAddressOffset(2L * r);
                reg.setWidth(16);
                blk.getRegisters().add(reg);
                int offset = 0;
                for (int k = 0; k < 3 && made < fields; k++) {
                    int width = k == 1 ? 6 : 4;
                    Field fd = f.createField();
                    fd.setName("F" + k);
                    fd.setBitOffset(offset);
                    fd.setWidth(width);
                    fd.setRole(FieldRole.TRIM);
                    fd.setDescription(description == null ? "generated field " + made : description);
                    offset += width;
                    CodingScheme s = schemes[made % schemes.length];
                    Coding c = f.createCoding();
                    c.setScheme(s);
                    if (s == CodingScheme.SEGMENTED) {
                        c.setUnaryBits(2);
                    }
                    fd.setCoding(c);
                    AnalogTarget t = f.createAnalogTarget();
                    t.setQuantity(Quantity.CURRENT);
                    t.setUnit("A");
                    t.setValueAtZero(1e-6);
                    t.setStep(1e-8);
                    t.setSignedFormat(SignedFormat.UNSIGNED);
                    t.setSafeMax(1e-6 + 40e-8);
                    fd.setTarget(t);
                    UnitElement e = f.createUnitElement();
                    e.setNominalValue(1e-8);
                    e.setUnitSigmaPercent(1.0);
                    fd.setElement(e);
                    Limits l = f.createLimits();
                    l.setMaxDnlLsb(0.5);
                    l.setMaxInlLsb(0.5);
                    fd.setLimits(l);
                    reg.getFields().add(fd);
                    made++;
                }
            }
            b++;
        }
        return spec;
    }
}
