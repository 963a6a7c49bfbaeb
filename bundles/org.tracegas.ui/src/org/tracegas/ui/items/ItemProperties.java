package org.tracegas.ui.items;

import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.ui.views.properties.IPropertyDescriptor;
import org.eclipse.ui.views.properties.IPropertySource2;
import org.eclipse.ui.views.properties.PropertyDescriptor;

/**
 * A model object's properties for the properties view, as its {@link IItemPropertySource} describes them: the
 * feature's name, category, description and value, the value's text as the item providers write it.
 * <p>
 * Read only. The objects shown are the store's audited records: a change to one must be made through the
 * store, which checks the user's rights, keeps the row version, and writes the audit trail's entry (and, for
 * methods and libraries, a new version). A value typed into the properties view would change the object in
 * memory only, unaudited, and the tree would show what the record does not say. So the properties have no cell
 * editors, none can be reset, and a call to set or reset one is refused.
 */
public final class ItemProperties implements IPropertySource2 {

    private final Object object;
    private final List<IItemPropertyDescriptor> descriptors;

    private ItemProperties(Object object, IItemPropertySource source) {
        this.object = object;
        this.descriptors = List.copyOf(source.getPropertyDescriptors(object));
    }

    /** The properties of an object, or null if the adapter factory has no property source for it. */
    public static ItemProperties of(AdapterFactory adapters, Object object) {
        if (adapters == null) {
            throw new IllegalArgumentException("adapters must not be null");
        }
        IItemPropertySource source = object == null ? null
                : (IItemPropertySource) adapters.adapt(object, IItemPropertySource.class);
        return source == null ? null : new ItemProperties(object, source);
    }

    @Override
    public Object getEditableValue() {
        return object;
    }

    @Override
    public IPropertyDescriptor[] getPropertyDescriptors() {
        return descriptors.stream().map(this::shown).toArray(IPropertyDescriptor[]::new);
    }

    /** A descriptor without a cell editor: the properties view shows the value and offers no editing. */
    private IPropertyDescriptor shown(IItemPropertyDescriptor item) {
        PropertyDescriptor d = new PropertyDescriptor(item.getId(object), item.getDisplayName(object));
        d.setCategory(item.getCategory(object));
        d.setDescription(item.getDescription(object));
        d.setFilterFlags(item.getFilterFlags(object));
        d.setLabelProvider(new LabelProvider() {
            @Override
            public String getText(Object value) {
                return item.getLabelProvider(object).getText(value);
            }
        });
        return d;
    }

    /**
     * The feature's value: an object the tree shows too (a reference), or an attribute's plain value, which
     * the item providers hand out wrapped for cell editors; this view has none, and the value's label provider
     * writes the plain value (an enumeration literal, for instance, as plugin.properties words it).
     */
    @Override
    public Object getPropertyValue(Object id) {
        Object value = descriptor(id).getPropertyValue(object);
        return value instanceof IItemPropertySource wrapper ? wrapper.getEditableValue(value) : value;
    }

    @Override
    public boolean isPropertySet(Object id) {
        return descriptor(id).isPropertySet(object);
    }

    @Override
    public boolean isPropertyResettable(Object id) {
        return false;
    }

    @Override
    public void resetPropertyValue(Object id) {
        throw refused(id);
    }

    @Override
    public void setPropertyValue(Object id, Object value) {
        throw refused(id);
    }

    private UnsupportedOperationException refused(Object id) {
        return new UnsupportedOperationException("property '" + descriptor(id).getDisplayName(object)
                + "' is read-only: a stored record changes through the store, which audits the change");
    }

    private IItemPropertyDescriptor descriptor(Object id) {
        for (IItemPropertyDescriptor d : descriptors) {
            if (d.getId(object).equals(id)) {
                return d;
            }
        }
        throw new IllegalArgumentException("no property '" + id + "' for " + object);
    }
}
