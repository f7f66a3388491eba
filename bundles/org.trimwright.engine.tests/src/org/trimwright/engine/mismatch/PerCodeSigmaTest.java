package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.montecarlo.AllCodesEvaluator;

/** First-order per-code INL sigma against sample standard deviations of the all-codes walk. */
class PerCodeSigmaTest {

    @Test
    void perCodeInlSigmaMatchesSampledSpreadForAllDefinitions() {
        check(FieldCoding.of(7, CodingScheme.SEGMENTED, 3));
        check(FieldCoding.of(6, CodingScheme.BINARY, 0));
    }

    @Test
    void signMagnitudeBestFitSigmaUsesTheLineThroughTheOrigin() {
        check(new FieldCoding(7, CodingScheme.SEGMENTED, 3, SignedFormat.SIGN_MAGNITUDE, false, false));
    }

    private static void check(FieldCoding coding) {
        double su = 0.005;
        ElementArray array = ElementArray.of(coding, ElementModel.ofUnitSigma(su));
        PerCodeSigma analytic = PerCodeSigma.of(array);
        AllCodesEvaluator codes = new AllCodesEvaluator(array);
        Draws d = new Draws(array, 5);
        int trials = 20_000;
        int levels = codes.levels();
        double[][] sum2 = new double[3][levels];
        for (int t = 0; t < trials; t++) {
            d.next();
            double[][] inl = codes.inl(codes.transfer(d.unary, d.binary));
            for (int k = 0; k < 3; k++) {
                for (int l = 0; l < levels; l++) {
                    sum2[k][l] += inl[k][l] * inl[k][l];
                }
            }
        }
        for (InlDefinition def : InlDefinition.values()) {
            double[] sigma = MismatchAnalysis.toSigned(analytic.inl(def), array, codes, false);
            for (int l = 0; l < levels; l += Math.max(1, levels / 17)) {
                double sampled = Math.sqrt(sum2[def.ordinal()][l] / trials);
                // sample sd of 20000 normal draws: relative standard error 0.5 %; allow 3 % plus a floor
                assertEquals(sigma[l], sampled, 0.03 * sigma[l] + 1e-4 * su, def + " level " + l + " " + coding);
            }
        }
    }
}
