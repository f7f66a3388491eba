package org.trimwright.analysis.diff;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.ReportCache;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.ElementPaths;

class SpecDiffTest {

    private static final AnalysisSettings SETTINGS = AnalysisSettings.DEFAULTS.withTrials(2000);

    private static List<FieldDiff> diff(ChipSpec a, ChipSpec b) {
        return SpecDiff.compare(a, b, new ReportCache(SETTINGS), new ReportCache(SETTINGS));
    }

    private static Field field(ChipSpec s, String path) {
        return ElementPaths.findField(s, path);
    }

    @Test
    void identicalSpecsHaveNoDifferences() {
        assertEquals(List.of(), diff(DemoSpec.load(), DemoSpec.load()));
    }

    @Test
    void everyKindOfChangeIsReportedWithItsConsequence() {
        ChipSpec old = DemoSpec.load();
        ChipSpec neu = EcoreUtil.copy(old);
        Field added = TrimwrightFactory.eINSTANCE.createField();
        added.setName("SPARE");
        added.setBitOffset(5);
        ((Register) field(neu, "REF/REF_TRIM1/REF_EN").eContainer()).getFields().add(added);
        EcoreUtil.delete(field(neu, "ADC/ADC_REF/REF_SEL"));
        field(neu, "OSC/OSC_CFG/DIV_SEL").setBitOffset(2);
        ((Register) field(neu, "BIAS/BIAS_RES/RBIAS").eContainer()).setAddressOffset(3);
        Field coarse = field(neu, "OSC/OSC_TRIM/FREQ_COARSE");
        coarse.getCoding().setScheme(CodingScheme.SEGMENTED);
        coarse.getCoding().setUnaryBits(4);
        field(neu, "ADC/ADC_CAL/CAL_OFFSET").getTarget().setStep(0.0006);
        field(neu, "BIAS/BIAS_TRIM/IBIAS").getTarget().setSpreadMin(7.5e-6);
        field(neu, "REF/REF_TRIM0/VREF").getElement().setUnitSigmaPercent(2.0);
        field(neu, "OSC/OSC_TRIM/FREQ_FINE").getLimits().setMaxDnlLsb(0.25);

        Map<String, FieldDiff> d = diff(old, neu).stream().collect(Collectors.toMap(FieldDiff::path,
                Function.identity()));
        assertEquals(9, d.size(), d.keySet().toString());
        assertEquals("added", d.get("REF/REF_TRIM1/SPARE").kind());
        assertEquals("removed", d.get("ADC/ADC_REF/REF_SEL").kind());
        assertEquals("moved", d.get("OSC/OSC_CFG/DIV_SEL").kind());
        assertEquals(List.of(new Change("position", "bitOffset", "0", "2")), d.get("OSC/OSC_CFG/DIV_SEL").changes());
        // BIAS base 0x30 + offset 1 -> 3 (hand calculation)
        assertEquals(List.of(new Change("position", "address", "0x31", "0x33")),
                d.get("BIAS/BIAS_RES/RBIAS").changes());

        FieldDiff coding = d.get("OSC/OSC_TRIM/FREQ_COARSE");
        assertEquals("changed", coding.kind());
        assertTrue(coding.changes().contains(new Change("coding", "coding.scheme", "binary", "segmented")));
        assertEquals(List.of(), coding.consequence().changedCodes(), "same value per code, other decoder");
        assertEquals("down", coding.consequence().riskDirection(), "unary MSBs lower P(non-monotonic)");
        assertEquals("up", Consequence.direction(coding.consequence().dnlYieldOld(),
                coding.consequence().dnlYieldNew()));

        FieldDiff step = d.get("ADC/ADC_CAL/CAL_OFFSET");
        assertEquals(List.of(new Change("step", "target.step", "5.0E-4", "6.0E-4")), step.changes());
        // Gray register, offset binary: word 32 is s = 0 and keeps 0 V; its register code is gray(32) = 32 XOR 16 = 48;
        // every other code moves (hand calculation)
        assertEquals("0..47, 49..63", step.consequence().changedCodesText());

        FieldDiff range = d.get("BIAS/BIAS_TRIM/IBIAS");
        assertEquals("range", range.changes().get(0).category());
        assertEquals(List.of(), range.consequence().changedCodes());
        assertEquals("same", range.consequence().riskDirection());

        // 0.5 % -> 2 %: mid-scale step sigma sqrt(63) x 0.02 = 0.16 LSB, P ~ Phi(-6.3) ~ 1e-10 (hand calculation)
        FieldDiff element = d.get("REF/REF_TRIM0/VREF");
        assertEquals(List.of(new Change("element", "element.unitSigmaPercent", "0.5", "2.0")), element.changes());
        assertEquals("up", element.consequence().riskDirection());
        assertTrue(element.consequence().pNonMonotonicNew() > 1e-12);

        FieldDiff limits = d.get("OSC/OSC_TRIM/FREQ_FINE");
        assertEquals(List.of(new Change("limits", "limits.maxDnlLsb", "0.5", "0.25")), limits.changes());
        assertTrue(limits.consequence().dnlYieldNew() <= limits.consequence().dnlYieldOld());
    }

    @Test
    void fieldMovedToAnotherRegisterOfItsBlockIsMovedNotAddedAndRemoved() {
        ChipSpec old = DemoSpec.load();
        ChipSpec neu = EcoreUtil.copy(old);
        Field en = field(neu, "OSC/OSC_CFG/OSC_EN");
        Register trim = (Register) field(neu, "OSC/OSC_TRIM/FREQ_COARSE").eContainer();
        trim.setWidth(32);
        en.setBitOffset(20);
        trim.getFields().add(en);
        List<FieldDiff> d = diff(old, neu);
        FieldDiff moved = d.stream().filter(x -> x.path().equals("OSC/OSC_TRIM/OSC_EN")).findFirst().orElseThrow();
        assertEquals("moved", moved.kind());
        assertEquals("OSC/OSC_CFG/OSC_EN", moved.oldPath());
        assertTrue(d.stream().noneMatch(x -> x.kind().equals("added") || x.kind().equals("removed")), d.toString());
    }
}
