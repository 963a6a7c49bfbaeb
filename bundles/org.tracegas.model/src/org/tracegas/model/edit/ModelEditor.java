package org.tracegas.model.edit;

import java.util.Collection;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceImpl;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.domain.EditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;

/**
 * Edits model objects through commands on one command stack, so each change can be undone and redone.
 * <p>
 * The commands come from the item providers the EMF.Edit registry holds for the model: where the bundle
 * org.tracegas.model.edit is installed (the workbench), the generated ones it registers in its plugin.xml;
 * without it, the reflective ones, which build the same commands from the metamodel. A change that cannot be executed (wrong type, unknown feature, read-only
 * feature) is refused with an exception naming the feature, and the stack is left as it was.
 */
public final class ModelEditor {

    private final AdapterFactoryEditingDomain domain;

    /** An editor with its own resource set and command stack. */
    public ModelEditor() {
        ComposedAdapterFactory adapters = new ComposedAdapterFactory(
                ComposedAdapterFactory.Descriptor.Registry.INSTANCE);
        adapters.addAdapterFactory(new ReflectiveItemProviderAdapterFactory());
        domain = new AdapterFactoryEditingDomain(adapters, new BasicCommandStack(), new ResourceSetImpl());
    }

    /** The editing domain, for viewers that show the same objects. */
    public EditingDomain domain() {
        return domain;
    }

    /**
     * A new in-memory resource of this editor's resource set, to hold a root object. Commands find their
     * editing domain through the resource set, so edited objects must sit in such a resource.
     */
    public Resource createResource(String uri) {
        Resource resource = new ResourceImpl(URI.createURI(uri));
        domain.getResourceSet().getResources().add(resource);
        return resource;
    }

    /** Sets a single-valued feature (or replaces all values of a many-valued one). */
    public void set(EObject owner, EStructuralFeature feature, Object value) {
        execute(SetCommand.create(domain, owner, feature, value), "set", owner, feature);
    }

    /** Appends a value to a many-valued feature. */
    public void add(EObject owner, EStructuralFeature feature, Object value) {
        execute(AddCommand.create(domain, owner, feature, value), "add to", owner, feature);
    }

    /** Appends values to a many-valued feature as one undoable step. */
    public void addAll(EObject owner, EStructuralFeature feature, Collection<?> values) {
        execute(AddCommand.create(domain, owner, feature, values), "add to", owner, feature);
    }

    /** Removes a value from a many-valued feature. */
    public void remove(EObject owner, EStructuralFeature feature, Object value) {
        execute(RemoveCommand.create(domain, owner, feature, value), "remove from", owner, feature);
    }

    public boolean canUndo() {
        return stack().canUndo();
    }

    public boolean canRedo() {
        return stack().canRedo();
    }

    /** @throws IllegalStateException if there is nothing to undo */
    public void undo() {
        if (!stack().canUndo()) {
            throw new IllegalStateException("nothing to undo");
        }
        stack().undo();
    }

    /** @throws IllegalStateException if there is nothing to redo */
    public void redo() {
        if (!stack().canRedo()) {
            throw new IllegalStateException("nothing to redo");
        }
        stack().redo();
    }

    private CommandStack stack() {
        return domain.getCommandStack();
    }

    private void execute(Command command, String action, EObject owner, EStructuralFeature feature) {
        if (owner == null) {
            throw new IllegalArgumentException("owner must not be null");
        }
        if (feature == null) {
            throw new IllegalArgumentException("feature must not be null");
        }
        if (!command.canExecute()) {
            throw new IllegalArgumentException("cannot " + action + " feature '" + feature.getName() + "' of "
                    + owner.eClass().getName() + ": the value does not fit or the feature is not changeable");
        }
        stack().execute(command);
    }
}
