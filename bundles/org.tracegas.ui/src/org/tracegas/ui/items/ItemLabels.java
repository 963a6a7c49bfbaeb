package org.tracegas.ui.items;

import java.net.URL;
import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.jface.resource.ImageDescriptor;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.swt.graphics.Image;

/**
 * An element's text and icon as its {@link IItemLabelProvider} gives them. The item providers name their icons
 * by URL (the edit bundle's icons folder); each is loaded once and freed with this label provider. An element
 * without a label provider shows as its {@code toString()}, without an icon.
 */
public class ItemLabels extends LabelProvider {

    private final AdapterFactory adapters;
    /**
     * The icons loaded, one per model class, by the URL the item providers name (as text: a URL's own equality
     * may look its host up).
     */
    private final Map<String, Image> images = new HashMap<>();

    public ItemLabels(AdapterFactory adapters) {
        if (adapters == null) {
            throw new IllegalArgumentException("adapters must not be null");
        }
        this.adapters = adapters;
    }

    @Override
    public String getText(Object element) {
        IItemLabelProvider provider = provider(element);
        return provider == null ? String.valueOf(element) : provider.getText(element);
    }

    @Override
    public Image getImage(Object element) {
        IItemLabelProvider provider = provider(element);
        // an overlaid icon (a ComposedImage, for objects of another resource) does not occur in the workspace
        return provider != null && provider.getImage(element) instanceof URL url
                ? images.computeIfAbsent(url.toExternalForm(), u -> ImageDescriptor.createFromURL(url).createImage())
                : null;
    }

    @Override
    public void dispose() {
        images.values().forEach(Image::dispose);
        images.clear();
        super.dispose();
    }

    private IItemLabelProvider provider(Object element) {
        return element == null ? null : (IItemLabelProvider) adapters.adapt(element, IItemLabelProvider.class);
    }
}
