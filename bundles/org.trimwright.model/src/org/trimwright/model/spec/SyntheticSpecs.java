package org.trimwright.model.spec;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Random;

import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Coding;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.InlDefinition;
import org.trimwright.model.Limits;
import org.trimwright.model.MismatchSpec;
import org.trimwright.model.Quantity;
import org.trimwright.model.Register;
import org.trimwright.model.SignedFormat;
import org.trimwright.model.SwitchPolarity;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.UnitElement;

/**
 * Large generated specs for benchmarks and load tests: {@code fields} trim fields, two per 16-bit register, eight
 * registers per block, cycling through every scheme and signed format with widths of 3 to 10 bits, mostly 3 to 6 (thermometer up
 * to 6, select up to 4), small unit mismatch, a spread inside the code range and an accuracy of 0.8 steps.
 * Deterministic for a seed. The numbers are invented and make no claim about any real design.
 */
public final class SyntheticSpecs {

    private static final TrimwrightFactory F = TrimwrightFactory.eINSTANCE;
    private static final CodingScheme[] SCHEMES = {CodingScheme.BINARY, CodingScheme.SEGMENTED,
        CodingScheme.THERMOMETER, CodingScheme.GRAY, CodingScheme.ONE_HOT, CodingScheme.ONE_COLD};
    /** Widths drawn uniformly from this list: mostly 3 to 6 bits, some 8 and 10 (typical trim fields). */
    private static final int[] WIDTHS = {3, 4, 4, 5, 5, 6, 6, 8, 10};

    private SyntheticSpecs() {
    }

    /** A spec with {@code fields} trim fields. */
    public static ChipSpec generate(int fields, long seed) {
        Random rnd = new Random(seed);
        ChipSpec spec = F.createChipSpec();
        spec.setName("SYNTH" + fields);
        spec.setRevision("A0");
        spec.setDescription("Generated spec with " + fields + " trim fields (seed " + seed + ")");
        Block block = null;
        Register reg = null;
        for (int i = 0; i < fields; i++) {
            if (i % 16 == 0) {
                block = F.createBlock();
                block.setName("B" + (i / 16));
                block.setBaseAddress(0x100L * (i / 16));
                spec.getBlocks().add(block);
            }
            if (i % 2 == 0) {
                reg = F.createRegister();
                reg.setName("R" + (i % 16) / 2);
                reg.setAddressOffset((i % 16) / 2 * 2L);
                reg.setWidth(16);
                block.getRegisters().add(reg);
            }
            reg.getFields().add(field(i, rnd));
        }
        return spec;
    }

    private static Field field(int i, Random rnd) {
        CodingScheme scheme = SCHEMES[i % SCHEMES.length];
        int width = WIDTHS[rnd.nextInt(WIDTHS.length)];
        if (scheme == CodingScheme.THERMOMETER) {
            width = Math.min(width, 6);
        } else if (scheme == CodingScheme.ONE_HOT || scheme == CodingScheme.ONE_COLD) {
            width = Math.min(width, 4);
        }
        Field f = F.createField();
        f.setName("F" + i);
        f.setBitOffset(i % 2 == 0 ? 0 : 8);
        f.setWidth(Math.min(width, 8));
        width = f.getWidth();
        f.setRole(FieldRole.TRIM);
        f.setResetCode(1L << (width - 1));
        SignedFormat format = SignedFormat.get((i / SCHEMES.length) % 4);
        AnalogTarget t = F.createAnalogTarget();
        t.setQuantity(Quantity.CURRENT);
        t.setUnit("A");
        double step = 1e-7 * (1 + rnd.nextInt(9));
        t.setStep(step);
        t.setSignedFormat(format);
        int codes = 1 << width;
        double atZero = format == SignedFormat.UNSIGNED ? 1e-5 - step * codes / 2.0 : 1e-5;
        t.setValueAtZero(atZero);
        t.setTargetValue(1e-5);
        t.setSpreadMin(1e-5 - step * codes * 0.35);
        t.setSpreadMax(1e-5 + step * codes * 0.35);
        t.setAccuracy(0.8 * step);
        f.setTarget(t);
        Coding c = F.createCoding();
        c.setScheme(scheme);
        c.setUnaryBits(scheme == CodingScheme.SEGMENTED ? Math.min(3, width) : 0);
        c.setPolarity(i % 3 == 0 ? SwitchPolarity.ACTIVE_LOW : SwitchPolarity.ACTIVE_HIGH);
        f.setCoding(c);
        UnitElement e = F.createUnitElement();
        e.setNominalValue(step);
        e.setMismatchSpec(MismatchSpec.RELATIVE_SIGMA);
        e.setUnitSigmaPercent(0.05 + 0.05 * rnd.nextInt(4));
        f.setElement(e);
        Limits l = F.createLimits();
        l.setMustBeMonotonic(true);
        l.setMaxDnlLsb(0.5);
        l.setMaxInlLsb(1.0);
        l.setInlDefinition(InlDefinition.get(i % 3));
        l.setTargetYield(0.99);
        f.setLimits(l);
        return f;
    }

    /** Writes a generated spec: {@code SyntheticSpecs FIELDS FILE [SEED]}. */
    public static void main(String[] args) throws IOException {
        if (args.length < 2) {
            System.err.println("usage: SyntheticSpecs FIELDS FILE [SEED]");
            System.exit(2);
        }
        int n = Integer.parseInt(args[0]);
        long seed = args.length > 2 ? Long.parseLong(args[2]) : 1;
        SpecFiles.save(generate(n, seed), Path.of(args[1]));
        System.out.println("wrote " + n + " fields to " + args[1]);
    }
}
