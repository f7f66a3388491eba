package org.trimwright.engine.mismatch.montecarlo;

/** The per-trial maxima recorded by the Monte Carlo run; definitions in {@link TrialMetrics}. */
public enum Metric {
    DNL("dnl"),
    DNL_ENDPOINT("dnlEndpoint"),
    INL_ENDPOINT("inlEndpoint"),
    INL_BEST_FIT("inlBestFit"),
    INL_ABSOLUTE("inlAbsolute");

    private final String key;

    Metric(String key) {
        this.key = key;
    }

    /** JSON key. */
    public String key() {
        return key;
    }
}
