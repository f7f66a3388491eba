package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.ui.internal.prefs.UiPreferences;

/** Preferences survive a store and load and refuse values the analysis cannot use. */
class PreferencesTest {

    @Test
    void storedPreferencesLoadBack() throws Exception {
        UiPreferences p = new UiPreferences(5_000, 42, InlDefinition.BEST_FIT, 3);
        p.store();
        UiPreferences back = UiPreferences.load();
        assertEquals(p, back);
        assertEquals(3, back.settings().maxFanIn());
        UiPreferences.DEFAULTS.store();
        assertEquals(UiPreferences.DEFAULTS, UiPreferences.load());
    }

    @Test
    void gateLibraryIsTwoOrThreeInputs() {
        assertThrows(IllegalArgumentException.class, () -> new UiPreferences(100, 1, InlDefinition.ENDPOINT, 4));
        assertThrows(IllegalArgumentException.class, () -> new UiPreferences(0, 1, InlDefinition.ENDPOINT, 2));
    }
}
