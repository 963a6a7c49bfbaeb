package org.tracegas.audit.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.net.URL;
import java.net.URLClassLoader;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * H2 loads trigger classes with its own class loader. Here H2 sits in a loader that sees only the H2 jar
 * and the audit classes in a child loader (the situation of two OSGi bundles): without the registered
 * class factory H2 cannot find the trigger class; after {@code AuditSchema.install} it can.
 */
class H2TriggerClassesTest {

    @Test
    void h2FindsTheTriggerClassesThroughTheRegisteredFactory() throws Exception {
        URL h2Jar = org.h2.Driver.class.getProtectionDomain().getCodeSource().getLocation();
        URL auditClasses = H2TriggerClasses.class.getProtectionDomain().getCodeSource().getLocation();
        URL scenarioClasses = IsolatedH2Scenario.class.getProtectionDomain().getCodeSource().getLocation();
        try (URLClassLoader h2 = new URLClassLoader(new URL[] {h2Jar}, ClassLoader.getPlatformClassLoader());
                URLClassLoader audit = new URLClassLoader(new URL[] {auditClasses, scenarioClasses}, h2)) {
            Thread current = Thread.currentThread();
            ClassLoader context = current.getContextClassLoader();
            current.setContextClassLoader(ClassLoader.getPlatformClassLoader()); // H2's fallback must not help
            try {
                Object steps = audit.loadClass(IsolatedH2Scenario.class.getName()).getMethod("run").invoke(null);
                assertEquals(List.of("unregistered trigger class not found", "delete refused by the trigger"), steps);
            } finally {
                current.setContextClassLoader(context);
            }
        }
    }
}
