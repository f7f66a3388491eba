/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Limits</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Linearity and monotonicity requirements of a trim field.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.Limits#isMustBeMonotonic <em>Must Be Monotonic</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getMaxNonMonotonicRisk <em>Max Non Monotonic Risk</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getMaxDnlLsb <em>Max Dnl Lsb</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getMaxInlLsb <em>Max Inl Lsb</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getInlDefinition <em>Inl Definition</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getTargetYield <em>Target Yield</em>}</li>
 *   <li>{@link org.trimwright.model.Limits#getMaxGlitchLsb <em>Max Glitch Lsb</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getLimits()
 * @model
 * @generated
 */
public interface Limits extends EObject {
	/**
	 * Returns the value of the '<em><b>Must Be Monotonic</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Must Be Monotonic</em>' attribute.
	 * @see #setMustBeMonotonic(boolean)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_MustBeMonotonic()
	 * @model
	 * @generated
	 */
	boolean isMustBeMonotonic();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#isMustBeMonotonic <em>Must Be Monotonic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Must Be Monotonic</em>' attribute.
	 * @see #isMustBeMonotonic()
	 * @generated
	 */
	void setMustBeMonotonic(boolean value);

	/**
	 * Returns the value of the '<em><b>Max Non Monotonic Risk</b></em>' attribute.
	 * The default value is <code>"1.0E-6"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Max Non Monotonic Risk</em>' attribute.
	 * @see #setMaxNonMonotonicRisk(double)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_MaxNonMonotonicRisk()
	 * @model default="1.0E-6"
	 * @generated
	 */
	double getMaxNonMonotonicRisk();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getMaxNonMonotonicRisk <em>Max Non Monotonic Risk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Non Monotonic Risk</em>' attribute.
	 * @see #getMaxNonMonotonicRisk()
	 * @generated
	 */
	void setMaxNonMonotonicRisk(double value);

	/**
	 * Returns the value of the '<em><b>Max Dnl Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Max Dnl Lsb</em>' attribute.
	 * @see #isSetMaxDnlLsb()
	 * @see #unsetMaxDnlLsb()
	 * @see #setMaxDnlLsb(double)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_MaxDnlLsb()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMaxDnlLsb();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getMaxDnlLsb <em>Max Dnl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Dnl Lsb</em>' attribute.
	 * @see #isSetMaxDnlLsb()
	 * @see #unsetMaxDnlLsb()
	 * @see #getMaxDnlLsb()
	 * @generated
	 */
	void setMaxDnlLsb(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.Limits#getMaxDnlLsb <em>Max Dnl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaxDnlLsb()
	 * @see #getMaxDnlLsb()
	 * @see #setMaxDnlLsb(double)
	 * @generated
	 */
	void unsetMaxDnlLsb();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.Limits#getMaxDnlLsb <em>Max Dnl Lsb</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Max Dnl Lsb</em>' attribute is set.
	 * @see #unsetMaxDnlLsb()
	 * @see #getMaxDnlLsb()
	 * @see #setMaxDnlLsb(double)
	 * @generated
	 */
	boolean isSetMaxDnlLsb();

	/**
	 * Returns the value of the '<em><b>Max Inl Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Max Inl Lsb</em>' attribute.
	 * @see #isSetMaxInlLsb()
	 * @see #unsetMaxInlLsb()
	 * @see #setMaxInlLsb(double)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_MaxInlLsb()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMaxInlLsb();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getMaxInlLsb <em>Max Inl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Inl Lsb</em>' attribute.
	 * @see #isSetMaxInlLsb()
	 * @see #unsetMaxInlLsb()
	 * @see #getMaxInlLsb()
	 * @generated
	 */
	void setMaxInlLsb(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.Limits#getMaxInlLsb <em>Max Inl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaxInlLsb()
	 * @see #getMaxInlLsb()
	 * @see #setMaxInlLsb(double)
	 * @generated
	 */
	void unsetMaxInlLsb();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.Limits#getMaxInlLsb <em>Max Inl Lsb</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Max Inl Lsb</em>' attribute is set.
	 * @see #unsetMaxInlLsb()
	 * @see #getMaxInlLsb()
	 * @see #setMaxInlLsb(double)
	 * @generated
	 */
	boolean isSetMaxInlLsb();

	/**
	 * Returns the value of the '<em><b>Inl Definition</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.InlDefinition}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Inl Definition</em>' attribute.
	 * @see org.trimwright.model.InlDefinition
	 * @see #setInlDefinition(InlDefinition)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_InlDefinition()
	 * @model
	 * @generated
	 */
	InlDefinition getInlDefinition();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getInlDefinition <em>Inl Definition</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Inl Definition</em>' attribute.
	 * @see org.trimwright.model.InlDefinition
	 * @see #getInlDefinition()
	 * @generated
	 */
	void setInlDefinition(InlDefinition value);

	/**
	 * Returns the value of the '<em><b>Target Yield</b></em>' attribute.
	 * The default value is <code>"0.99"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Target Yield</em>' attribute.
	 * @see #setTargetYield(double)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_TargetYield()
	 * @model default="0.99"
	 * @generated
	 */
	double getTargetYield();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getTargetYield <em>Target Yield</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target Yield</em>' attribute.
	 * @see #getTargetYield()
	 * @generated
	 */
	void setTargetYield(double value);

	/**
	 * Returns the value of the '<em><b>Max Glitch Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Max Glitch Lsb</em>' attribute.
	 * @see #isSetMaxGlitchLsb()
	 * @see #unsetMaxGlitchLsb()
	 * @see #setMaxGlitchLsb(double)
	 * @see org.trimwright.model.TrimwrightPackage#getLimits_MaxGlitchLsb()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMaxGlitchLsb();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Limits#getMaxGlitchLsb <em>Max Glitch Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Glitch Lsb</em>' attribute.
	 * @see #isSetMaxGlitchLsb()
	 * @see #unsetMaxGlitchLsb()
	 * @see #getMaxGlitchLsb()
	 * @generated
	 */
	void setMaxGlitchLsb(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.Limits#getMaxGlitchLsb <em>Max Glitch Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaxGlitchLsb()
	 * @see #getMaxGlitchLsb()
	 * @see #setMaxGlitchLsb(double)
	 * @generated
	 */
	void unsetMaxGlitchLsb();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.Limits#getMaxGlitchLsb <em>Max Glitch Lsb</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Max Glitch Lsb</em>' attribute is set.
	 * @see #unsetMaxGlitchLsb()
	 * @see #getMaxGlitchLsb()
	 * @see #setMaxGlitchLsb(double)
	 * @generated
	 */
	boolean isSetMaxGlitchLsb();

} // Limits
