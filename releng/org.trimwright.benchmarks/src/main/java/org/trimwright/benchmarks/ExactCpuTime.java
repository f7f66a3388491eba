package org.trimwright.benchmarks;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.exact.ExactDnlYield;
import org.trimwright.engine.exact.ExactMonotonicity;
import org.trimwright.engine.exact.ExactYields;

/**
 * Companion to {@link ExactBenchmark} for a shared (loaded) machine, not a JMH benchmark: the exact methods run in
 * the calling thread, so their thread CPU time is the time they would take on an idle core. For 16-bit fields and
 * every split M = 0..16 (0 = binary) and each unit sigma given, prints the mean and the fastest of {@code repeats}
 * calls in thread CPU time, the fastest in wall time (after warm-up) and the numerical error reported, for
 * P(non-monotonic) and the nominal DNL yield at |DNL| &lt; 0.5 LSB. Usage:
 * {@code java -cp benchmarks.jar org.trimwright.benchmarks.ExactCpuTime [REPEATS] [SIGMA ...]}.
 */
public final class ExactCpuTime {

    private ExactCpuTime() {
    }

    public static void main(String[] args) {
        int repeats = args.length > 0 ? Integer.parseInt(args[0]) : 10;
        double[] sigmas = {0.0005, 0.001, 0.002, 0.01, 0.03};
        if (args.length > 1) {
            sigmas = new double[args.length - 1];
            for (int i = 1; i < args.length; i++) {
                sigmas[i - 1] = Double.parseDouble(args[i]);
            }
        }
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (int warm = 0; warm < 3; warm++) {
            for (int m = 0; m <= 16; m++) {
                ExactYields.monotonicity(field(m), 0.002);
                ExactYields.dnlYieldNominal(field(m), 0.002, ExactBenchmark.DNL_LIMIT);
            }
        }
        System.out.println("| M | unit sigma | P(non-monotonic) | error | CPU ms mean / min | wall ms min | DNL yield"
                + " | error | CPU ms mean / min | wall ms min |");
        System.out.println("|---|---|---|---|---|---|---|---|---|---|");
        double worstCpu = 0;
        double worstError = 0;
        for (int m = 0; m <= 16; m++) {
            FieldCoding f = field(m);
            for (double s : sigmas) {
                double[] mono = {Double.MAX_VALUE, Double.MAX_VALUE};
                double[] dnl = {Double.MAX_VALUE, Double.MAX_VALUE};
                double monoSum = 0;
                double dnlSum = 0;
                ExactMonotonicity em = null;
                ExactDnlYield ed = null;
                for (int r = 0; r < repeats; r++) {
                    long c0 = mx.getCurrentThreadCpuTime();
                    long w0 = System.nanoTime();
                    em = ExactYields.monotonicity(f, s);
                    long c1 = mx.getCurrentThreadCpuTime();
                    long w1 = System.nanoTime();
                    ed = ExactYields.dnlYieldNominal(f, s, ExactBenchmark.DNL_LIMIT);
                    long c2 = mx.getCurrentThreadCpuTime();
                    long w2 = System.nanoTime();
                    monoSum += (c1 - c0) * 1e-6;
                    dnlSum += (c2 - c1) * 1e-6;
                    mono[0] = Math.min(mono[0], (c1 - c0) * 1e-6);
                    mono[1] = Math.min(mono[1], (w1 - w0) * 1e-6);
                    dnl[0] = Math.min(dnl[0], (c2 - c1) * 1e-6);
                    dnl[1] = Math.min(dnl[1], (w2 - w1) * 1e-6);
                }
                worstCpu = Math.max(worstCpu, Math.max(monoSum, dnlSum) / repeats);
                worstError = Math.max(worstError, Math.max(em.numericalError(), ed.numericalError()));
                String row = "| %d | %s | %.4e | %.1e | %.1f / %.1f | %.1f | %.12f | %.1e | %.1f / %.1f | %.1f |%n";
                System.out.printf(row,
                        m, s, em.probabilityNonMonotonic(), em.numericalError(), monoSum / repeats, mono[0], mono[1],
                        ed.yield(), ed.numericalError(), dnlSum / repeats, dnl[0], dnl[1]);
            }
        }
        System.out.printf("worst mean CPU time per call %.1f ms, worst reported numerical error %.2e%n", worstCpu,
                worstError);
    }

    private static FieldCoding field(int m) {
        return m == 0 ? FieldCoding.of(16, CodingScheme.BINARY, 0) : FieldCoding.of(16, CodingScheme.SEGMENTED, m);
    }
}
