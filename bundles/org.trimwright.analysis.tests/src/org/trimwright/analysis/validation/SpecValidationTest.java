package org.trimwright.analysis.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.eclipse.emf.common.util.Diagnostic;
import org.junit.jupiter.api.Test;
import org.trimwright.analysis.ReportCache;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.rules.FieldRules;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.SpecChecks;
import org.trimwright.model.spec.SyntheticSpecs;

class SpecValidationTest {

    @Test
    void demoListsExactlyItsDeliberateProblems() {
        List<Finding> d = SpecValidation.validate(DemoSpec.load(), new ReportCache(TestSpecs.SETTINGS));
        Set<String> found = d.stream().map(f -> f.severity().key() + " " + f.path() + " " + f.ruleId())
                .collect(Collectors.toCollection(TreeSet::new));
        // the demo's deliberate problems (see the field descriptions in tmk3-sensor-hub.trimspec): FREQ_COARSE is a
        // 10-bit binary bank at 3 % that must be monotonic at 1e-6 (risk, DNL yield, DNL-widened residual and the
        // binary production search all follow from it); CAL_OFFSET's +-16 mV range misses the +-20 mV spread;
        // VOUT_SEL code 7 = 1.25 V is beyond the 1.2 V safe maximum
        Set<String> expected = new TreeSet<>(List.of(
                "error OSC/OSC_TRIM/FREQ_COARSE linearity.non-monotonic-risk",
                "error OSC/OSC_TRIM/FREQ_COARSE linearity.dnl-yield",
                "error OSC/OSC_TRIM/FREQ_COARSE range.residual-exceeds-accuracy",
                "warning OSC/OSC_TRIM/FREQ_COARSE search.binary-not-monotonic",
                "error ADC/ADC_CAL/CAL_OFFSET range.spread-not-covered",
                "warning LDO/LDO_CFG/VOUT_SEL caution.codes-outside-safe-limits"));
        assertEquals(expected, found);
        Finding risk = d.stream().filter(f -> f.ruleId().equals("linearity.non-monotonic-risk")).findFirst()
                .orElseThrow();
        assertTrue(risk.advice().startsWith("segmented with M="), risk.advice());
    }

    @Test
    void structuralRulesKeepTheirPathsAndGetStableIds() {
        TestSpecs s = new TestSpecs();
        s.trim("A", 4, CodingScheme.BINARY);
        Field b = s.trim("B", 4, CodingScheme.BINARY);
        b.setBitOffset(2);
        List<Finding> d = s.check("structure.overlapping-bits");
        assertEquals(1, d.size());
        assertEquals("B/R/B", d.get(0).path());
        assertEquals("bits [3:2] overlap field 'A' ([3:0]) in register R", d.get(0).message());
    }

    @Test
    void fieldTheEngineCannotMapIsReportedOnce() {
        TestSpecs s = new TestSpecs();
        s.trim("A", 4, CodingScheme.BINARY).getTarget().setUnit("furlong");
        List<Finding> d = s.check();
        assertEquals(1, d.size(), d.toString());
        assertEquals("analysis.field-not-analysable", d.get(0).ruleId());
        assertTrue(d.get(0).message().contains("furlong"));
    }

    @Test
    void modelAloneLetsAnalysisConstraintsPassAndInstallingTheProviderEnablesThem() {
        TestSpecs s = new TestSpecs();
        Field f = s.trim("A", 4, CodingScheme.BINARY);
        f.getTarget().setAccuracy(0.0001);
        try {
            FieldRules.uninstall();
            assertEquals(Diagnostic.OK, SpecChecks.validate(s.spec).getSeverity());
            SpecValidation.install(new ReportCache(TestSpecs.SETTINGS));
            List<Finding> d = SpecValidation.findings(SpecChecks.validate(s.spec));
            assertEquals(List.of("range.step-too-coarse"), d.stream().map(Finding::ruleId).collect(
                    Collectors.toList()));
        } finally {
            FieldRules.uninstall();
        }
    }

    @Test
    void quickReportsClearCleanFieldsWithoutFullAnalysis() {
        ChipSpec spec = SyntheticSpecs.generate(60, 3);
        ReportCache cache = new ReportCache(TestSpecs.SETTINGS);
        assertEquals(List.of(), SpecValidation.validate(spec, cache));
        assertEquals(0, cache.size(), "no full report was needed");
    }
}
