package org.trimwright.engine.mismatch.montecarlo;

/**
 * The figures of one Monte Carlo trial (one draw of all elements), each a maximum over the field's codes:
 * <ul>
 * <li>{@code nonMonotonic}: some step between adjacent levels is negative;</li>
 * <li>{@code maxDnl}: max |step - 1| in nominal LSB (absolute DNL);</li>
 * <li>{@code maxDnlEndpoint}: max |step / g - 1| with g the endpoint LSB (V(top) - V(bottom)) / (levels - 1);</li>
 * <li>{@code inlEndpoint}: max |INL| against the line through the first and last level, in endpoint LSB;</li>
 * <li>{@code inlBestFit}: max |INL| against the least-squares line over all levels, in its fitted LSB;</li>
 * <li>{@code inlAbsolute}: max |V - ideal| with nominal LSB and nominal zero.</li>
 * </ul>
 * A mutable holder reused per trial.
 */
public final class TrialMetrics {
    public boolean nonMonotonic;
    public double maxDnl;
    public double maxDnlEndpoint;
    public double inlEndpoint;
    public double inlBestFit;
    public double inlAbsolute;

    /** The value of {@code metric}. */
    public double get(Metric metric) {
        switch (metric) {
            case DNL:
                return maxDnl;
            case DNL_ENDPOINT:
                return maxDnlEndpoint;
            case INL_ENDPOINT:
                return inlEndpoint;
            case INL_BEST_FIT:
                return inlBestFit;
            case INL_ABSOLUTE:
                return inlAbsolute;
            default:
                throw new IllegalStateException(metric.name());
        }
    }
}
