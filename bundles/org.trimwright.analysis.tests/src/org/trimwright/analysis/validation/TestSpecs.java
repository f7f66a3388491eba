package org.trimwright.analysis.validation;

import java.util.List;
import java.util.stream.Collectors;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.model.Access;
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
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.UnitElement;

/** Small specs for validation tests: one block B, one 16-bit register R, fields built step by step. */
final class TestSpecs {

    static final TrimwrightFactory F = TrimwrightFactory.eINSTANCE;
    /** Few trials keep the tests fast; every asserted figure is far from its limit at this size. */
    static final AnalysisSettings SETTINGS = AnalysisSettings.DEFAULTS.withTrials(2000);

    final ChipSpec spec = F.createChipSpec();
    final Register reg = F.createRegister();

    TestSpecs() {
        spec.setName("T");
        Block b = F.createBlock();
        b.setName("B");
        reg.setName("R");
        reg.setWidth(16);
        spec.getBlocks().add(b);
        b.getRegisters().add(reg);
    }

    /** A read-write trim field of {@code bits} with the given scheme, unsigned, at 0 V with a 1 mV step. */
    Field trim(String name, int bits, CodingScheme scheme) {
        Field f = F.createField();
        f.setName(name);
        f.setWidth(bits);
        f.setBitOffset(reg.getFields().stream().mapToInt(x -> x.getBitOffset() + x.getWidth()).max().orElse(0));
        f.setRole(FieldRole.TRIM);
        f.setAccess(Access.READ_WRITE);
        AnalogTarget t = F.createAnalogTarget();
        t.setQuantity(Quantity.VOLTAGE);
        t.setUnit("V");
        t.setValueAtZero(0);
        t.setStep(0.001);
        t.setSignedFormat(SignedFormat.UNSIGNED);
        f.setTarget(t);
        Coding c = F.createCoding();
        c.setScheme(scheme);
        f.setCoding(c);
        reg.getFields().add(f);
        return f;
    }

    /** Adds a unit element of relative sigma {@code percent} and limits (must be monotonic, 0.5/1 LSB, 99 %). */
    static Field mismatch(Field f, double percent) {
        UnitElement e = F.createUnitElement();
        e.setNominalValue(f.getTarget().getStep());
        e.setMismatchSpec(MismatchSpec.RELATIVE_SIGMA);
        e.setUnitSigmaPercent(percent);
        f.setElement(e);
        Limits l = F.createLimits();
        l.setMustBeMonotonic(true);
        l.setMaxDnlLsb(0.5);
        l.setMaxInlLsb(1.0);
        l.setInlDefinition(InlDefinition.ENDPOINT);
        l.setTargetYield(0.99);
        f.setLimits(l);
        return f;
    }

    List<Finding> check() {
        return SpecValidation.validate(spec, new ReportCache(SETTINGS));
    }

    List<Finding> check(String ruleId) {
        return check().stream().filter(x -> x.ruleId().equals(ruleId)).collect(Collectors.toList());
    }
}
