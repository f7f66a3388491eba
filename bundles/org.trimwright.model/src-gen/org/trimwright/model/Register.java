/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Register</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A register at an address offset inside its block.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.Register#getName <em>Name</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getAddressOffset <em>Address Offset</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getWidth <em>Width</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getAccess <em>Access</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getResetValue <em>Reset Value</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getDescription <em>Description</em>}</li>
 *   <li>{@link org.trimwright.model.Register#getFields <em>Fields</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getRegister()
 * @model annotation="http://www.eclipse.org/emf/2002/Ecore constraints='validWidth noOverlappingFields uniqueFieldNames'"
 * @generated
 */
public interface Register extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Address Offset</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Address Offset</em>' attribute.
	 * @see #setAddressOffset(long)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_AddressOffset()
	 * @model
	 * @generated
	 */
	long getAddressOffset();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getAddressOffset <em>Address Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Address Offset</em>' attribute.
	 * @see #getAddressOffset()
	 * @generated
	 */
	void setAddressOffset(long value);

	/**
	 * Returns the value of the '<em><b>Width</b></em>' attribute.
	 * The default value is <code>"8"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Width</em>' attribute.
	 * @see #setWidth(int)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_Width()
	 * @model default="8"
	 * @generated
	 */
	int getWidth();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getWidth <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Width</em>' attribute.
	 * @see #getWidth()
	 * @generated
	 */
	void setWidth(int value);

	/**
	 * Returns the value of the '<em><b>Access</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.Access}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Access</em>' attribute.
	 * @see org.trimwright.model.Access
	 * @see #setAccess(Access)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_Access()
	 * @model
	 * @generated
	 */
	Access getAccess();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getAccess <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Access</em>' attribute.
	 * @see org.trimwright.model.Access
	 * @see #getAccess()
	 * @generated
	 */
	void setAccess(Access value);

	/**
	 * Returns the value of the '<em><b>Reset Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Reset Value</em>' attribute.
	 * @see #setResetValue(long)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_ResetValue()
	 * @model
	 * @generated
	 */
	long getResetValue();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getResetValue <em>Reset Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reset Value</em>' attribute.
	 * @see #getResetValue()
	 * @generated
	 */
	void setResetValue(long value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Register#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Fields</b></em>' containment reference list.
	 * The list contents are of type {@link org.trimwright.model.Field}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Fields</em>' containment reference list.
	 * @see org.trimwright.model.TrimwrightPackage#getRegister_Fields()
	 * @model containment="true"
	 * @generated
	 */
	EList<Field> getFields();

} // Register
