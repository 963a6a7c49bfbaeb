package org.tracegas.installation.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.equinox.p2.core.IProvisioningAgent;
import org.eclipse.equinox.p2.core.IProvisioningAgentProvider;
import org.eclipse.equinox.p2.core.ProvisionException;
import org.eclipse.equinox.p2.engine.IProfile;
import org.eclipse.equinox.p2.engine.IProfileRegistry;
import org.eclipse.equinox.p2.engine.query.IUProfilePropertyQuery;
import org.eclipse.equinox.p2.metadata.IInstallableUnit;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.ServiceReference;
import org.tracegas.installation.Addon;

/**
 * Reads the running installation's own p2 profile (SELF). Kept apart because p2 is imported optionally:
 * loading this class fails with NoClassDefFoundError where p2 is absent.
 */
public final class P2Profile {

    /** The profile property p2 sets on the units a user asked for (the director's -installIU). */
    private static final String ROOT = "org.eclipse.equinox.p2.type.root";
    private static final String FEATURE_GROUP = ".feature.group";
    /** Where an installation keeps its p2 profile (configuration/config.ini of an installed product). */
    private static final String DATA_AREA = "eclipse.p2.data.area";
    private static final String P2_BUNDLES = "org.eclipse.equinox.p2.";

    /**
     * @param productVersion the version of the product unit
     * @param addons         the other root units: features installed on top of the product
     */
    public record Roots(String productVersion, List<Addon> addons) {
    }

    private P2Profile() {
    }

    /**
     * p2's services are declarative components of bundles that nothing starts in the runner or the workbench
     * (p2's own applications start them): start them by their activation policy, for this run only.
     */
    private static void startP2(BundleContext context) {
        for (Bundle b : context.getBundles()) {
            if (b.getSymbolicName() != null && b.getSymbolicName().startsWith(P2_BUNDLES)
                    && b.getHeaders().get(Constants.FRAGMENT_HOST) == null
                    && (b.getState() & (Bundle.RESOLVED | Bundle.INSTALLED)) != 0) {
                try {
                    b.start(Bundle.START_TRANSIENT | Bundle.START_ACTIVATION_POLICY);
                } catch (BundleException e) {
                    throw new IllegalStateException("p2 bundle " + b.getSymbolicName() + " does not start: "
                            + e.getMessage(), e);
                }
            }
        }
    }

    /** @return empty when the runtime has no p2 data area or profile, or the profile lacks the product */
    public static Optional<Roots> self(BundleContext context, String productId) {
        if (context.getProperty(DATA_AREA) == null) {
            return Optional.empty();
        }
        startP2(context);
        ServiceReference<IProvisioningAgentProvider> ref = context.getServiceReference(IProvisioningAgentProvider.class);
        if (ref == null) {
            return Optional.empty();
        }
        IProvisioningAgent agent = null;
        try {
            // no location: the agent of the running installation's own p2 data area
            agent = context.getService(ref).createAgent(null);
            IProfileRegistry registry = agent.getService(IProfileRegistry.class);
            IProfile profile = registry == null ? null : registry.getProfile(IProfileRegistry.SELF);
            if (profile == null) {
                return Optional.empty();
            }
            String productVersion = null;
            List<Addon> addons = new ArrayList<>();
            for (IInstallableUnit unit : profile.query(new IUProfilePropertyQuery(ROOT, Boolean.TRUE.toString()),
                    null)) {
                String id = unit.getId();
                if (id.equals(productId)) {
                    productVersion = unit.getVersion().toString();
                } else {
                    addons.add(new Addon(id.endsWith(FEATURE_GROUP)
                            ? id.substring(0, id.length() - FEATURE_GROUP.length()) : id, unit.getVersion().toString()));
                }
            }
            addons.sort((a, b) -> a.id().compareTo(b.id()));
            return productVersion == null ? Optional.empty() : Optional.of(new Roots(productVersion, addons));
        } catch (ProvisionException e) {
            throw new IllegalStateException("the installation's p2 data area cannot be read: " + e.getMessage(), e);
        } finally {
            if (agent != null) {
                agent.stop();
            }
            context.ungetService(ref);
        }
    }
}
