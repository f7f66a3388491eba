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

    /**
     * Fields with the same coding, element and limits share the memoised engine results (exact yields, decoder,
     * Monte Carlo, segmentation advice); the figures must equal a fresh engine computation, and what depends on the
     * field's own step (the step table) must stay its own.
     */
    @Test
    void sharedEngineResultsEqualAFreshComputation() {
        FieldCoding c = FieldCoding.of(6, CodingScheme.SEGMENTED, 2);
        ElementModel model = ElementModel.ofUnitSigma(0.03);
        AnalysisSettings s = new AnalysisSettings(3000, 5, 0, 2);
        MismatchInputs mm = new MismatchInputs(model, MismatchInputs.DEFAULT_LIMITS);
        FieldAnalyzer.analyze("a", new FieldInputs("(a)", c, 0, 1e-6, SiUnit.AMPERE), mm, null, s);
        FieldReport b = FieldAnalyzer.analyze("b", new FieldInputs("(b)", c, 1, 2e-6, SiUnit.VOLT), mm, null, s);
        org.trimwright.engine.exact.ElementSigmas sig = org.trimwright.engine.exact.ElementSigmas.forField(c,
                model.unitSigma(), model.switchSigma());
        assertEquals(org.trimwright.engine.exact.ExactYields.monotonicity(sig), b.exactMonotonic().orElseThrow());
        assertEquals(org.trimwright.engine.exact.ExactYields.dnlYieldNominal(sig, mm.limits().maxDnlLsb()),
                b.exactDnl().orElseThrow());
        org.trimwright.engine.design.CodingReport fresh = org.trimwright.engine.design.CodingAnalysis.analyze("b", c,
                1, 2e-6, SiUnit.VOLT, s.gateLibrary());
        assertEquals(fresh.cost(), b.coding().cost());
        assertEquals(fresh.twoLevelCost(), b.coding().twoLevelCost());
        assertEquals(fresh.splitCosts(), b.coding().splitCosts());
        assertEquals(fresh.netlist().gates(), b.coding().netlist().gates());
        assertEquals(1 + 2e-6, b.coding().stepTable().value(1), 1e-15, "b's own step");

        MismatchReport mc = org.trimwright.engine.mismatch.MismatchAnalysis.run(c, model, mm.limits(),
                new org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions(s.trials(), s.seed(), s.threads(),
                        (int) Math.min(FieldAnalyzer.ENVELOPE_TRIALS, s.trials())));
        MismatchReport got = b.mismatch().orElseThrow();
        for (String part : new String[] {"monotonic", "dnl", "inl", "transitions", "perCode", "histograms", "run"}) {
            assertSameFigures(part, component(mc, part), component(got, part));
        }
    }

    private static Object component(Record r, String name) {
        try {
            return r.getClass().getMethod(name).invoke(r);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(name, e);
        }
    }

    /** Deep equality of records, lists and arrays (a record of arrays compares them by identity). */
    private static void assertSameFigures(String where, Object a, Object b) {
        if (a == null || b == null) {
            assertEquals(a, b, where);
        } else if (a.getClass().isArray()) {
            assertTrue(java.util.Arrays.deepEquals(new Object[] {a}, new Object[] {b}), where);
        } else if (a instanceof Record ra) {
            for (java.lang.reflect.RecordComponent c : a.getClass().getRecordComponents()) {
                if (c.getName().equals("seconds") || c.getName().equals("trialsPerSecond")) {
                    continue; // the run's own speed, not a figure of the field
                }
                assertSameFigures(where + "." + c.getName(), component(ra, c.getName()),
                        component((Record) b, c.getName()));
            }
        } else if (a instanceof java.util.List<?> la) {
            java.util.List<?> lb = (java.util.List<?>) b;
            assertEquals(la.size(), lb.size(), where);
            for (int i = 0; i < la.size(); i++) {
                assertSameFigures(where + "[" + i + "]", la.get(i), lb.get(i));
            }
        } else if (a.getClass().getName().startsWith("java.")) {
            assertEquals(a, b, where);
        } else {
            assertEquals(String.valueOf(a), String.valueOf(b), where);
        }
    }
}
