package org.trimwright.analysis.validation;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One problem found in a spec.
 *
 * @param ruleId   stable identifier of the rule, e.g. {@code range.spread-not-covered} (a contract: see
 *                 docs/check-and-diff.md)
 * @param severity error or warning
 * @param path     BLOCK, BLOCK/REGISTER or BLOCK/REGISTER/FIELD
 * @param message  the problem in trade words with the numbers behind it
 * @param advice   a fix computed by the engine (e.g. the cheapest segmentation that meets the limits), or null
 * @param figures  the numbers behind the message by name, in the units the message states
 */
public record Finding(String ruleId, Severity severity, String path, String message, String advice,
        Map<String, Double> figures) {

    public Finding {
        figures = Collections.unmodifiableMap(new LinkedHashMap<>(figures));
    }

    /** A finding without advice or figures. */
    public static Finding of(String ruleId, Severity severity, String path, String message) {
        return new Finding(ruleId, severity, path, message, null, Map.of());
    }

    /** One line: SEVERITY PATH [rule] message. */
    @Override
    public String toString() {
        return severity.key() + " " + path + " [" + ruleId + "] " + message;
    }
}
