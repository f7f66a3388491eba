package org.trimwright.ui.internal.views;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.analysis.FieldInputs;
import org.trimwright.analysis.MismatchInputs;
import org.trimwright.engine.mismatch.sizing.SizingRequest;
import org.trimwright.model.Field;

/**
 * Everything the analysis of one field reads, as immutable engine values taken on the UI thread (the background
 * job never touches the live EMF model). Equal keys give equal reports, so the key doubles as the cache key.
 *
 * @param inputs   coding and scale
 * @param mismatch element model and limits, or null when the field has no unit element
 * @param sizing   trim sizing question, or null
 * @param settings trials, seed, threads, gate library
 */
record AnalysisKey(FieldInputs inputs, MismatchInputs mismatch, SizingRequest sizing, AnalysisSettings settings) {

    /** Reads the field; throws {@link org.trimwright.analysis.FieldMappingException} when it cannot be mapped. */
    static AnalysisKey of(Field field, AnalysisSettings settings) {
        return new AnalysisKey(FieldInputs.of(field), MismatchInputs.of(field), sizingOrNull(field), settings);
    }

    private static SizingRequest sizingOrNull(Field field) {
        try {
            return FieldAnalyzer.sizing(field);
        } catch (IllegalArgumentException e) {
            return null;
        }
    }
}
