/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Unit Element</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The unit element and its mismatch: relative sigma directly or from a Pelgrom coefficient and area.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.UnitElement#getNominalValue <em>Nominal Value</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getMismatchSpec <em>Mismatch Spec</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getUnitSigmaPercent <em>Unit Sigma Percent</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getPelgromPercentUm <em>Pelgrom Percent Um</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getAreaUm2 <em>Area Um2</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#isCoefficientForPair <em>Coefficient For Pair</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getSwitchPlacement <em>Switch Placement</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getSwitchSigmaPercent <em>Switch Sigma Percent</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getLinearGradientPercent <em>Linear Gradient Percent</em>}</li>
 *   <li>{@link org.trimwright.model.UnitElement#getQuadraticGradientPercent <em>Quadratic Gradient Percent</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getUnitElement()
 * @model
 * @generated
 */
public interface UnitElement extends EObject {
	/**
	 * Returns the value of the '<em><b>Nominal Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Nominal Value</em>' attribute.
	 * @see #setNominalValue(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_NominalValue()
	 * @model
	 * @generated
	 */
	double getNominalValue();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getNominalValue <em>Nominal Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nominal Value</em>' attribute.
	 * @see #getNominalValue()
	 * @generated
	 */
	void setNominalValue(double value);

	/**
	 * Returns the value of the '<em><b>Mismatch Spec</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.MismatchSpec}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Mismatch Spec</em>' attribute.
	 * @see org.trimwright.model.MismatchSpec
	 * @see #setMismatchSpec(MismatchSpec)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_MismatchSpec()
	 * @model
	 * @generated
	 */
	MismatchSpec getMismatchSpec();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getMismatchSpec <em>Mismatch Spec</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Mismatch Spec</em>' attribute.
	 * @see org.trimwright.model.MismatchSpec
	 * @see #getMismatchSpec()
	 * @generated
	 */
	void setMismatchSpec(MismatchSpec value);

	/**
	 * Returns the value of the '<em><b>Unit Sigma Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Unit Sigma Percent</em>' attribute.
	 * @see #setUnitSigmaPercent(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_UnitSigmaPercent()
	 * @model
	 * @generated
	 */
	double getUnitSigmaPercent();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getUnitSigmaPercent <em>Unit Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit Sigma Percent</em>' attribute.
	 * @see #getUnitSigmaPercent()
	 * @generated
	 */
	void setUnitSigmaPercent(double value);

	/**
	 * Returns the value of the '<em><b>Pelgrom Percent Um</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Pelgrom Percent Um</em>' attribute.
	 * @see #setPelgromPercentUm(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_PelgromPercentUm()
	 * @model
	 * @generated
	 */
	double getPelgromPercentUm();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getPelgromPercentUm <em>Pelgrom Percent Um</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Pelgrom Percent Um</em>' attribute.
	 * @see #getPelgromPercentUm()
	 * @generated
	 */
	void setPelgromPercentUm(double value);

	/**
	 * Returns the value of the '<em><b>Area Um2</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Area Um2</em>' attribute.
	 * @see #setAreaUm2(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_AreaUm2()
	 * @model
	 * @generated
	 */
	double getAreaUm2();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getAreaUm2 <em>Area Um2</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Area Um2</em>' attribute.
	 * @see #getAreaUm2()
	 * @generated
	 */
	void setAreaUm2(double value);

	/**
	 * Returns the value of the '<em><b>Coefficient For Pair</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Coefficient For Pair</em>' attribute.
	 * @see #setCoefficientForPair(boolean)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_CoefficientForPair()
	 * @model
	 * @generated
	 */
	boolean isCoefficientForPair();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#isCoefficientForPair <em>Coefficient For Pair</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Coefficient For Pair</em>' attribute.
	 * @see #isCoefficientForPair()
	 * @generated
	 */
	void setCoefficientForPair(boolean value);

	/**
	 * Returns the value of the '<em><b>Switch Placement</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.SwitchPlacement}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Switch Placement</em>' attribute.
	 * @see org.trimwright.model.SwitchPlacement
	 * @see #setSwitchPlacement(SwitchPlacement)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_SwitchPlacement()
	 * @model
	 * @generated
	 */
	SwitchPlacement getSwitchPlacement();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getSwitchPlacement <em>Switch Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Switch Placement</em>' attribute.
	 * @see org.trimwright.model.SwitchPlacement
	 * @see #getSwitchPlacement()
	 * @generated
	 */
	void setSwitchPlacement(SwitchPlacement value);

	/**
	 * Returns the value of the '<em><b>Switch Sigma Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Switch Sigma Percent</em>' attribute.
	 * @see #setSwitchSigmaPercent(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_SwitchSigmaPercent()
	 * @model
	 * @generated
	 */
	double getSwitchSigmaPercent();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getSwitchSigmaPercent <em>Switch Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Switch Sigma Percent</em>' attribute.
	 * @see #getSwitchSigmaPercent()
	 * @generated
	 */
	void setSwitchSigmaPercent(double value);

	/**
	 * Returns the value of the '<em><b>Linear Gradient Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Linear Gradient Percent</em>' attribute.
	 * @see #setLinearGradientPercent(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_LinearGradientPercent()
	 * @model
	 * @generated
	 */
	double getLinearGradientPercent();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getLinearGradientPercent <em>Linear Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Linear Gradient Percent</em>' attribute.
	 * @see #getLinearGradientPercent()
	 * @generated
	 */
	void setLinearGradientPercent(double value);

	/**
	 * Returns the value of the '<em><b>Quadratic Gradient Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Quadratic Gradient Percent</em>' attribute.
	 * @see #setQuadraticGradientPercent(double)
	 * @see org.trimwright.model.TrimwrightPackage#getUnitElement_QuadraticGradientPercent()
	 * @model
	 * @generated
	 */
	double getQuadraticGradientPercent();

	/**
	 * Sets the value of the '{@link org.trimwright.model.UnitElement#getQuadraticGradientPercent <em>Quadratic Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Quadratic Gradient Percent</em>' attribute.
	 * @see #getQuadraticGradientPercent()
	 * @generated
	 */
	void setQuadraticGradientPercent(double value);

} // UnitElement
