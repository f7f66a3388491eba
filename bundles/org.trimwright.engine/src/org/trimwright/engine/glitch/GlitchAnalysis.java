package org.trimwright.engine.glitch;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.IntStream;

import org.trimwright.engine.coding.CodeMap;

/**
 * Computes the glitch exposure of every adjacent step of a field (see {@link GlitchStep} for the definition).
 * <p>Method: exact enumeration of all 2^t - 2 intermediate codes of a step that toggles t bits, the value taken
 * through the code map (the decoder's function; hazards inside the decoder logic are not modelled). Codes are
 * ordered by signed step count; the only ties, the two zeros of sign-magnitude, put the negative zero (sign bit
 * set, the larger code) first, so stepping -1, -0, +0, +1 toggles one register bit per step. The work is the
 * sum over steps of 2^t, about n * 2^n for a binary-ordered field, so 16-bit fields are enumerated exactly too.
 */
public final class GlitchAnalysis {

    private GlitchAnalysis() {
    }

    /** All adjacent steps in value order; {@code step} is the value of one LSB in the target unit. */
    public static GlitchReport analyse(CodeMap map, double step) {
        int n = map.coding().codeCount();
        int[] order = IntStream.range(0, n).boxed()
                .sorted(Comparator.comparingInt(map::signedSteps).thenComparingInt(c -> -c))
                .mapToInt(Integer::intValue).toArray();
        List<GlitchStep> steps = new ArrayList<>(n - 1);
        for (int k = 0; k + 1 < n; k++) {
            steps.add(step(map, order[k], order[k + 1], step));
        }
        return new GlitchReport(steps, GlitchAdvice.of(map, steps));
    }

    /** Glitch exposure of the step from {@code from} to {@code to}. */
    public static GlitchStep step(CodeMap map, int from, int to, double step) {
        int toggled = from ^ to;
        int lo = Math.min(map.signedSteps(from), map.signedSteps(to));
        int hi = Math.max(map.signedSteps(from), map.signedSteps(to));
        int worst = 0;
        int worstCode = from;
        // enumerate non-empty proper subsets S of the toggled bits
        for (int s = (toggled - 1) & toggled; s != 0; s = (s - 1) & toggled) {
            int code = from ^ s;
            int v = map.signedSteps(code);
            int e = Math.max(v - hi, lo - v);
            if (e > worst) {
                worst = e;
                worstCode = code;
            }
        }
        return new GlitchStep(from, to, toggled, worstCode, worst, worst * Math.abs(step));
    }
}
