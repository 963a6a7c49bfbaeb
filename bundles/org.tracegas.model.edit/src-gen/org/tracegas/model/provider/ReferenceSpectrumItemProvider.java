/**
 */
package org.tracegas.model.provider;


import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.ResourceLocator;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IEditingDomainItemProvider;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.IStructuredItemContentProvider;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemProviderAdapter;
import org.eclipse.emf.edit.provider.ViewerNotification;

import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.WorkspacePackage;

/**
 * This is the item provider adapter for a {@link org.tracegas.model.ReferenceSpectrum} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ReferenceSpectrumItemProvider 
	extends ItemProviderAdapter
	implements
		IEditingDomainItemProvider,
		IStructuredItemContentProvider,
		ITreeItemContentProvider,
		IItemLabelProvider,
		IItemPropertySource {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ReferenceSpectrumItemProvider(AdapterFactory adapterFactory) {
		super(adapterFactory);
	}

	/**
	 * This returns the property descriptors for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public List<IItemPropertyDescriptor> getPropertyDescriptors(Object object) {
		if (itemPropertyDescriptors == null) {
			super.getPropertyDescriptors(object);

			addCompoundPropertyDescriptor(object);
			addCasNumberPropertyDescriptor(object);
			addPpmMetresPropertyDescriptor(object);
			addTemperaturePropertyDescriptor(object);
			addPressurePropertyDescriptor(object);
			addResolutionPropertyDescriptor(object);
			addApodizationPropertyDescriptor(object);
			addOriginPropertyDescriptor(object);
			addOriginTextPropertyDescriptor(object);
			addContentSha256PropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Compound feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCompoundPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_compound_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_compound_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__COMPOUND,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Cas Number feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCasNumberPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_casNumber_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_casNumber_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__CAS_NUMBER,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Ppm Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPpmMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_ppmMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_ppmMetres_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__PPM_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Temperature feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTemperaturePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_temperature_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_temperature_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__TEMPERATURE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Pressure feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPressurePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_pressure_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_pressure_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__PRESSURE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Resolution feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addResolutionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_resolution_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_resolution_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__RESOLUTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Apodization feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addApodizationPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_apodization_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_apodization_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__APODIZATION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Origin feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOriginPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_origin_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_origin_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__ORIGIN,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Origin Text feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOriginTextPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_originText_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_originText_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__ORIGIN_TEXT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Content Sha256 feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addContentSha256PropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ReferenceSpectrum_contentSha256_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ReferenceSpectrum_contentSha256_feature", "_UI_ReferenceSpectrum_type"),
				 WorkspacePackage.Literals.REFERENCE_SPECTRUM__CONTENT_SHA256,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns ReferenceSpectrum.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/ReferenceSpectrum"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((ReferenceSpectrum)object).getCompound();
		return label == null || label.length() == 0 ?
			getString("_UI_ReferenceSpectrum_type") :
			getString("_UI_ReferenceSpectrum_type") + " " + label;
	}


	/**
	 * This handles model notifications by calling {@link #updateChildren} to update any cached
	 * children and by creating a viewer notification, which it passes to {@link #fireNotifyChanged}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void notifyChanged(Notification notification) {
		updateChildren(notification);

		switch (notification.getFeatureID(ReferenceSpectrum.class)) {
			case WorkspacePackage.REFERENCE_SPECTRUM__COMPOUND:
			case WorkspacePackage.REFERENCE_SPECTRUM__CAS_NUMBER:
			case WorkspacePackage.REFERENCE_SPECTRUM__PPM_METRES:
			case WorkspacePackage.REFERENCE_SPECTRUM__TEMPERATURE:
			case WorkspacePackage.REFERENCE_SPECTRUM__PRESSURE:
			case WorkspacePackage.REFERENCE_SPECTRUM__RESOLUTION:
			case WorkspacePackage.REFERENCE_SPECTRUM__APODIZATION:
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN:
			case WorkspacePackage.REFERENCE_SPECTRUM__ORIGIN_TEXT:
			case WorkspacePackage.REFERENCE_SPECTRUM__CONTENT_SHA256:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
		}
		super.notifyChanged(notification);
	}

	/**
	 * This adds {@link org.eclipse.emf.edit.command.CommandParameter}s describing the children
	 * that can be created under this object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected void collectNewChildDescriptors(Collection<Object> newChildDescriptors, Object object) {
		super.collectNewChildDescriptors(newChildDescriptors, object);
	}

	/**
	 * Return the resource locator for this item provider's resources.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResourceLocator getResourceLocator() {
		return WorkspaceEditPlugin.INSTANCE;
	}

}
