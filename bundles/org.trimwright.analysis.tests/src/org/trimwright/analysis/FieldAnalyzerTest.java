package org.trimwright.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.MismatchReport;
import org.trimwright.engine.units.SiUnit;
import org.trimwright.model.Field;
import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.ElementPaths;

class FieldAnalyzerTest {

    private static FieldReport inline(FieldCoding c, double sigma, long trials) {
        FieldInputs in = new FieldInputs("(test)", c, 0, 1e-6, SiUnit.AMPERE);
        MismatchInputs mm = new MismatchInputs(ElementModel.ofUnitSigma(sigma), MismatchInputs.DEFAULT_LIMITS);
        return FieldAnalyzer.analyze("t", in, mm, null, new AnalysisSettings(trials, 3, 0, 2));
    }

    /**
     * The exact figure of a sign-magnitude field (taken from its magnitude array) must agree with the field's own
     * Monte Carlo, which samples the whole signed transfer, within a widened 95 % Wilson interval (1.5x: common
     * practice, no source). The event is frequent here (P ~ 0.3), so the interval is tight.
     */
    @Test
    void signMagnitudeExactRiskAgreesWithTheFieldsMonteCarlo() {
        FieldCoding c = new FieldCoding(8, CodingScheme.BINARY, 0, SignedFormat.SIGN_MAGNITUDE, false, false);
        FieldReport r = inline(c, 0.04, 40_000);
        ExactMonotonicity exact = r.exactMonotonic().orElseThrow();
        MismatchReport.MonteCarloEstimate mc = r.mismatch().orElseThrow().monotonic().monteCarlo();
        assertTrue(exact.probabilityNonMonotonic() > 1e-3, "a frequent event: " + exact.probabilityNonMonotonic());
        double half = 1.5 * (mc.ci95High() - mc.ci95Low()) / 2;
        assertEquals(exact.probabilityNonMonotonic(), mc.estimate(), half, "MC " + mc);
        assertTrue(exact.method().contains("magnitude array"), exact.method());
    }

    @Test
    void gradientsLeaveTheExactFiguresOut() {
        FieldCoding c = FieldCoding.of(6, CodingScheme.SEGMENTED, 3);
        FieldInputs in = new FieldInputs("(test)", c, 0, 1, SiUnit.NONE);
        ElementModel withGradient = ElementModel.ofUnitSigma(0.01).withLayout(
                new org.trimwright.engine.mismatch.Gradient(0.01, 0), ElementModel.ofUnitSigma(0).sequence());
        FieldReport r = FieldAnalyzer.analyze("t", in, new MismatchInputs(withGradient, MismatchInputs.DEFAULT_LIMITS),
                null, new AnalysisSettings(2000, 1, 0, 2));
        assertTrue(r.exactMonotonic().isEmpty());
        assertTrue(r.mismatch().isPresent());
    }

    @Test
    void cacheRecomputesOnlyAfterAnEdit() {
        Field f = ElementPaths.findField(DemoSpec.load(), "BIAS/BIAS_RES/RBIAS");
        ReportCache cache = new ReportCache(AnalysisSettings.DEFAULTS.withTrials(2000));
        FieldReport first = cache.get(f);
        assertSame(first, cache.get(f));
        f.getTarget().setStep(f.getTarget().getStep() * 2);
        FieldReport second = cache.get(f);
        assertNotSame(first, second);
        assertEquals(2 * first.inputs().step(), second.inputs().step(), 1e-12);
        assertNotNull(cache.peek(f));
    }
}
