/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.trimwright.model.InlDefinition;
import org.trimwright.model.Limits;
import org.trimwright.model.TrimwrightPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Limits</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#isMustBeMonotonic <em>Must Be Monotonic</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getMaxNonMonotonicRisk <em>Max Non Monotonic Risk</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getMaxDnlLsb <em>Max Dnl Lsb</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getMaxInlLsb <em>Max Inl Lsb</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getInlDefinition <em>Inl Definition</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getTargetYield <em>Target Yield</em>}</li>
 *   <li>{@link org.trimwright.model.impl.LimitsImpl#getMaxGlitchLsb <em>Max Glitch Lsb</em>}</li>
 * </ul>
 *
 * @generated
 */
public class LimitsImpl extends MinimalEObjectImpl.Container implements Limits {
	/**
	 * The default value of the '{@link #isMustBeMonotonic() <em>Must Be Monotonic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isMustBeMonotonic()
	 * @generated
	 * @ordered
	 */
	protected static final boolean MUST_BE_MONOTONIC_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isMustBeMonotonic() <em>Must Be Monotonic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isMustBeMonotonic()
	 * @generated
	 * @ordered
	 */
	protected boolean mustBeMonotonic = MUST_BE_MONOTONIC_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxNonMonotonicRisk() <em>Max Non Monotonic Risk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxNonMonotonicRisk()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_NON_MONOTONIC_RISK_EDEFAULT = 1.0E-6;

	/**
	 * The cached value of the '{@link #getMaxNonMonotonicRisk() <em>Max Non Monotonic Risk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxNonMonotonicRisk()
	 * @generated
	 * @ordered
	 */
	protected double maxNonMonotonicRisk = MAX_NON_MONOTONIC_RISK_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxDnlLsb() <em>Max Dnl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxDnlLsb()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_DNL_LSB_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxDnlLsb() <em>Max Dnl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxDnlLsb()
	 * @generated
	 * @ordered
	 */
	protected double maxDnlLsb = MAX_DNL_LSB_EDEFAULT;

	/**
	 * This is true if the Max Dnl Lsb attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maxDnlLsbESet;

	/**
	 * The default value of the '{@link #getMaxInlLsb() <em>Max Inl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxInlLsb()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_INL_LSB_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxInlLsb() <em>Max Inl Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxInlLsb()
	 * @generated
	 * @ordered
	 */
	protected double maxInlLsb = MAX_INL_LSB_EDEFAULT;

	/**
	 * This is true if the Max Inl Lsb attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maxInlLsbESet;

	/**
	 * The default value of the '{@link #getInlDefinition() <em>Inl Definition</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInlDefinition()
	 * @generated
	 * @ordered
	 */
	protected static final InlDefinition INL_DEFINITION_EDEFAULT = InlDefinition.ENDPOINT;

	/**
	 * The cached value of the '{@link #getInlDefinition() <em>Inl Definition</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInlDefinition()
	 * @generated
	 * @ordered
	 */
	protected InlDefinition inlDefinition = INL_DEFINITION_EDEFAULT;

	/**
	 * The default value of the '{@link #getTargetYield() <em>Target Yield</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetYield()
	 * @generated
	 * @ordered
	 */
	protected static final double TARGET_YIELD_EDEFAULT = 0.99;

	/**
	 * The cached value of the '{@link #getTargetYield() <em>Target Yield</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTargetYield()
	 * @generated
	 * @ordered
	 */
	protected double targetYield = TARGET_YIELD_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxGlitchLsb() <em>Max Glitch Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxGlitchLsb()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_GLITCH_LSB_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxGlitchLsb() <em>Max Glitch Lsb</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxGlitchLsb()
	 * @generated
	 * @ordered
	 */
	protected double maxGlitchLsb = MAX_GLITCH_LSB_EDEFAULT;

	/**
	 * This is true if the Max Glitch Lsb attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maxGlitchLsbESet;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected LimitsImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.LIMITS;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isMustBeMonotonic() {
		return mustBeMonotonic;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMustBeMonotonic(boolean newMustBeMonotonic) {
		boolean oldMustBeMonotonic = mustBeMonotonic;
		mustBeMonotonic = newMustBeMonotonic;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__MUST_BE_MONOTONIC, oldMustBeMonotonic, mustBeMonotonic));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxNonMonotonicRisk() {
		return maxNonMonotonicRisk;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxNonMonotonicRisk(double newMaxNonMonotonicRisk) {
		double oldMaxNonMonotonicRisk = maxNonMonotonicRisk;
		maxNonMonotonicRisk = newMaxNonMonotonicRisk;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__MAX_NON_MONOTONIC_RISK, oldMaxNonMonotonicRisk, maxNonMonotonicRisk));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxDnlLsb() {
		return maxDnlLsb;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxDnlLsb(double newMaxDnlLsb) {
		double oldMaxDnlLsb = maxDnlLsb;
		maxDnlLsb = newMaxDnlLsb;
		boolean oldMaxDnlLsbESet = maxDnlLsbESet;
		maxDnlLsbESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__MAX_DNL_LSB, oldMaxDnlLsb, maxDnlLsb, !oldMaxDnlLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaxDnlLsb() {
		double oldMaxDnlLsb = maxDnlLsb;
		boolean oldMaxDnlLsbESet = maxDnlLsbESet;
		maxDnlLsb = MAX_DNL_LSB_EDEFAULT;
		maxDnlLsbESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.LIMITS__MAX_DNL_LSB, oldMaxDnlLsb, MAX_DNL_LSB_EDEFAULT, oldMaxDnlLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaxDnlLsb() {
		return maxDnlLsbESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxInlLsb() {
		return maxInlLsb;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxInlLsb(double newMaxInlLsb) {
		double oldMaxInlLsb = maxInlLsb;
		maxInlLsb = newMaxInlLsb;
		boolean oldMaxInlLsbESet = maxInlLsbESet;
		maxInlLsbESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__MAX_INL_LSB, oldMaxInlLsb, maxInlLsb, !oldMaxInlLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaxInlLsb() {
		double oldMaxInlLsb = maxInlLsb;
		boolean oldMaxInlLsbESet = maxInlLsbESet;
		maxInlLsb = MAX_INL_LSB_EDEFAULT;
		maxInlLsbESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.LIMITS__MAX_INL_LSB, oldMaxInlLsb, MAX_INL_LSB_EDEFAULT, oldMaxInlLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaxInlLsb() {
		return maxInlLsbESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public InlDefinition getInlDefinition() {
		return inlDefinition;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInlDefinition(InlDefinition newInlDefinition) {
		InlDefinition oldInlDefinition = inlDefinition;
		inlDefinition = newInlDefinition == null ? INL_DEFINITION_EDEFAULT : newInlDefinition;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__INL_DEFINITION, oldInlDefinition, inlDefinition));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTargetYield() {
		return targetYield;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTargetYield(double newTargetYield) {
		double oldTargetYield = targetYield;
		targetYield = newTargetYield;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__TARGET_YIELD, oldTargetYield, targetYield));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxGlitchLsb() {
		return maxGlitchLsb;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxGlitchLsb(double newMaxGlitchLsb) {
		double oldMaxGlitchLsb = maxGlitchLsb;
		maxGlitchLsb = newMaxGlitchLsb;
		boolean oldMaxGlitchLsbESet = maxGlitchLsbESet;
		maxGlitchLsbESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.LIMITS__MAX_GLITCH_LSB, oldMaxGlitchLsb, maxGlitchLsb, !oldMaxGlitchLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaxGlitchLsb() {
		double oldMaxGlitchLsb = maxGlitchLsb;
		boolean oldMaxGlitchLsbESet = maxGlitchLsbESet;
		maxGlitchLsb = MAX_GLITCH_LSB_EDEFAULT;
		maxGlitchLsbESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TrimwrightPackage.LIMITS__MAX_GLITCH_LSB, oldMaxGlitchLsb, MAX_GLITCH_LSB_EDEFAULT, oldMaxGlitchLsbESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaxGlitchLsb() {
		return maxGlitchLsbESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.LIMITS__MUST_BE_MONOTONIC:
				return isMustBeMonotonic();
			case TrimwrightPackage.LIMITS__MAX_NON_MONOTONIC_RISK:
				return getMaxNonMonotonicRisk();
			case TrimwrightPackage.LIMITS__MAX_DNL_LSB:
				return getMaxDnlLsb();
			case TrimwrightPackage.LIMITS__MAX_INL_LSB:
				return getMaxInlLsb();
			case TrimwrightPackage.LIMITS__INL_DEFINITION:
				return getInlDefinition();
			case TrimwrightPackage.LIMITS__TARGET_YIELD:
				return getTargetYield();
			case TrimwrightPackage.LIMITS__MAX_GLITCH_LSB:
				return getMaxGlitchLsb();
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
			case TrimwrightPackage.LIMITS__MUST_BE_MONOTONIC:
				setMustBeMonotonic((Boolean)newValue);
				return;
			case TrimwrightPackage.LIMITS__MAX_NON_MONOTONIC_RISK:
				setMaxNonMonotonicRisk((Double)newValue);
				return;
			case TrimwrightPackage.LIMITS__MAX_DNL_LSB:
				setMaxDnlLsb((Double)newValue);
				return;
			case TrimwrightPackage.LIMITS__MAX_INL_LSB:
				setMaxInlLsb((Double)newValue);
				return;
			case TrimwrightPackage.LIMITS__INL_DEFINITION:
				setInlDefinition((InlDefinition)newValue);
				return;
			case TrimwrightPackage.LIMITS__TARGET_YIELD:
				setTargetYield((Double)newValue);
				return;
			case TrimwrightPackage.LIMITS__MAX_GLITCH_LSB:
				setMaxGlitchLsb((Double)newValue);
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
			case TrimwrightPackage.LIMITS__MUST_BE_MONOTONIC:
				setMustBeMonotonic(MUST_BE_MONOTONIC_EDEFAULT);
				return;
			case TrimwrightPackage.LIMITS__MAX_NON_MONOTONIC_RISK:
				setMaxNonMonotonicRisk(MAX_NON_MONOTONIC_RISK_EDEFAULT);
				return;
			case TrimwrightPackage.LIMITS__MAX_DNL_LSB:
				unsetMaxDnlLsb();
				return;
			case TrimwrightPackage.LIMITS__MAX_INL_LSB:
				unsetMaxInlLsb();
				return;
			case TrimwrightPackage.LIMITS__INL_DEFINITION:
				setInlDefinition(INL_DEFINITION_EDEFAULT);
				return;
			case TrimwrightPackage.LIMITS__TARGET_YIELD:
				setTargetYield(TARGET_YIELD_EDEFAULT);
				return;
			case TrimwrightPackage.LIMITS__MAX_GLITCH_LSB:
				unsetMaxGlitchLsb();
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
			case TrimwrightPackage.LIMITS__MUST_BE_MONOTONIC:
				return mustBeMonotonic != MUST_BE_MONOTONIC_EDEFAULT;
			case TrimwrightPackage.LIMITS__MAX_NON_MONOTONIC_RISK:
				return maxNonMonotonicRisk != MAX_NON_MONOTONIC_RISK_EDEFAULT;
			case TrimwrightPackage.LIMITS__MAX_DNL_LSB:
				return isSetMaxDnlLsb();
			case TrimwrightPackage.LIMITS__MAX_INL_LSB:
				return isSetMaxInlLsb();
			case TrimwrightPackage.LIMITS__INL_DEFINITION:
				return inlDefinition != INL_DEFINITION_EDEFAULT;
			case TrimwrightPackage.LIMITS__TARGET_YIELD:
				return targetYield != TARGET_YIELD_EDEFAULT;
			case TrimwrightPackage.LIMITS__MAX_GLITCH_LSB:
				return isSetMaxGlitchLsb();
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
		result.append(" (mustBeMonotonic: ");
		result.append(mustBeMonotonic);
		result.append(", maxNonMonotonicRisk: ");
		result.append(maxNonMonotonicRisk);
		result.append(", maxDnlLsb: ");
		if (maxDnlLsbESet) result.append(maxDnlLsb); else result.append("<unset>");
		result.append(", maxInlLsb: ");
		if (maxInlLsbESet) result.append(maxInlLsb); else result.append("<unset>");
		result.append(", inlDefinition: ");
		result.append(inlDefinition);
		result.append(", targetYield: ");
		result.append(targetYield);
		result.append(", maxGlitchLsb: ");
		if (maxGlitchLsbESet) result.append(maxGlitchLsb); else result.append("<unset>");
		result.append(')');
		return result.toString();
	}

} //LimitsImpl
