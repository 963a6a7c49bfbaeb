package org.tracegas.runner;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtensionRegistry;

/** The runner's commands as bundles contribute them to the extension point {@value #EXTENSION_POINT}. */
public final class CommandContributions {

    /** Extension point of the commands; elements "command" with attributes name and class. */
    public static final String EXTENSION_POINT = "org.tracegas.runner.commands";

    private CommandContributions() {
    }

    /**
     * Every contributed command, in contribution order; a {@link CommandTable} refuses two of one name.
     *
     * @throws IllegalArgumentException naming the contributor and name of an element whose class cannot be
     *                                  created, is not a command, or states another name
     */
    public static List<Command> fromExtensions(IExtensionRegistry extensionRegistry) {
        if (extensionRegistry == null) {
            throw new IllegalArgumentException("extension registry must not be null");
        }
        List<Command> commands = new ArrayList<>();
        for (IConfigurationElement element : extensionRegistry.getConfigurationElementsFor(EXTENSION_POINT)) {
            String name = element.getAttribute("name");
            String where = "command '" + name + "' of " + element.getContributor().getName();
            Object created;
            try {
                created = element.createExecutableExtension("class");
            } catch (CoreException e) {
                throw new IllegalArgumentException(where + ": class " + element.getAttribute("class")
                        + " cannot be created: " + e.getMessage(), e);
            }
            if (!(created instanceof Command command)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is not a " + Command.class.getSimpleName());
            }
            if (!command.name().equals(name)) {
                throw new IllegalArgumentException(where + ": class " + created.getClass().getName()
                        + " is named '" + command.name() + "'");
            }
            commands.add(command);
        }
        return commands;
    }
}
