package org.trimwright.model.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;

import org.eclipse.emf.common.util.Diagnostic;
import org.junit.jupiter.api.Test;
import org.trimwright.model.Access;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.rules.StructuralRules;

class StructuralRulesTest {

    private static final TrimwrightFactory F = TrimwrightFactory.eINSTANCE;

    private final ChipSpec spec = F.createChipSpec();
    private final Block block = F.createBlock();
    private final Register reg = F.createRegister();

    StructuralRulesTest() {
        spec.setName("T");
        block.setName("B");
        reg.setName("R");
        reg.setWidth(8);
        spec.getBlocks().add(block);
        block.getRegisters().add(reg);
    }

    private Field field(String name, int offset, int width) {
        Field f = F.createField();
        f.setName(name);
        f.setBitOffset(offset);
        f.setWidth(width);
        reg.getFields().add(f);
        return f;
    }

    private List<Diagnostic> findings(int code) {
        return SpecChecks.validate(spec).getChildren().stream().filter(d -> d.getCode() == code)
                .collect(Collectors.toList());
    }

    @Test
    void cleanRegisterHasNoFindings() {
        field("A", 0, 4);
        field("B", 4, 4);
        assertEquals(Diagnostic.OK, SpecChecks.validate(spec).getSeverity());
    }

    @Test
    void overlappingBitsAreReportedWithPathAndBits() {
        field("A", 0, 4);
        field("B", 3, 2);
        List<Diagnostic> d = findings(StructuralRules.OVERLAP);
        assertEquals(1, d.size());
        assertEquals("B/R/B: bits [3] overlap field 'A' ([3:0]) in register R", d.get(0).getMessage());
    }

    @Test
    void fieldWiderThanItsRegisterIsReported() {
        field("A", 5, 4);
        assertEquals(1, findings(StructuralRules.OUTSIDE_REGISTER).size());
        reg.setWidth(16);
        assertEquals(0, findings(StructuralRules.OUTSIDE_REGISTER).size());
    }

    @Test
    void resetCodeOutOfRangeIsReported() {
        Field a = field("A", 0, 3);
        a.setResetCode(8);
        assertTrue(findings(StructuralRules.RESET_RANGE).get(0).getMessage().contains("0..7"));
        a.setResetCode(7);
        assertEquals(0, findings(StructuralRules.RESET_RANGE).size());
    }

    @Test
    void duplicateFieldNamesAreReported() {
        field("A", 0, 2);
        Field second = field("A", 2, 2);
        assertEquals(1, findings(StructuralRules.DUPLICATE_NAME).size());
        second.setName("C");
        assertEquals(0, findings(StructuralRules.DUPLICATE_NAME).size());
    }

    @Test
    void duplicateRegisterNamesAndAddressesAreReported() {
        Register other = F.createRegister();
        other.setName("R");
        other.setWidth(8);
        block.getRegisters().add(other);
        assertEquals(1, findings(StructuralRules.DUPLICATE_NAME).size());
        assertEquals(1, findings(StructuralRules.DUPLICATE_ADDRESS).size());
        other.setName("S");
        other.setAddressOffset(1);
        assertEquals(0, findings(StructuralRules.DUPLICATE_NAME).size());
        assertEquals(0, findings(StructuralRules.DUPLICATE_ADDRESS).size());
    }

    @Test
    void duplicateBlockNamesAreReported() {
        Block b2 = F.createBlock();
        b2.setName("B");
        spec.getBlocks().add(b2);
        assertEquals(1, findings(StructuralRules.DUPLICATE_NAME).size());
        b2.setName("B2");
        assertEquals(0, findings(StructuralRules.DUPLICATE_NAME).size());
    }

    @Test
    void registerWidthMustBe8Or16Or32() {
        reg.setWidth(12);
        assertEquals(1, findings(StructuralRules.WIDTH).size());
        reg.setWidth(32);
        assertEquals(0, findings(StructuralRules.WIDTH).size());
    }

    @Test
    void readOnlyTrimIsReported() {
        Field a = field("A", 0, 4);
        a.setRole(FieldRole.TRIM);
        a.setAccess(Access.READ_ONLY);
        assertEquals(1, findings(StructuralRules.TRIM_NOT_WRITABLE).size());
        a.setRole(FieldRole.ENABLE);
        assertEquals(0, findings(StructuralRules.TRIM_NOT_WRITABLE).size());
    }

    @Test
    void demoSpecHasNoStructuralErrors() {
        ChipSpec demo = DemoSpec.load();
        Diagnostic d = SpecChecks.validate(demo);
        assertEquals(Diagnostic.OK, d.getSeverity(), () -> d.getChildren().toString());
    }

    @Test
    void demoSpecUsesEveryScheme() {
        ChipSpec demo = DemoSpec.load();
        java.util.Set<Object> schemes = new java.util.HashSet<>();
        java.util.Set<Object> formats = new java.util.HashSet<>();
        java.util.Set<Object> polarities = new java.util.HashSet<>();
        int fields = 0;
        for (Block b : demo.getBlocks()) {
            for (Register r : b.getRegisters()) {
                for (Field f : r.getFields()) {
                    fields++;
                    if (f.getCoding() != null) {
                        schemes.add(f.getCoding().getScheme());
                        polarities.add(f.getCoding().getPolarity());
                    }
                    if (f.getTarget() != null) {
                        formats.add(f.getTarget().getSignedFormat());
                    }
                }
            }
        }
        assertTrue(fields >= 12 && demo.getBlocks().size() >= 4);
        assertEquals(org.trimwright.model.CodingScheme.VALUES.size(), schemes.size());
        assertEquals(org.trimwright.model.SignedFormat.VALUES.size(), formats.size());
        assertEquals(2, polarities.size());
    }
}
