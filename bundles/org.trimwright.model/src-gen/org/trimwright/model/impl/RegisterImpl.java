/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.trimwright.model.Access;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.TrimwrightPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Register</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getAddressOffset <em>Address Offset</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getWidth <em>Width</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getAccess <em>Access</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getResetValue <em>Reset Value</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link org.trimwright.model.impl.RegisterImpl#getFields <em>Fields</em>}</li>
 * </ul>
 *
 * @generated
 */
public class RegisterImpl extends MinimalEObjectImpl.Container implements Register {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getAddressOffset() <em>Address Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAddressOffset()
	 * @generated
	 * @ordered
	 */
	protected static final long ADDRESS_OFFSET_EDEFAULT = 0L;

	/**
	 * The cached value of the '{@link #getAddressOffset() <em>Address Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAddressOffset()
	 * @generated
	 * @ordered
	 */
	protected long addressOffset = ADDRESS_OFFSET_EDEFAULT;

	/**
	 * The default value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected static final int WIDTH_EDEFAULT = 8;

	/**
	 * The cached value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected int width = WIDTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getAccess() <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccess()
	 * @generated
	 * @ordered
	 */
	protected static final Access ACCESS_EDEFAULT = Access.READ_WRITE;

	/**
	 * The cached value of the '{@link #getAccess() <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccess()
	 * @generated
	 * @ordered
	 */
	protected Access access = ACCESS_EDEFAULT;

	/**
	 * The default value of the '{@link #getResetValue() <em>Reset Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResetValue()
	 * @generated
	 * @ordered
	 */
	protected static final long RESET_VALUE_EDEFAULT = 0L;

	/**
	 * The cached value of the '{@link #getResetValue() <em>Reset Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResetValue()
	 * @generated
	 * @ordered
	 */
	protected long resetValue = RESET_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected static final String DESCRIPTION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected String description = DESCRIPTION_EDEFAULT;

	/**
	 * The cached value of the '{@link #getFields() <em>Fields</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFields()
	 * @generated
	 * @ordered
	 */
	protected EList<Field> fields;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected RegisterImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.REGISTER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getAddressOffset() {
		return addressOffset;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAddressOffset(long newAddressOffset) {
		long oldAddressOffset = addressOffset;
		addressOffset = newAddressOffset;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__ADDRESS_OFFSET, oldAddressOffset, addressOffset));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getWidth() {
		return width;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWidth(int newWidth) {
		int oldWidth = width;
		width = newWidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__WIDTH, oldWidth, width));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Access getAccess() {
		return access;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAccess(Access newAccess) {
		Access oldAccess = access;
		access = newAccess == null ? ACCESS_EDEFAULT : newAccess;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__ACCESS, oldAccess, access));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getResetValue() {
		return resetValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setResetValue(long newResetValue) {
		long oldResetValue = resetValue;
		resetValue = newResetValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__RESET_VALUE, oldResetValue, resetValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDescription() {
		return description;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDescription(String newDescription) {
		String oldDescription = description;
		description = newDescription;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.REGISTER__DESCRIPTION, oldDescription, description));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Field> getFields() {
		if (fields == null) {
			fields = new EObjectContainmentEList<Field>(Field.class, this, TrimwrightPackage.REGISTER__FIELDS);
		}
		return fields;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TrimwrightPackage.REGISTER__FIELDS:
				return ((InternalEList<?>)getFields()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.REGISTER__NAME:
				return getName();
			case TrimwrightPackage.REGISTER__ADDRESS_OFFSET:
				return getAddressOffset();
			case TrimwrightPackage.REGISTER__WIDTH:
				return getWidth();
			case TrimwrightPackage.REGISTER__ACCESS:
				return getAccess();
			case TrimwrightPackage.REGISTER__RESET_VALUE:
				return getResetValue();
			case TrimwrightPackage.REGISTER__DESCRIPTION:
				return getDescription();
			case TrimwrightPackage.REGISTER__FIELDS:
				return getFields();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TrimwrightPackage.REGISTER__NAME:
				setName((String)newValue);
				return;
			case TrimwrightPackage.REGISTER__ADDRESS_OFFSET:
				setAddressOffset((Long)newValue);
				return;
			case TrimwrightPackage.REGISTER__WIDTH:
				setWidth((Integer)newValue);
				return;
			case TrimwrightPackage.REGISTER__ACCESS:
				setAccess((Access)newValue);
				return;
			case TrimwrightPackage.REGISTER__RESET_VALUE:
				setResetValue((Long)newValue);
				return;
			case TrimwrightPackage.REGISTER__DESCRIPTION:
				setDescription((String)newValue);
				return;
			case TrimwrightPackage.REGISTER__FIELDS:
				getFields().clear();
				getFields().addAll((Collection<? extends Field>)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case TrimwrightPackage.REGISTER__NAME:
				setName(NAME_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__ADDRESS_OFFSET:
				setAddressOffset(ADDRESS_OFFSET_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__WIDTH:
				setWidth(WIDTH_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__ACCESS:
				setAccess(ACCESS_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__RESET_VALUE:
				setResetValue(RESET_VALUE_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__DESCRIPTION:
				setDescription(DESCRIPTION_EDEFAULT);
				return;
			case TrimwrightPackage.REGISTER__FIELDS:
				getFields().clear();
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case TrimwrightPackage.REGISTER__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case TrimwrightPackage.REGISTER__ADDRESS_OFFSET:
				return addressOffset != ADDRESS_OFFSET_EDEFAULT;
			case TrimwrightPackage.REGISTER__WIDTH:
				return width != WIDTH_EDEFAULT;
			case TrimwrightPackage.REGISTER__ACCESS:
				return access != ACCESS_EDEFAULT;
			case TrimwrightPackage.REGISTER__RESET_VALUE:
				return resetValue != RESET_VALUE_EDEFAULT;
			case TrimwrightPackage.REGISTER__DESCRIPTION:
				return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
			case TrimwrightPackage.REGISTER__FIELDS:
				return fields != null && !fields.isEmpty();
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (name: ");
		result.append(name);
		result.append(", addressOffset: ");
		result.append(addressOffset);
		result.append(", width: ");
		result.append(width);
		result.append(", access: ");
		result.append(access);
		result.append(", resetValue: ");
		result.append(resetValue);
		result.append(", description: ");
		result.append(description);
		result.append(')');
		return result.toString();
	}

} //RegisterImpl
