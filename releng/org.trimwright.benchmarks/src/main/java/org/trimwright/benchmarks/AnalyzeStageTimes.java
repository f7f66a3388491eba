package org.trimwright.benchmarks;

import java.lang.management.ManagementFactory;
import java.util.List;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.design.CodingAnalysis;
import org.trimwright.engine.design.CodingReport;
import org.trimwright.engine.exact.ElementSigmas;
import org.trimwright.engine.exact.ExactYields;
import org.trimwright.engine.logic.DecoderCost;
import org.trimwright.engine.logic.GateLibrary;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.MismatchAnalysis;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;
import org.trimwright.engine.mismatch.sizing.SegmentationAdvisor;
import org.trimwright.engine.units.SiUnit;

/**
 * Not a JMH benchmark: wall and process CPU time of the engine stages that {@code ./trimwright analyze --bits 12
 * --coding segmented --unary-bits 6 --at-zero 0A --step 1uA --unit-sigma 1 --trials 1000000} runs, in the order the
 * analysis bundle's FieldAnalyzer runs them (as of main 91edf76: coding analysis, the field's statistics with
 * 1e6 trials, segmentation advice with 20 000 trials per split, exact monotonicity and DNL yield), to see where the
 * command's time goes. Round 0 includes JIT warm-up, as in one command run. DNL and INL limits 0.5 LSB (the
 * command's defaults may differ; they do not change the work done). Usage:
 * {@code java -cp benchmarks.jar org.trimwright.benchmarks.AnalyzeStageTimes [ROUNDS]}.
 */
public final class AnalyzeStageTimes {

    /** Trials per split of the segmentation advice (FieldAnalyzer.ADVICE_TRIALS at main 91edf76). */
    static final long ADVICE_TRIALS = 20_000;

    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
    private static long cpu0;
    private static long wall0;

    private AnalyzeStageTimes() {
    }

    public static void main(String[] args) {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 3;
        FieldCoding c = FieldCoding.of(12, CodingScheme.SEGMENTED, 6);
        ElementModel model = ElementModel.ofUnitSigma(0.01);
        Limits limits = Limits.of(0.5, 0.5);
        MonteCarloOptions options = new MonteCarloOptions(MonteCarloRunBenchmark.TRIALS, 1, 0, 200);
        System.out.printf("load average %s%n", loadAverage());
        for (int r = 0; r < rounds; r++) {
            System.out.println("round " + r);
            start();
            CodingReport cr = CodingAnalysis.analyze("f", c, 0, 1e-6, SiUnit.AMPERE, GateLibrary.TWO_INPUT);
            cr.verilog();
            cr.gateVerilog();
            stop("coding analysis + Verilog text");
            start();
            MonteCarloRun.run(ElementArray.of(c, model), options);
            stop("MonteCarloRun.run, 1e6 trials, alone");
            start();
            MismatchAnalysis.run(c, model, limits, options);
            stop("MismatchAnalysis.run (its own 1e6 trials)");
            List<DecoderCost> splits = cr.splitCosts();
            start();
            SegmentationAdvisor.advise(c.bits(), c.signedFormat(), model, limits, options.withTrials(ADVICE_TRIALS),
                    m -> splits.get(m).nand2Equivalent(), SegmentationAdvisor.DEFAULT_SWITCH_NAND2_EQ);
            stop("segmentation advice, 13 splits");
            start();
            ElementSigmas s = ElementSigmas.forField(c, 0.01, 0.0);
            ExactYields.monotonicity(s);
            ExactYields.dnlYieldNominal(s, 0.5);
            stop("exact monotonicity + DNL yield");
        }
        System.out.printf("load average %s%n", loadAverage());
    }

    private static void start() {
        cpu0 = OS.getProcessCpuTime();
        wall0 = System.nanoTime();
    }

    private static void stop(String what) {
        System.out.printf("  %-44s wall %6.3f s, process CPU %6.3f s%n", what, (System.nanoTime() - wall0) * 1e-9,
                (OS.getProcessCpuTime() - cpu0) * 1e-9);
    }

    private static String loadAverage() {
        return String.format("%.2f", OS.getSystemLoadAverage());
    }
}
