/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Quantity;
import org.trimwright.model.SignedFormat;
import org.trimwright.model.TrimwrightPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Analog Target</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getQuantity <em>Quantity</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getUnit <em>Unit</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getValueAtZero <em>Value At Zero</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getStep <em>Step</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getSignedFormat <em>Signed Format</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getTargetValue <em>Target Value</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getSpreadMin <em>Spread Min</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getSpreadMax <em>Spread Max</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getAccuracy <em>Accuracy</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getSafeMin <em>Safe Min</em>}</li>
 *   <li>{@link org.trimwright.model.impl.AnalogTargetImpl#getSafeMax <em>Safe Max</em>}</li>
 * </ul>
 *
 * @generated
 */
public class AnalogTargetImpl extends MinimalEObjectImpl.Container implements AnalogTarget {
	/**
	 * The default value of the '{@link #getQuantity() <em>Quantity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getQuantity()
	 * @generated
	 * @ordered
	 */
	protected static final Quantity QUANTITY_EDEFAULT = Quantity.VOLTAGE;

	/**
	 * The cached value of the '{@link #getQuantity() <em>Quantity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getQuantity()
	 * @generated
	 * @ordered
	 */
	protected Quantity quantity = QUANTITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected static final String UNIT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected String unit = UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getValueAtZero() <em>Value At Zero</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getValueAtZero()
	 * @generated
	 * @ordered
	 */
	protected static final double VALUE_AT_ZERO_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getValueAtZero() <em>Value At Zero</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getValueAtZero()
	 * @generated
	 * @ordered
	 */
	protected double valueAtZero = VALUE_AT_ZERO_EDEFAULT;

	/**
	 * The default value of the '{@link #getStep() <em>Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStep()
	 * @generated
	 * @ordered
	 */
	protected static final double STEP_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStep() <em>Step</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStep()
	 * @generated
	 * @ordered
	 */
	protected double step = STEP_EDEFAULT;

	/**
	 * The default value of the '{@link #getSignedFormat() <em>Signed Format</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSignedFormat()
	 * @generated
	 * @ordered
	 */
	protected static final SignedFormat SIGNED_FORMAT_EDEFAULT = SignedFormat.UNSIGNED;

	/**
	 * The cached value of the '{@link #getSignedFormat() <em>Signed Format</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSignedFormat()
	 * @generated
	 * @ordered
	 */
	protected SignedFormat signedFormat = SIGNED_FORMAT_EDEFAULT;

	/**
	 * The default value of the '{@link #getTargetValue() <em>Target Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetValue()
	 * @generated
	 * @ordered
	 */
	protected static final double TARGET_VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTargetValue() <em>Target Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetValue()
	 * @generated
	 * @ordered
	 */
	protected double targetValue = TARGET_VALUE_EDEFAULT;

	/**
	 * This is true if the Target Value attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean targetValueESet;

	/**
	 * The default value of the '{@link #getSpreadMin() <em>Spread Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpreadMin()
	 * @generated
	 * @ordered
	 */
	protected static final double SPREAD_MIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSpreadMin() <em>Spread Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpreadMin()
	 * @generated
	 * @ordered
	 */
	protected double spreadMin = SPREAD_MIN_EDEFAULT;

	/**
	 * This is true if the Spread Min attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean spreadMinESet;

	/**
	 * The default value of the '{@link #getSpreadMax() <em>Spread Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpreadMax()
	 * @generated
	 * @ordered
	 */
	protected static final double SPREAD_MAX_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSpreadMax() <em>Spread Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSpreadMax()
	 * @generated
	 * @ordered
	 */
	protected double spreadMax = SPREAD_MAX_EDEFAULT;

	/**
	 * This is true if the Spread Max attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean spreadMaxESet;

	/**
	 * The default value of the '{@link #getAccuracy() <em>Accuracy</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccuracy()
	 * @generated
	 * @ordered
	 */
	protected static final double ACCURACY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getAccuracy() <em>Accuracy</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccuracy()
	 * @generated
	 * @ordered
	 */
	protected double accuracy = ACCURACY_EDEFAULT;

	/**
	 * This is true if the Accuracy attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean accuracyESet;

	/**
	 * The default value of the '{@link #getSafeMin() <em>Safe Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSafeMin()
	 * @generated
	 * @ordered
	 */
	protected static final double SAFE_MIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSafeMin() <em>Safe Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSafeMin()
	 * @generated
	 * @ordered
	 */
	protected double safeMin = SAFE_MIN_EDEFAULT;

	/**
	 * This is true if the Safe Min attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean safeMinESet;

	/**
	 * The default value of the '{@link #getSafeMax() <em>Safe Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSafeMax()
	 * @generated
	 * @ordered
	 */
	protected static final double SAFE_MAX_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSafeMax() <em>Safe Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSafeMax()
	 * @generated
	 * @ordered
	 */
	protected double safeMax = SAFE_MAX_EDEFAULT;

	/**
	 * This is true if the Safe Max attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean safeMaxESet;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected AnalogTargetImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.ANALOG_TARGET;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Quantity getQuantity() {
		return quantity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setQuantity(Quantity newQuantity) {
		Quantity oldQuantity = quantity;
		quantity = newQuantity == null ? QUANTITY_EDEFAULT : newQuantity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__QUANTITY, oldQuantity, quantity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getUnit() {
		return unit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnit(String newUnit) {
		String oldUnit = unit;
		unit = newUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__UNIT, oldUnit, unit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getValueAtZero() {
		return valueAtZero;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setValueAtZero(double newValueAtZero) {
		double oldValueAtZero = valueAtZero;
		valueAtZero = newValueAtZero;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__VALUE_AT_ZERO, oldValueAtZero, valueAtZero));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStep() {
		return step;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStep(double newStep) {
		double oldStep = step;
		step = newStep;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__STEP, oldStep, step));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SignedFormat getSignedFormat() {
		return signedFormat;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSignedFormat(SignedFormat newSignedFormat) {
		SignedFormat oldSignedFormat = signedFormat;
		signedFormat = newSignedFormat == null ? SIGNED_FORMAT_EDEFAULT : newSignedFormat;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__SIGNED_FORMAT, oldSignedFormat, signedFormat));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTargetValue() {
		return targetValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTargetValue(double newTargetValue) {
		double oldTargetValue = targetValue;
		targetValue = newTargetValue;
		boolean oldTargetValueESet = targetValueESet;
		targetValueESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE, oldTargetValue, targetValue, !oldTargetValueESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetTargetValue() {
		double oldTargetValue = targetValue;
		boolean oldTargetValueESet = targetValueESet;
		targetValue = TARGET_VALUE_EDEFAULT;
		targetValueESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE, oldTargetValue, TARGET_VALUE_EDEFAULT, oldTargetValueESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetTargetValue() {
		return targetValueESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSpreadMin() {
		return spreadMin;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpreadMin(double newSpreadMin) {
		double oldSpreadMin = spreadMin;
		spreadMin = newSpreadMin;
		boolean oldSpreadMinESet = spreadMinESet;
		spreadMinESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN, oldSpreadMin, spreadMin, !oldSpreadMinESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetSpreadMin() {
		double oldSpreadMin = spreadMin;
		boolean oldSpreadMinESet = spreadMinESet;
		spreadMin = SPREAD_MIN_EDEFAULT;
		spreadMinESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN, oldSpreadMin, SPREAD_MIN_EDEFAULT, oldSpreadMinESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetSpreadMin() {
		return spreadMinESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSpreadMax() {
		return spreadMax;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSpreadMax(double newSpreadMax) {
		double oldSpreadMax = spreadMax;
		spreadMax = newSpreadMax;
		boolean oldSpreadMaxESet = spreadMaxESet;
		spreadMaxESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX, oldSpreadMax, spreadMax, !oldSpreadMaxESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetSpreadMax() {
		double oldSpreadMax = spreadMax;
		boolean oldSpreadMaxESet = spreadMaxESet;
		spreadMax = SPREAD_MAX_EDEFAULT;
		spreadMaxESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX, oldSpreadMax, SPREAD_MAX_EDEFAULT, oldSpreadMaxESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetSpreadMax() {
		return spreadMaxESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getAccuracy() {
		return accuracy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAccuracy(double newAccuracy) {
		double oldAccuracy = accuracy;
		accuracy = newAccuracy;
		boolean oldAccuracyESet = accuracyESet;
		accuracyESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__ACCURACY, oldAccuracy, accuracy, !oldAccuracyESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetAccuracy() {
		double oldAccuracy = accuracy;
		boolean oldAccuracyESet = accuracyESet;
		accuracy = ACCURACY_EDEFAULT;
		accuracyESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__ACCURACY, oldAccuracy, ACCURACY_EDEFAULT, oldAccuracyESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetAccuracy() {
		return accuracyESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSafeMin() {
		return safeMin;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSafeMin(double newSafeMin) {
		double oldSafeMin = safeMin;
		safeMin = newSafeMin;
		boolean oldSafeMinESet = safeMinESet;
		safeMinESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__SAFE_MIN, oldSafeMin, safeMin, !oldSafeMinESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetSafeMin() {
		double oldSafeMin = safeMin;
		boolean oldSafeMinESet = safeMinESet;
		safeMin = SAFE_MIN_EDEFAULT;
		safeMinESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__SAFE_MIN, oldSafeMin, SAFE_MIN_EDEFAULT, oldSafeMinESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetSafeMin() {
		return safeMinESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSafeMax() {
		return safeMax;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSafeMax(double newSafeMax) {
		double oldSafeMax = safeMax;
		safeMax = newSafeMax;
		boolean oldSafeMaxESet = safeMaxESet;
		safeMaxESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.ANALOG_TARGET__SAFE_MAX, oldSafeMax, safeMax, !oldSafeMaxESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetSafeMax() {
		double oldSafeMax = safeMax;
		boolean oldSafeMaxESet = safeMaxESet;
		safeMax = SAFE_MAX_EDEFAULT;
		safeMaxESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.ANALOG_TARGET__SAFE_MAX, oldSafeMax, SAFE_MAX_EDEFAULT, oldSafeMaxESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetSafeMax() {
		return safeMaxESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.ANALOG_TARGET__QUANTITY:
				return getQuantity();
			case TrimwrightPackage.ANALOG_TARGET__UNIT:
				return getUnit();
			case TrimwrightPackage.ANALOG_TARGET__VALUE_AT_ZERO:
				return getValueAtZero();
			case TrimwrightPackage.ANALOG_TARGET__STEP:
				return getStep();
			case TrimwrightPackage.ANALOG_TARGET__SIGNED_FORMAT:
				return getSignedFormat();
			case TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE:
				return getTargetValue();
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN:
				return getSpreadMin();
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX:
				return getSpreadMax();
			case TrimwrightPackage.ANALOG_TARGET__ACCURACY:
				return getAccuracy();
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MIN:
				return getSafeMin();
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MAX:
				return getSafeMax();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TrimwrightPackage.ANALOG_TARGET__QUANTITY:
				setQuantity((Quantity)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__UNIT:
				setUnit((String)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__VALUE_AT_ZERO:
				setValueAtZero((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__STEP:
				setStep((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SIGNED_FORMAT:
				setSignedFormat((SignedFormat)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE:
				setTargetValue((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN:
				setSpreadMin((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX:
				setSpreadMax((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__ACCURACY:
				setAccuracy((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MIN:
				setSafeMin((Double)newValue);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MAX:
				setSafeMax((Double)newValue);
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
			case TrimwrightPackage.ANALOG_TARGET__QUANTITY:
				setQuantity(QUANTITY_EDEFAULT);
				return;
			case TrimwrightPackage.ANALOG_TARGET__UNIT:
				setUnit(UNIT_EDEFAULT);
				return;
			case TrimwrightPackage.ANALOG_TARGET__VALUE_AT_ZERO:
				setValueAtZero(VALUE_AT_ZERO_EDEFAULT);
				return;
			case TrimwrightPackage.ANALOG_TARGET__STEP:
				setStep(STEP_EDEFAULT);
				return;
			case TrimwrightPackage.ANALOG_TARGET__SIGNED_FORMAT:
				setSignedFormat(SIGNED_FORMAT_EDEFAULT);
				return;
			case TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE:
				unsetTargetValue();
				return;
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN:
				unsetSpreadMin();
				return;
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX:
				unsetSpreadMax();
				return;
			case TrimwrightPackage.ANALOG_TARGET__ACCURACY:
				unsetAccuracy();
				return;
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MIN:
				unsetSafeMin();
				return;
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MAX:
				unsetSafeMax();
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
			case TrimwrightPackage.ANALOG_TARGET__QUANTITY:
				return quantity != QUANTITY_EDEFAULT;
			case TrimwrightPackage.ANALOG_TARGET__UNIT:
				return UNIT_EDEFAULT == null ? unit != null : !UNIT_EDEFAULT.equals(unit);
			case TrimwrightPackage.ANALOG_TARGET__VALUE_AT_ZERO:
				return valueAtZero != VALUE_AT_ZERO_EDEFAULT;
			case TrimwrightPackage.ANALOG_TARGET__STEP:
				return step != STEP_EDEFAULT;
			case TrimwrightPackage.ANALOG_TARGET__SIGNED_FORMAT:
				return signedFormat != SIGNED_FORMAT_EDEFAULT;
			case TrimwrightPackage.ANALOG_TARGET__TARGET_VALUE:
				return isSetTargetValue();
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MIN:
				return isSetSpreadMin();
			case TrimwrightPackage.ANALOG_TARGET__SPREAD_MAX:
				return isSetSpreadMax();
			case TrimwrightPackage.ANALOG_TARGET__ACCURACY:
				return isSetAccuracy();
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MIN:
				return isSetSafeMin();
			case TrimwrightPackage.ANALOG_TARGET__SAFE_MAX:
				return isSetSafeMax();
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
		result.append(" (quantity: ");
		result.append(quantity);
		result.append(", unit: ");
		result.append(unit);
		result.append(", valueAtZero: ");
		result.append(valueAtZero);
		result.append(", step: ");
		result.append(step);
		result.append(", signedFormat: ");
		result.append(signedFormat);
		result.append(", targetValue: ");
		if (targetValueESet) result.append(targetValue); else result.append("<unset>");
		result.append(", spreadMin: ");
		if (spreadMinESet) result.append(spreadMin); else result.append("<unset>");
		result.append(", spreadMax: ");
		if (spreadMaxESet) result.append(spreadMax); else result.append("<unset>");
		result.append(", accuracy: ");
		if (accuracyESet) result.append(accuracy); else result.append("<unset>");
		result.append(", safeMin: ");
		if (safeMinESet) result.append(safeMin); else result.append("<unset>");
		result.append(", safeMax: ");
		if (safeMaxESet) result.append(safeMax); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //AnalogTargetImpl
