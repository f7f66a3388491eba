package org.trimwright.model.rules;

import java.util.Map;

import org.eclipse.emf.common.util.DiagnosticChain;
import org.trimwright.model.Field;

/**
 * The registry the generated validator's analysis constraints delegate to. A provider found in the validation
 * context under the key {@code FieldRuleProvider.class} wins (one validation run, no global state); otherwise the
 * installed provider is used; with neither, every such constraint passes (the model alone cannot judge them).
 */
public final class FieldRules {

    private static volatile FieldRuleProvider installed;

    private FieldRules() {
    }

    /** Installs the provider used when the validation context names none (replaces any earlier one). */
    public static void install(FieldRuleProvider provider) {
        installed = provider;
    }

    /** Removes the installed provider. */
    public static void uninstall() {
        installed = null;
    }

    /** The installed provider, or null. */
    public static FieldRuleProvider installed() {
        return installed;
    }

    /** Called by the generated validator: checks {@code constraint} of {@code field} with the current provider. */
    public static boolean check(String constraint, Field field, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        FieldRuleProvider p = null;
        if (context != null && context.get(FieldRuleProvider.class) instanceof FieldRuleProvider fromContext) {
            p = fromContext;
        }
        if (p == null) {
            p = installed;
        }
        return p == null || p.check(constraint, field, diagnostics, context);
    }
}
