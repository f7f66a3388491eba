package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.sizing.SizingRequest;

/** The entry point produces the documented figures for every scheme, and they serialise to JSON. */
class MismatchAnalysisTest {

    @Test
    void everySchemeAndFormatGivesTheDocumentedKeys() {
        Gson gson = new GsonBuilder().serializeSpecialFloatingPointValues().create();
        for (CodingScheme scheme : CodingScheme.values()) {
            for (SignedFormat format : SignedFormat.values()) {
                FieldCoding coding = new FieldCoding(6, scheme, scheme == CodingScheme.SEGMENTED ? 3 : 0, format,
                        scheme.isSelect(), false);
                boolean full = format == SignedFormat.UNSIGNED || scheme == CodingScheme.SEGMENTED;
                MonteCarloOptions options = new MonteCarloOptions(5000, 1, 0, 50);
                MismatchReport r = full
                        ? MismatchAnalysis.run(coding, ElementModel.ofUnitSigma(0.03), Limits.of(0.5, 1.0), options,
                                m -> 3.0 * m, SizingRequest.ofSigma(0, 1, 3, 0.1, "%"))
                        : MismatchAnalysis.run(coding, ElementModel.ofUnitSigma(0.03), Limits.of(0.5, 1.0), options);
                JsonObject json = JsonParser.parseString(gson.toJson(r)).getAsJsonObject();
                JsonObject mono = json.getAsJsonObject("monotonic");
                assertTrue(mono.has("guaranteed") && mono.has("unionBound"));
                JsonObject mc = mono.getAsJsonObject("monteCarlo");
                for (String key : new String[] {"estimate", "ci95Low", "ci95High", "trials"}) {
                    assertTrue(mc.has(key), key);
                }
                for (String key : new String[] {"sigmaWorst", "worstTransition", "yield"}) {
                    assertTrue(json.getAsJsonObject("dnl").has(key), key);
                }
                for (String def : new String[] {"endpoint", "bestFit", "absolute"}) {
                    JsonObject inl = json.getAsJsonObject("inl").getAsJsonObject(def);
                    for (String key : new String[] {"sigmaWorst", "meanMaxAbs", "yieldHalfLsb"}) {
                        assertTrue(inl.has(key), def + "." + key);
                    }
                }
                if (full) {
                    assertEquals(7, json.getAsJsonObject("segmentation").getAsJsonArray("rows").size());
                    assertTrue(json.getAsJsonObject("sizing").has("bits"));
                }
                boolean unary = scheme == CodingScheme.THERMOMETER || scheme.isSelect();
                assertEquals(unary, r.monotonic().guaranteed(), coding.toString());
                int levels = format == SignedFormat.SIGN_MAGNITUDE ? 63 : 64;
                assertEquals(levels, r.field().levels());
                assertEquals(levels, r.perCode().nominal().length);
                assertEquals(levels, r.perCode().inlSigmaBestFit().length);
                MismatchReport.MonteCarloEstimate est = r.monotonic().monteCarlo();
                assertTrue(est.ci95Low() <= est.estimate() && est.estimate() <= est.ci95High());
                assertNotNull(r.gradients());
            }
        }
    }

    @Test
    void envelopeContainsTheNominalTransferAndWidensWithSigma() {
        FieldCoding coding = FieldCoding.of(6, CodingScheme.SEGMENTED, 3);
        MismatchReport small = MismatchAnalysis.run(coding, ElementModel.ofUnitSigma(0.005), Limits.of(0.5, 1),
                new MonteCarloOptions(1000, 2, 1, 100));
        MismatchReport large = MismatchAnalysis.run(coding, ElementModel.ofUnitSigma(0.05), Limits.of(0.5, 1),
                new MonteCarloOptions(1000, 2, 1, 100));
        double[] lo = small.perCode().inlEndpointMin();
        double[] hi = small.perCode().inlEndpointMax();
        double[] lo2 = large.perCode().inlEndpointMin();
        double[] hi2 = large.perCode().inlEndpointMax();
        for (int k = 1; k < 63; k++) {
            assertTrue(lo[k] <= 0 && hi[k] >= 0 || Math.abs(hi[k] - lo[k]) < 1e-9);
            assertTrue(hi2[k] - lo2[k] > hi[k] - lo[k]);
        }
        assertFalse(small.monotonic().guaranteed());
        assertEquals(1000, small.run().trials());
    }
}
