/**
 */
package org.tracegas.model.provider;


import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ViewerNotification;

import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.WorkspacePackage;

/**
 * This is the item provider adapter for a {@link org.tracegas.model.ProcessedSpectrum} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ProcessedSpectrumItemProvider extends StoredObjectItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ProcessedSpectrumItemProvider(AdapterFactory adapterFactory) {
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

			addMeasurementIdPropertyDescriptor(object);
			addContentPropertyDescriptor(object);
			addSampleEncodingPropertyDescriptor(object);
			addSha256PropertyDescriptor(object);
			addRecipeSha256PropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Measurement Id feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMeasurementIdPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ProcessedSpectrum_measurementId_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ProcessedSpectrum_measurementId_feature", "_UI_ProcessedSpectrum_type"),
				 WorkspacePackage.Literals.PROCESSED_SPECTRUM__MEASUREMENT_ID,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Content feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addContentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ProcessedSpectrum_content_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ProcessedSpectrum_content_feature", "_UI_ProcessedSpectrum_type"),
				 WorkspacePackage.Literals.PROCESSED_SPECTRUM__CONTENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Sample Encoding feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSampleEncodingPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ProcessedSpectrum_sampleEncoding_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ProcessedSpectrum_sampleEncoding_feature", "_UI_ProcessedSpectrum_type"),
				 WorkspacePackage.Literals.PROCESSED_SPECTRUM__SAMPLE_ENCODING,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Sha256 feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSha256PropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ProcessedSpectrum_sha256_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ProcessedSpectrum_sha256_feature", "_UI_ProcessedSpectrum_type"),
				 WorkspacePackage.Literals.PROCESSED_SPECTRUM__SHA256,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Recipe Sha256 feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRecipeSha256PropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ProcessedSpectrum_recipeSha256_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ProcessedSpectrum_recipeSha256_feature", "_UI_ProcessedSpectrum_type"),
				 WorkspacePackage.Literals.PROCESSED_SPECTRUM__RECIPE_SHA256,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns ProcessedSpectrum.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/ProcessedSpectrum"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((ProcessedSpectrum)object).getId();
		return label == null || label.length() == 0 ?
			getString("_UI_ProcessedSpectrum_type") :
			getString("_UI_ProcessedSpectrum_type") + " " + label;
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

		switch (notification.getFeatureID(ProcessedSpectrum.class)) {
			case WorkspacePackage.PROCESSED_SPECTRUM__MEASUREMENT_ID:
			case WorkspacePackage.PROCESSED_SPECTRUM__CONTENT:
			case WorkspacePackage.PROCESSED_SPECTRUM__SAMPLE_ENCODING:
			case WorkspacePackage.PROCESSED_SPECTRUM__SHA256:
			case WorkspacePackage.PROCESSED_SPECTRUM__RECIPE_SHA256:
			case WorkspacePackage.PROCESSED_SPECTRUM__SPECTRUM:
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

}
