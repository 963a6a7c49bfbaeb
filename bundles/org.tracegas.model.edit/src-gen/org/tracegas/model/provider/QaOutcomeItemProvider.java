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

import org.tracegas.model.QaOutcome;
import org.tracegas.model.WorkspacePackage;

/**
 * This is the item provider adapter for a {@link org.tracegas.model.QaOutcome} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class QaOutcomeItemProvider extends StoredObjectItemProvider {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public QaOutcomeItemProvider(AdapterFactory adapterFactory) {
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

			addProjectIdPropertyDescriptor(object);
			addMethodVersionIdPropertyDescriptor(object);
			addCheckPropertyDescriptor(object);
			addPassedPropertyDescriptor(object);
			addMeasuredPropertyDescriptor(object);
			addUnitPropertyDescriptor(object);
			addLowerLimitPropertyDescriptor(object);
			addUpperLimitPropertyDescriptor(object);
			addRulePropertyDescriptor(object);
			addSourcePropertyDescriptor(object);
			addRecordedByPropertyDescriptor(object);
			addRecordedPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Project Id feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addProjectIdPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_projectId_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_projectId_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__PROJECT_ID,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Method Version Id feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMethodVersionIdPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_methodVersionId_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_methodVersionId_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__METHOD_VERSION_ID,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Check feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCheckPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_check_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_check_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__CHECK,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Passed feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPassedPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_passed_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_passed_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__PASSED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.BOOLEAN_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Measured feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMeasuredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_measured_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_measured_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__MEASURED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_unit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_unit_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Lower Limit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLowerLimitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_lowerLimit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_lowerLimit_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__LOWER_LIMIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Upper Limit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addUpperLimitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_upperLimit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_upperLimit_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__UPPER_LIMIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Rule feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRulePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_rule_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_rule_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__RULE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Source feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSourcePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_source_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_source_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__SOURCE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Recorded By feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRecordedByPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_recordedBy_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_recordedBy_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__RECORDED_BY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Recorded feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRecordedPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_QaOutcome_recorded_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_QaOutcome_recorded_feature", "_UI_QaOutcome_type"),
				 WorkspacePackage.Literals.QA_OUTCOME__RECORDED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns QaOutcome.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/QaOutcome"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((QaOutcome)object).getId();
		return label == null || label.length() == 0 ?
			getString("_UI_QaOutcome_type") :
			getString("_UI_QaOutcome_type") + " " + label;
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

		switch (notification.getFeatureID(QaOutcome.class)) {
			case WorkspacePackage.QA_OUTCOME__PROJECT_ID:
			case WorkspacePackage.QA_OUTCOME__METHOD_VERSION_ID:
			case WorkspacePackage.QA_OUTCOME__CHECK:
			case WorkspacePackage.QA_OUTCOME__PASSED:
			case WorkspacePackage.QA_OUTCOME__MEASURED:
			case WorkspacePackage.QA_OUTCOME__UNIT:
			case WorkspacePackage.QA_OUTCOME__LOWER_LIMIT:
			case WorkspacePackage.QA_OUTCOME__UPPER_LIMIT:
			case WorkspacePackage.QA_OUTCOME__RULE:
			case WorkspacePackage.QA_OUTCOME__SOURCE:
			case WorkspacePackage.QA_OUTCOME__RECORDED_BY:
			case WorkspacePackage.QA_OUTCOME__RECORDED:
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
