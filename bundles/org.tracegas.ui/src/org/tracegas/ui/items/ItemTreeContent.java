package org.tracegas.ui.items;

import java.util.Collection;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.jface.viewers.ITreeContentProvider;

/**
 * A tree's content as the item providers give it: an element's children, parent and whether it has children
 * are its {@link ITreeItemContentProvider}'s; the input's children are the tree's top elements. An element
 * the adapter factory has no provider for is a leaf without parent.
 */
public final class ItemTreeContent implements ITreeContentProvider {

    private static final Object[] NONE = new Object[0];

    private final AdapterFactory adapters;

    public ItemTreeContent(AdapterFactory adapters) {
        if (adapters == null) {
            throw new IllegalArgumentException("adapters must not be null");
        }
        this.adapters = adapters;
    }

    @Override
    public Object[] getElements(Object input) {
        return getChildren(input);
    }

    @Override
    public Object[] getChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        if (provider == null) {
            return NONE;
        }
        Collection<?> children = provider.getChildren(element);
        return children.toArray();
    }

    @Override
    public Object getParent(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider == null ? null : provider.getParent(element);
    }

    @Override
    public boolean hasChildren(Object element) {
        ITreeItemContentProvider provider = provider(element);
        return provider != null && provider.hasChildren(element);
    }

    private ITreeItemContentProvider provider(Object element) {
        return element == null ? null
                : (ITreeItemContentProvider) adapters.adapt(element, ITreeItemContentProvider.class);
    }
}
