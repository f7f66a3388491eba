package org.trimwright.engine.glitch;

import java.util.List;

/**
 * Glitch exposure of a whole field: every adjacent step in value order, the worst one, and advice.
 *
 * @param steps  adjacent steps in value order (2^n - 1 of them)
 * @param advice remedies with their cost (empty when no step can glitch)
 */
public record GlitchReport(List<GlitchStep> steps, List<GlitchAdvice> advice) {

    public GlitchReport {
        steps = List.copyOf(steps);
        advice = List.copyOf(advice);
    }

    /** The step with the largest excursion (the first one in value order among equals). */
    public GlitchStep worst() {
        GlitchStep w = steps.get(0);
        for (GlitchStep s : steps) {
            if (s.excursionLsb() > w.excursionLsb()) {
                w = s;
            }
        }
        return w;
    }

    /** Largest excursion of any step, in LSB. */
    public int worstExcursionLsb() {
        return worst().excursionLsb();
    }

    /** Number of steps whose excursion is above 0. */
    public int glitchingSteps() {
        return (int) steps.stream().filter(s -> s.excursionLsb() > 0).count();
    }
}
