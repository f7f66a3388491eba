package org.trimwright.engine.testing;

import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClass;

import java.util.ArrayList;
import java.util.List;

import net.jqwik.engine.JqwikTestEngine;
import org.junit.platform.engine.TestExecutionResult;
import org.junit.platform.launcher.Launcher;
import org.junit.platform.launcher.LauncherDiscoveryRequest;
import org.junit.platform.launcher.TestExecutionListener;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.core.LauncherConfig;
import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
import org.junit.platform.launcher.core.LauncherFactory;

/**
 * Runs jqwik property classes from a Jupiter test.
 * <p>
 * tycho-surefire's JUnit 5 provider brings its own copy of the JUnit Platform, so a jqwik engine from the
 * target platform is refused there ("JqwikTestEngine not a subtype"). This runner starts a launcher from
 * the target's own platform bundles with jqwik as its only engine, and fails when any property fails or
 * when no property ran at all.
 */
public final class PropertyRunner {

    private PropertyRunner() {
    }

    /** Runs every {@code @Property} of the given classes; throws AssertionError listing failures. */
    public static void assertAllHold(Class<?>... propertyClasses) {
        LauncherConfig config = LauncherConfig.builder()
                .enableTestEngineAutoRegistration(false)
                .enableTestExecutionListenerAutoRegistration(false)
                .enableLauncherSessionListenerAutoRegistration(false)
                .enableLauncherDiscoveryListenerAutoRegistration(false)
                .enablePostDiscoveryFilterAutoRegistration(false)
                .addTestEngines(new JqwikTestEngine())
                .build();
        Thread thread = Thread.currentThread();
        ClassLoader previous = thread.getContextClassLoader();
        thread.setContextClassLoader(PropertyRunner.class.getClassLoader());
        try {
            run(LauncherFactory.create(config), propertyClasses);
        } finally {
            thread.setContextClassLoader(previous);
        }
    }

    private static void run(Launcher launcher, Class<?>... propertyClasses) {
        LauncherDiscoveryRequestBuilder request = LauncherDiscoveryRequestBuilder.request();
        for (Class<?> c : propertyClasses) {
            request.selectors(selectClass(c));
        }
        LauncherDiscoveryRequest built = request.build();
        Collector collector = new Collector();
        launcher.execute(built, collector);
        if (collector.ran == 0) {
            throw new AssertionError("no property ran in " + List.of(propertyClasses));
        }
        if (!collector.failures.isEmpty()) {
            throw new AssertionError(collector.failures.size() + " of " + collector.ran
                    + " properties failed:\n" + String.join("\n", collector.failures));
        }
    }

    private static final class Collector implements TestExecutionListener {
        private final List<String> failures = new ArrayList<>();
        private int ran;

        @Override
        public void executionFinished(TestIdentifier id, TestExecutionResult result) {
            if (!id.isTest()) {
                return;
            }
            ran++;
            if (result.getStatus() != TestExecutionResult.Status.SUCCESSFUL) {
                String why = result.getThrowable().map(Throwable::toString).orElse(result.getStatus().name());
                failures.add(id.getDisplayName() + ": " + why);
            }
        }
    }
}
