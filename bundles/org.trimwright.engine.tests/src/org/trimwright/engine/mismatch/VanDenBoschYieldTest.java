package org.trimwright.engine.mismatch;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.montecarlo.Metric;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloResult;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * The INL-yield sizing rule of Van den Bosch, Steyaert, Sansen (IEEE JSSC 36(3), 2001) for current-steering DACs:
 * sigma(I)/I &lt;= 1 / (2 C sqrt(2^N)), C = inverse normal CDF of 0.5 + yield/2. Formula as recalled from the paper
 * (value from memory). Inverted: yield = 2 Phi(1 / (2 s_u sqrt(2^N))) - 1 = P(|N(0, 2^N s_u^2)| &lt; 0.5), which is
 * the probability that the full-scale code alone is within 0.5 LSB of its nominal value.
 * <p>
 * Finding (checked below by Monte Carlo on unary arrays): compare the unit sigma each definition allows for the same
 * target yield (max|INL| &lt; 0.5 LSB). At design yields (0.9 and above) the formula's sigma is within 20 % of the
 * sigma the ABSOLUTE definition (nominal LSB, nominal zero) allows, slightly above it (optimistic, since the worst
 * code is at least as bad as the full-scale code) and approaching it as the yield rises, while it is 25-45 % below what
 * endpoint INL allows and about half of what best-fit INL allows. The formula therefore corresponds to absolute INL.
 */
class VanDenBoschYieldTest {

    /** Formula as recalled from the paper, inverted for the yield. */
    private static double vanDenBoschYield(double unitSigma, int bits) {
        NormalDistribution z = new NormalDistribution(); // Apache Commons Math 3.6.1
        double c = 1.0 / (2.0 * unitSigma * Math.sqrt(1 << bits));
        return 2 * z.cumulativeProbability(c) - 1;
    }

    private static double unitSigmaFor(double yield, int bits) {
        NormalDistribution z = new NormalDistribution();
        double c = z.inverseCumulativeProbability(0.5 + yield / 2);
        return 1.0 / (2 * c * Math.sqrt(1 << bits));
    }

    @Test
    void vanDenBoschYieldCorrespondsToAbsoluteInlDefinition() {
        double s0 = 0.01;
        for (int bits : new int[] {6, 10}) {
            ElementArray array = ElementArray.of(FieldCoding.of(bits, CodingScheme.THERMOMETER, 0),
                    ElementModel.ofUnitSigma(s0));
            MonteCarloResult mc = MonteCarloRun.run(array, new MonteCarloOptions(200_000, 17, 0, 0));
            double previous = Double.POSITIVE_INFINITY;
            for (double target : new double[] {0.9, 0.99, 0.999}) {
                double formula = unitSigmaFor(target, bits);
                // max|INL| scales with sigma (exactly for absolute, to first order for the others): the sigma at which
                // a definition reaches the target yield is s0 * 0.5 / (its max|INL| quantile at s0)
                double abs = s0 * 0.5 / mc.quantile(Metric.INL_ABSOLUTE, target);
                double ep = s0 * 0.5 / mc.quantile(Metric.INL_ENDPOINT, target);
                double bf = s0 * 0.5 / mc.quantile(Metric.INL_BEST_FIT, target);
                String where = bits + " bits, yield " + target + ": formula/absolute " + formula / abs
                        + ", formula/endpoint " + formula / ep + ", formula/best-fit " + formula / bf;
                assertTrue(formula / abs >= 1.0 && formula / abs < 1.2, where);
                assertTrue(formula / ep < 0.75, where);
                assertTrue(formula / bf < 0.6, where);
                assertTrue(formula / abs < previous, "approaches absolute as the yield rises: " + where);
                previous = formula / abs;
            }
        }
    }

    /** Sanity of the inversion used above. */
    @Test
    void formulaInversionIsConsistent() {
        for (double y : new double[] {0.5, 0.9, 0.999}) {
            assertTrue(Math.abs(vanDenBoschYield(unitSigmaFor(y, 8), 8) - y) < 1e-12);
        }
    }

    @Test
    void vanDenBoschYieldEqualsFullScaleAbsoluteErrorProbability() {
        int bits = 8;
        double su = unitSigmaFor(0.9, bits);
        ElementArray array = ElementArray.of(FieldCoding.of(bits, CodingScheme.THERMOMETER, 0),
                ElementModel.ofUnitSigma(su));
        Draws d = new Draws(array, 3);
        int trials = 100_000;
        long ok = 0;
        int m = array.unaryCount();
        for (int t = 0; t < trials; t++) {
            d.next();
            double total = 0;
            for (double u : d.unary) {
                total += u;
            }
            if (Math.abs(total - m) < 0.5) {
                ok++;
            }
        }
        double[] ci = WilsonInterval.of(ok, trials, 0.999);
        // the array has 2^N - 1 elements, the formula counts 2^N: compare with the exact 2^N - 1 version too
        double formula = vanDenBoschYield(su, bits);
        double exact = 2 * new NormalDistribution().cumulativeProbability(0.5 / (su * Math.sqrt(m))) - 1;
        assertTrue(exact >= ci[0] && exact <= ci[1], "exact " + exact + " vs [" + ci[0] + ", " + ci[1] + "]");
        assertTrue(Math.abs(formula - exact) < 0.002, "2^N vs 2^N - 1 elements");
    }
}
