package org.trimwright.ui.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/** The e4 application model names classes and icons of this bundle that exist. */
class ApplicationModelTest {

    private static String xmi() throws Exception {
        try (InputStream in = ApplicationModelTest.class.getResourceAsStream("/Application.e4xmi")) {
            assertNotNull(in, "Application.e4xmi is in the bundle");
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void everyContributionOfOurBundleLoads() throws Exception {
        Matcher m = Pattern.compile("bundleclass://org\\.trimwright\\.ui/([\\w.]+)").matcher(xmi());
        List<String> classes = new ArrayList<>();
        while (m.find()) {
            classes.add(m.group(1));
            assertNotNull(Class.forName(m.group(1)), m.group(1));
        }
        assertTrue(classes.size() >= 12, "parts and handlers found: " + classes);
    }

    @Test
    void everyIconExists() throws Exception {
        Matcher m = Pattern.compile("platform:/plugin/org\\.trimwright\\.ui/(icons/[\\w.]+)").matcher(xmi());
        int n = 0;
        while (m.find()) {
            n++;
            try (InputStream in = getClass().getResourceAsStream("/" + m.group(1))) {
                assertNotNull(in, m.group(1));
            }
        }
        assertTrue(n > 5);
    }

    @Test
    void noCompatibilityLayer() throws Exception {
        assertFalse(xmi().contains("org.eclipse.ui.workbench"), "pure e4: no 3.x workbench contributions");
    }
}
