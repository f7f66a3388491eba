package org.trimwright.benchmarks;

import java.lang.management.ManagementFactory;

import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloOptions;
import org.trimwright.engine.mismatch.montecarlo.MonteCarloRun;

/**
 * Companion to {@link MonteCarloRunBenchmark} for a shared (loaded) machine, not a JMH benchmark: runs
 * {@link MonteCarloRun#run} of {@value MonteCarloRunBenchmark#TRIALS} trials of the {@link MonteCarloField} field
 * and divides by the CPU time the process used (all its threads, JIT and GC included) besides the wall time.
 * Trials per CPU-second do not depend on how much of the machine other processes take; trials per CPU-second times
 * the core count is the rate an otherwise idle machine would reach if the threads scale perfectly (an upper figure,
 * stated as such). Usage: {@code java -cp benchmarks.jar org.trimwright.benchmarks.CpuTimeRate [THREADS] [RUNS]}.
 */
public final class CpuTimeRate {

    private CpuTimeRate() {
    }

    public static void main(String[] args) {
        int threads = args.length > 0 ? Integer.parseInt(args[0]) : 1;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 10;
        int trials = MonteCarloRunBenchmark.TRIALS;
        ElementArray array = MonteCarloField.array();
        MonteCarloOptions options = new MonteCarloOptions(trials, MonteCarloField.SEED, threads, 0);
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        for (int i = 0; i < 5; i++) {
            MonteCarloRun.run(array, options);
        }
        double bestCpu = 0;
        double bestWall = 0;
        for (int i = 0; i < runs; i++) {
            long cpu0 = os.getProcessCpuTime();
            long wall0 = System.nanoTime();
            MonteCarloRun.run(array, options);
            double wall = (System.nanoTime() - wall0) * 1e-9;
            double cpu = (os.getProcessCpuTime() - cpu0) * 1e-9;
            bestCpu = Math.max(bestCpu, trials / cpu);
            bestWall = Math.max(bestWall, trials / wall);
            System.out.printf("run %d: %d trials, %d threads: wall %.3f s (%.3g trials/s), process CPU %.3f s"
                    + " (%.3g trials per CPU-second)%n", i + 1, trials, threads, wall, trials / wall, cpu,
                    trials / cpu);
        }
        int cores = Runtime.getRuntime().availableProcessors();
        System.out.printf("best: %.3g trials/s wall, %.3g trials per CPU-second; x %d cores = %.3g trials/s"
                + " (idle machine, perfect scaling; upper figure)%n", bestWall, bestCpu, cores, bestCpu * cores);
    }
}
