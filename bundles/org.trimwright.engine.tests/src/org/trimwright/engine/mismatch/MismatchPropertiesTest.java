package org.trimwright.engine.mismatch;

import org.junit.jupiter.api.Test;
import org.trimwright.engine.testing.PropertyRunner;

/** Runs the jqwik properties of {@link MismatchProperties} (see PropertyRunner for why). */
class MismatchPropertiesTest {

    @Test
    void mismatchPropertiesHold() {
        PropertyRunner.assertAllHold(MismatchProperties.class);
    }
}
