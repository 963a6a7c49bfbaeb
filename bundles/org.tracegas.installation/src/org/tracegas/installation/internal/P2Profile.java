package org.tracegas.installation.internal;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;

import org.eclipse.equinox.p2.core.IProvisioningAgent;
import org.eclipse.equinox.p2.engine.IProfile;
import org.eclipse.equinox.p2.engine.IProfileRegistry;
import org.eclipse.equinox.p2.engine.query.IUProfilePropertyQuery;
import org.eclipse.equinox.p2.metadata.IInstallableUnit;
import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
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

    /**
     * @param productVersion the version of the product unit
     * @param addons         the other root units: features installed on top of the product
     */
    public record Roots(String productVersion, List<Addon> addons) {
    }

    private P2Profile() {
    }

    /** @return empty when the runtime has no current p2 agent or profile, or the profile lacks the product */
    public static Optional<Roots> self(BundleContext context, String productId) {
        Collection<ServiceReference<IProvisioningAgent>> refs;
        try {
            refs = context.getServiceReferences(IProvisioningAgent.class,
                    "(" + IProvisioningAgent.SERVICE_CURRENT + "=true)");
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException("the filter for the current p2 agent is malformed", e);
        }
        if (refs.isEmpty()) {
            return Optional.empty();
        }
        ServiceReference<IProvisioningAgent> ref = refs.iterator().next();
        IProvisioningAgent agent = context.getService(ref);
        try {
            IProfileRegistry registry = agent == null ? null : agent.getService(IProfileRegistry.class);
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
        } finally {
            context.ungetService(ref);
        }
    }
}
