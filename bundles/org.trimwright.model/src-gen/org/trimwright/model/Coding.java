/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Coding</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * How the code is decoded into switch controls.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.Coding#getScheme <em>Scheme</em>}</li>
 *   <li>{@link org.trimwright.model.Coding#getUnaryBits <em>Unary Bits</em>}</li>
 *   <li>{@link org.trimwright.model.Coding#isZeroState <em>Zero State</em>}</li>
 *   <li>{@link org.trimwright.model.Coding#getPolarity <em>Polarity</em>}</li>
 *   <li>{@link org.trimwright.model.Coding#getSequence <em>Sequence</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getCoding()
 * @model
 * @generated
 */
public interface Coding extends EObject {
	/**
	 * Returns the value of the '<em><b>Scheme</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.CodingScheme}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Scheme</em>' attribute.
	 * @see org.trimwright.model.CodingScheme
	 * @see #setScheme(CodingScheme)
	 * @see org.trimwright.model.TrimwrightPackage#getCoding_Scheme()
	 * @model
	 * @generated
	 */
	CodingScheme getScheme();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Coding#getScheme <em>Scheme</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Scheme</em>' attribute.
	 * @see org.trimwright.model.CodingScheme
	 * @see #getScheme()
	 * @generated
	 */
	void setScheme(CodingScheme value);

	/**
	 * Returns the value of the '<em><b>Unary Bits</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Unary Bits</em>' attribute.
	 * @see #setUnaryBits(int)
	 * @see org.trimwright.model.TrimwrightPackage#getCoding_UnaryBits()
	 * @model
	 * @generated
	 */
	int getUnaryBits();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Coding#getUnaryBits <em>Unary Bits</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unary Bits</em>' attribute.
	 * @see #getUnaryBits()
	 * @generated
	 */
	void setUnaryBits(int value);

	/**
	 * Returns the value of the '<em><b>Zero State</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Zero State</em>' attribute.
	 * @see #setZeroState(boolean)
	 * @see org.trimwright.model.TrimwrightPackage#getCoding_ZeroState()
	 * @model
	 * @generated
	 */
	boolean isZeroState();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Coding#isZeroState <em>Zero State</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Zero State</em>' attribute.
	 * @see #isZeroState()
	 * @generated
	 */
	void setZeroState(boolean value);

	/**
	 * Returns the value of the '<em><b>Polarity</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.SwitchPolarity}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Polarity</em>' attribute.
	 * @see org.trimwright.model.SwitchPolarity
	 * @see #setPolarity(SwitchPolarity)
	 * @see org.trimwright.model.TrimwrightPackage#getCoding_Polarity()
	 * @model
	 * @generated
	 */
	SwitchPolarity getPolarity();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Coding#getPolarity <em>Polarity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Polarity</em>' attribute.
	 * @see org.trimwright.model.SwitchPolarity
	 * @see #getPolarity()
	 * @generated
	 */
	void setPolarity(SwitchPolarity value);

	/**
	 * Returns the value of the '<em><b>Sequence</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.UnarySequence}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Sequence</em>' attribute.
	 * @see org.trimwright.model.UnarySequence
	 * @see #setSequence(UnarySequence)
	 * @see org.trimwright.model.TrimwrightPackage#getCoding_Sequence()
	 * @model
	 * @generated
	 */
	UnarySequence getSequence();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Coding#getSequence <em>Sequence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sequence</em>' attribute.
	 * @see org.trimwright.model.UnarySequence
	 * @see #getSequence()
	 * @generated
	 */
	void setSequence(UnarySequence value);

} // Coding
