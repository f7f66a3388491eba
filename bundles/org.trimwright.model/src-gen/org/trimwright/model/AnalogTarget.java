/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Analog Target</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * What the field trims: value = valueAtZero + s * step, s the signed step count of the code.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.AnalogTarget#getQuantity <em>Quantity</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getValueAtZero <em>Value At Zero</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getStep <em>Step</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getSignedFormat <em>Signed Format</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getTargetValue <em>Target Value</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getSpreadMin <em>Spread Min</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getSpreadMax <em>Spread Max</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getAccuracy <em>Accuracy</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getSafeMin <em>Safe Min</em>}</li>
 *   <li>{@link org.trimwright.model.AnalogTarget#getSafeMax <em>Safe Max</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget()
 * @model
 * @generated
 */
public interface AnalogTarget extends EObject {
	/**
	 * Returns the value of the '<em><b>Quantity</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.Quantity}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Quantity</em>' attribute.
	 * @see org.trimwright.model.Quantity
	 * @see #setQuantity(Quantity)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_Quantity()
	 * @model
	 * @generated
	 */
	Quantity getQuantity();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getQuantity <em>Quantity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Quantity</em>' attribute.
	 * @see org.trimwright.model.Quantity
	 * @see #getQuantity()
	 * @generated
	 */
	void setQuantity(Quantity value);

	/**
	 * Returns the value of the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Unit</em>' attribute.
	 * @see #setUnit(String)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_Unit()
	 * @model
	 * @generated
	 */
	String getUnit();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getUnit <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit</em>' attribute.
	 * @see #getUnit()
	 * @generated
	 */
	void setUnit(String value);

	/**
	 * Returns the value of the '<em><b>Value At Zero</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Value At Zero</em>' attribute.
	 * @see #setValueAtZero(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_ValueAtZero()
	 * @model
	 * @generated
	 */
	double getValueAtZero();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getValueAtZero <em>Value At Zero</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Value At Zero</em>' attribute.
	 * @see #getValueAtZero()
	 * @generated
	 */
	void setValueAtZero(double value);

	/**
	 * Returns the value of the '<em><b>Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Step</em>' attribute.
	 * @see #setStep(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_Step()
	 * @model
	 * @generated
	 */
	double getStep();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getStep <em>Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Step</em>' attribute.
	 * @see #getStep()
	 * @generated
	 */
	void setStep(double value);

	/**
	 * Returns the value of the '<em><b>Signed Format</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.SignedFormat}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Signed Format</em>' attribute.
	 * @see org.trimwright.model.SignedFormat
	 * @see #setSignedFormat(SignedFormat)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_SignedFormat()
	 * @model
	 * @generated
	 */
	SignedFormat getSignedFormat();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getSignedFormat <em>Signed Format</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Signed Format</em>' attribute.
	 * @see org.trimwright.model.SignedFormat
	 * @see #getSignedFormat()
	 * @generated
	 */
	void setSignedFormat(SignedFormat value);

	/**
	 * Returns the value of the '<em><b>Target Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Target Value</em>' attribute.
	 * @see #isSetTargetValue()
	 * @see #unsetTargetValue()
	 * @see #setTargetValue(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_TargetValue()
	 * @model unsettable="true"
	 * @generated
	 */
	double getTargetValue();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getTargetValue <em>Target Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target Value</em>' attribute.
	 * @see #isSetTargetValue()
	 * @see #unsetTargetValue()
	 * @see #getTargetValue()
	 * @generated
	 */
	void setTargetValue(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getTargetValue <em>Target Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetTargetValue()
	 * @see #getTargetValue()
	 * @see #setTargetValue(double)
	 * @generated
	 */
	void unsetTargetValue();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getTargetValue <em>Target Value</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Target Value</em>' attribute is set.
	 * @see #unsetTargetValue()
	 * @see #getTargetValue()
	 * @see #setTargetValue(double)
	 * @generated
	 */
	boolean isSetTargetValue();

	/**
	 * Returns the value of the '<em><b>Spread Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Spread Min</em>' attribute.
	 * @see #isSetSpreadMin()
	 * @see #unsetSpreadMin()
	 * @see #setSpreadMin(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_SpreadMin()
	 * @model unsettable="true"
	 * @generated
	 */
	double getSpreadMin();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMin <em>Spread Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spread Min</em>' attribute.
	 * @see #isSetSpreadMin()
	 * @see #unsetSpreadMin()
	 * @see #getSpreadMin()
	 * @generated
	 */
	void setSpreadMin(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMin <em>Spread Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetSpreadMin()
	 * @see #getSpreadMin()
	 * @see #setSpreadMin(double)
	 * @generated
	 */
	void unsetSpreadMin();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMin <em>Spread Min</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Spread Min</em>' attribute is set.
	 * @see #unsetSpreadMin()
	 * @see #getSpreadMin()
	 * @see #setSpreadMin(double)
	 * @generated
	 */
	boolean isSetSpreadMin();

	/**
	 * Returns the value of the '<em><b>Spread Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Spread Max</em>' attribute.
	 * @see #isSetSpreadMax()
	 * @see #unsetSpreadMax()
	 * @see #setSpreadMax(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_SpreadMax()
	 * @model unsettable="true"
	 * @generated
	 */
	double getSpreadMax();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMax <em>Spread Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Spread Max</em>' attribute.
	 * @see #isSetSpreadMax()
	 * @see #unsetSpreadMax()
	 * @see #getSpreadMax()
	 * @generated
	 */
	void setSpreadMax(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMax <em>Spread Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetSpreadMax()
	 * @see #getSpreadMax()
	 * @see #setSpreadMax(double)
	 * @generated
	 */
	void unsetSpreadMax();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getSpreadMax <em>Spread Max</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Spread Max</em>' attribute is set.
	 * @see #unsetSpreadMax()
	 * @see #getSpreadMax()
	 * @see #setSpreadMax(double)
	 * @generated
	 */
	boolean isSetSpreadMax();

	/**
	 * Returns the value of the '<em><b>Accuracy</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Accuracy</em>' attribute.
	 * @see #isSetAccuracy()
	 * @see #unsetAccuracy()
	 * @see #setAccuracy(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_Accuracy()
	 * @model unsettable="true"
	 * @generated
	 */
	double getAccuracy();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getAccuracy <em>Accuracy</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Accuracy</em>' attribute.
	 * @see #isSetAccuracy()
	 * @see #unsetAccuracy()
	 * @see #getAccuracy()
	 * @generated
	 */
	void setAccuracy(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getAccuracy <em>Accuracy</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetAccuracy()
	 * @see #getAccuracy()
	 * @see #setAccuracy(double)
	 * @generated
	 */
	void unsetAccuracy();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getAccuracy <em>Accuracy</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Accuracy</em>' attribute is set.
	 * @see #unsetAccuracy()
	 * @see #getAccuracy()
	 * @see #setAccuracy(double)
	 * @generated
	 */
	boolean isSetAccuracy();

	/**
	 * Returns the value of the '<em><b>Safe Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Safe Min</em>' attribute.
	 * @see #isSetSafeMin()
	 * @see #unsetSafeMin()
	 * @see #setSafeMin(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_SafeMin()
	 * @model unsettable="true"
	 * @generated
	 */
	double getSafeMin();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMin <em>Safe Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Safe Min</em>' attribute.
	 * @see #isSetSafeMin()
	 * @see #unsetSafeMin()
	 * @see #getSafeMin()
	 * @generated
	 */
	void setSafeMin(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMin <em>Safe Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetSafeMin()
	 * @see #getSafeMin()
	 * @see #setSafeMin(double)
	 * @generated
	 */
	void unsetSafeMin();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMin <em>Safe Min</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Safe Min</em>' attribute is set.
	 * @see #unsetSafeMin()
	 * @see #getSafeMin()
	 * @see #setSafeMin(double)
	 * @generated
	 */
	boolean isSetSafeMin();

	/**
	 * Returns the value of the '<em><b>Safe Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Safe Max</em>' attribute.
	 * @see #isSetSafeMax()
	 * @see #unsetSafeMax()
	 * @see #setSafeMax(double)
	 * @see org.trimwright.model.TrimwrightPackage#getAnalogTarget_SafeMax()
	 * @model unsettable="true"
	 * @generated
	 */
	double getSafeMax();

	/**
	 * Sets the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMax <em>Safe Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Safe Max</em>' attribute.
	 * @see #isSetSafeMax()
	 * @see #unsetSafeMax()
	 * @see #getSafeMax()
	 * @generated
	 */
	void setSafeMax(double value);

	/**
	 * Unsets the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMax <em>Safe Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetSafeMax()
	 * @see #getSafeMax()
	 * @see #setSafeMax(double)
	 * @generated
	 */
	void unsetSafeMax();

	/**
	 * Returns whether the value of the '{@link org.trimwright.model.AnalogTarget#getSafeMax <em>Safe Max</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Safe Max</em>' attribute is set.
	 * @see #unsetSafeMax()
	 * @see #getSafeMax()
	 * @see #setSafeMax(double)
	 * @generated
	 */
	boolean isSetSafeMax();

} // AnalogTarget
