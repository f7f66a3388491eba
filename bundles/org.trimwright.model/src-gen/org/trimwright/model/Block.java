/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Block</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * An analog or mixed-signal block with its registers.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.Block#getName <em>Name</em>}</li>
 *   <li>{@link org.trimwright.model.Block#getDescription <em>Description</em>}</li>
 *   <li>{@link org.trimwright.model.Block#getBaseAddress <em>Base Address</em>}</li>
 *   <li>{@link org.trimwright.model.Block#getRegisters <em>Registers</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getBlock()
 * @model annotation="http://www.eclipse.org/emf/2002/Ecore constraints='uniqueRegisterNames uniqueRegisterAddresses'"
 * @generated
 */
public interface Block extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.trimwright.model.TrimwrightPackage#getBlock_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Block#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.trimwright.model.TrimwrightPackage#getBlock_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Block#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Base Address</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Base Address</em>' attribute.
	 * @see #setBaseAddress(long)
	 * @see org.trimwright.model.TrimwrightPackage#getBlock_BaseAddress()
	 * @model
	 * @generated
	 */
	long getBaseAddress();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Block#getBaseAddress <em>Base Address</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Base Address</em>' attribute.
	 * @see #getBaseAddress()
	 * @generated
	 */
	void setBaseAddress(long value);

	/**
	 * Returns the value of the '<em><b>Registers</b></em>' containment reference list.
	 * The list contents are of type {@link org.trimwright.model.Register}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Registers</em>' containment reference list.
	 * @see org.trimwright.model.TrimwrightPackage#getBlock_Registers()
	 * @model containment="true"
	 * @generated
	 */
	EList<Register> getRegisters();

} // Block
