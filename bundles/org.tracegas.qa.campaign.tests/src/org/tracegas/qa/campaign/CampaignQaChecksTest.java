package org.tracegas.qa.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.RegistryFactory;
import org.junit.jupiter.api.Test;
import org.tracegas.importer.StandaloneExtensions;
import org.tracegas.qa.checks.QaCheckRegistry;

/** The built-in QA checks come through the extension point, as any bundle's would. */
class CampaignQaChecksTest {

    @Test
    void theBuiltInChecksAreContributedThroughTheExtensionPoint() throws Exception {
        IExtensionRegistry running = RegistryFactory.getRegistry();
        IExtensionRegistry extensions = running != null ? running
                : StandaloneExtensions.fromSourceTree(getClass().getClassLoader(), "org.tracegas.qa",
                        "org.tracegas.qa.campaign");
        QaCheckRegistry contributed = QaCheckRegistry.fromExtensions(extensions);
        assertEquals(CampaignQaChecks.BUILT_IN, CampaignQaChecks.builtIn().names());
        assertTrue(contributed.names().containsAll(CampaignQaChecks.BUILT_IN), contributed.names().toString());
        for (String name : CampaignQaChecks.BUILT_IN) {
            assertEquals(CampaignQaChecks.builtIn().find(name).orElseThrow().getClass(),
                    contributed.find(name).orElseThrow().getClass(), name);
        }
    }
}
