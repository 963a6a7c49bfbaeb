package org.tracegas.audit.internal;

import org.h2.util.JdbcUtils;
import org.h2.util.Utils.ClassFactory;

/**
 * Lets H2 load the audit triggers. H2 loads trigger classes by name with its own class loader; inside an
 * OSGi framework that loader cannot see this bundle, so a class factory answering for this bundle's
 * trigger classes is registered with H2 (once per class loader of this class).
 */
public final class H2TriggerClasses {

    private static boolean registered;

    private H2TriggerClasses() {
    }

    /** Registers the factory; later calls do nothing. */
    public static synchronized void register() {
        if (registered) {
            return;
        }
        JdbcUtils.addClassFactory(new ClassFactory() {
            @Override
            public boolean match(String name) {
                return name.equals(H2AppendOnlyTrigger.class.getName())
                        || name.equals(H2ChainHeadTrigger.class.getName());
            }

            @Override
            public Class<?> loadClass(String name) throws ClassNotFoundException {
                return Class.forName(name, true, H2TriggerClasses.class.getClassLoader());
            }
        });
        registered = true;
    }
}
