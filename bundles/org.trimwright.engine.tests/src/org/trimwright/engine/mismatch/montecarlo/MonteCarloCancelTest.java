package org.trimwright.engine.mismatch.montecarlo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicReference;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.mismatch.ElementArray;
import org.trimwright.engine.mismatch.ElementModel;

class MonteCarloCancelTest {

    private static final ElementArray ARRAY = ElementArray.of(FieldCoding.of(12, CodingScheme.SEGMENTED, 6),
            ElementModel.ofUnitSigma(0.01));

    @Test
    void interruptingTheCallerStopsARunningMonteCarlo() throws Exception {
        AtomicReference<Throwable> outcome = new AtomicReference<>();
        Thread t = new Thread(() -> {
            try {
                MonteCarloRun.run(ARRAY, new MonteCarloOptions(8_000_000, 1, 2, 0));
                outcome.set(new AssertionError("finished 8e6 trials instead of stopping"));
            } catch (Throwable e) {
                outcome.set(e);
            }
        });
        t.start();
        Thread.sleep(200);
        t.interrupt();
        t.join(20_000);
        assertFalse(t.isAlive(), "the run must stop soon after the interrupt");
        assertTrue(outcome.get() instanceof CancellationException, String.valueOf(outcome.get()));
    }

    @Test
    void anUninterruptedRunIsUnchangedBySingleOrManyThreads() {
        MonteCarloResult one = MonteCarloRun.run(ARRAY, new MonteCarloOptions(20_000, 5, 1, 0));
        MonteCarloResult two = MonteCarloRun.run(ARRAY, new MonteCarloOptions(20_000, 5, 2, 0));
        assertEquals(one.nonMonotonicCount(), two.nonMonotonicCount());
        assertEquals(one.mean(Metric.INL_BEST_FIT), two.mean(Metric.INL_BEST_FIT));
    }
}
