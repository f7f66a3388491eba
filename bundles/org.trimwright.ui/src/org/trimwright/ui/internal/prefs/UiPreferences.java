package org.trimwright.ui.internal.prefs;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.osgi.service.prefs.BackingStoreException;
import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.engine.mismatch.InlDefinition;

/**
 * The workbench's analysis preferences, stored in the instance scope (the workspace's .metadata) under node
 * {@value #NODE}: default Monte Carlo trials, seed, the INL definition listed first in the figures (and given to
 * new fields' limits), and the decoder gate library (largest fan-in 2 or 3).
 *
 * @param trials        Monte Carlo trials per field
 * @param seed          random seed
 * @param inlDefinition preferred INL definition
 * @param maxFanIn      2 or 3
 */
public record UiPreferences(long trials, long seed, InlDefinition inlDefinition, int maxFanIn) {

    public static final String NODE = "org.trimwright.ui";
    public static final String TRIALS = "trials";
    public static final String SEED = "seed";
    public static final String INL = "inlDefinition";
    public static final String FAN_IN = "maxFanIn";

    public static final UiPreferences DEFAULTS = new UiPreferences(AnalysisSettings.DEFAULT_TRIALS,
            AnalysisSettings.DEFAULT_SEED, InlDefinition.ENDPOINT, 2);

    public UiPreferences {
        new AnalysisSettings(trials, seed, 0, maxFanIn);
        if (inlDefinition == null) {
            throw new IllegalArgumentException("INL definition is required");
        }
    }

    /** The analysis settings (all cores). */
    public AnalysisSettings settings() {
        return new AnalysisSettings(trials, seed, 0, maxFanIn);
    }

    /** Reads the stored preferences; missing or unreadable values take the defaults. */
    public static UiPreferences load() {
        IEclipsePreferences n = InstanceScope.INSTANCE.getNode(NODE);
        long trials = n.getLong(TRIALS, DEFAULTS.trials);
        long seed = n.getLong(SEED, DEFAULTS.seed);
        InlDefinition inl = DEFAULTS.inlDefinition;
        for (InlDefinition d : InlDefinition.values()) {
            if (d.key().equals(n.get(INL, ""))) {
                inl = d;
            }
        }
        int fanIn = n.getInt(FAN_IN, DEFAULTS.maxFanIn);
        try {
            return new UiPreferences(trials, seed, inl, fanIn);
        } catch (IllegalArgumentException e) {
            return DEFAULTS;
        }
    }

    /** Stores these preferences and flushes them to disk. */
    public void store() throws BackingStoreException {
        IEclipsePreferences n = InstanceScope.INSTANCE.getNode(NODE);
        n.putLong(TRIALS, trials);
        n.putLong(SEED, seed);
        n.put(INL, inlDefinition.key());
        n.putInt(FAN_IN, maxFanIn);
        n.flush();
    }
}
