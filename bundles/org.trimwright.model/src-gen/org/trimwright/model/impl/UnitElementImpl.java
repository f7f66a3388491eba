/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.trimwright.model.MismatchSpec;
import org.trimwright.model.SwitchPlacement;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.UnitElement;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Unit Element</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getNominalValue <em>Nominal Value</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getMismatchSpec <em>Mismatch Spec</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getUnitSigmaPercent <em>Unit Sigma Percent</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getPelgromPercentUm <em>Pelgrom Percent Um</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getAreaUm2 <em>Area Um2</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#isCoefficientForPair <em>Coefficient For Pair</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getSwitchPlacement <em>Switch Placement</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getSwitchSigmaPercent <em>Switch Sigma Percent</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getLinearGradientPercent <em>Linear Gradient Percent</em>}</li>
 *   <li>{@link org.trimwright.model.impl.UnitElementImpl#getQuadraticGradientPercent <em>Quadratic Gradient Percent</em>}</li>
 * </ul>
 *
 * @generated
 */
public class UnitElementImpl extends MinimalEObjectImpl.Container implements UnitElement {
	/**
	 * The default value of the '{@link #getNominalValue() <em>Nominal Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNominalValue()
	 * @generated
	 * @ordered
	 */
	protected static final double NOMINAL_VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNominalValue() <em>Nominal Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNominalValue()
	 * @generated
	 * @ordered
	 */
	protected double nominalValue = NOMINAL_VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getMismatchSpec() <em>Mismatch Spec</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMismatchSpec()
	 * @generated
	 * @ordered
	 */
	protected static final MismatchSpec MISMATCH_SPEC_EDEFAULT = MismatchSpec.RELATIVE_SIGMA;

	/**
	 * The cached value of the '{@link #getMismatchSpec() <em>Mismatch Spec</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMismatchSpec()
	 * @generated
	 * @ordered
	 */
	protected MismatchSpec mismatchSpec = MISMATCH_SPEC_EDEFAULT;

	/**
	 * The default value of the '{@link #getUnitSigmaPercent() <em>Unit Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitSigmaPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double UNIT_SIGMA_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getUnitSigmaPercent() <em>Unit Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitSigmaPercent()
	 * @generated
	 * @ordered
	 */
	protected double unitSigmaPercent = UNIT_SIGMA_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getPelgromPercentUm() <em>Pelgrom Percent Um</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPelgromPercentUm()
	 * @generated
	 * @ordered
	 */
	protected static final double PELGROM_PERCENT_UM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPelgromPercentUm() <em>Pelgrom Percent Um</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPelgromPercentUm()
	 * @generated
	 * @ordered
	 */
	protected double pelgromPercentUm = PELGROM_PERCENT_UM_EDEFAULT;

	/**
	 * The default value of the '{@link #getAreaUm2() <em>Area Um2</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAreaUm2()
	 * @generated
	 * @ordered
	 */
	protected static final double AREA_UM2_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getAreaUm2() <em>Area Um2</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAreaUm2()
	 * @generated
	 * @ordered
	 */
	protected double areaUm2 = AREA_UM2_EDEFAULT;

	/**
	 * The default value of the '{@link #isCoefficientForPair() <em>Coefficient For Pair</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isCoefficientForPair()
	 * @generated
	 * @ordered
	 */
	protected static final boolean COEFFICIENT_FOR_PAIR_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isCoefficientForPair() <em>Coefficient For Pair</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isCoefficientForPair()
	 * @generated
	 * @ordered
	 */
	protected boolean coefficientForPair = COEFFICIENT_FOR_PAIR_EDEFAULT;

	/**
	 * The default value of the '{@link #getSwitchPlacement() <em>Switch Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwitchPlacement()
	 * @generated
	 * @ordered
	 */
	protected static final SwitchPlacement SWITCH_PLACEMENT_EDEFAULT = SwitchPlacement.DRAIN_SIDE;

	/**
	 * The cached value of the '{@link #getSwitchPlacement() <em>Switch Placement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwitchPlacement()
	 * @generated
	 * @ordered
	 */
	protected SwitchPlacement switchPlacement = SWITCH_PLACEMENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getSwitchSigmaPercent() <em>Switch Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwitchSigmaPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double SWITCH_SIGMA_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSwitchSigmaPercent() <em>Switch Sigma Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSwitchSigmaPercent()
	 * @generated
	 * @ordered
	 */
	protected double switchSigmaPercent = SWITCH_SIGMA_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getLinearGradientPercent() <em>Linear Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLinearGradientPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double LINEAR_GRADIENT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLinearGradientPercent() <em>Linear Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLinearGradientPercent()
	 * @generated
	 * @ordered
	 */
	protected double linearGradientPercent = LINEAR_GRADIENT_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getQuadraticGradientPercent() <em>Quadratic Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getQuadraticGradientPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double QUADRATIC_GRADIENT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getQuadraticGradientPercent() <em>Quadratic Gradient Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getQuadraticGradientPercent()
	 * @generated
	 * @ordered
	 */
	protected double quadraticGradientPercent = QUADRATIC_GRADIENT_PERCENT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected UnitElementImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.UNIT_ELEMENT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNominalValue() {
		return nominalValue;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNominalValue(double newNominalValue) {
		double oldNominalValue = nominalValue;
		nominalValue = newNominalValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__NOMINAL_VALUE, oldNominalValue, nominalValue));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public MismatchSpec getMismatchSpec() {
		return mismatchSpec;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMismatchSpec(MismatchSpec newMismatchSpec) {
		MismatchSpec oldMismatchSpec = mismatchSpec;
		mismatchSpec = newMismatchSpec == null ? MISMATCH_SPEC_EDEFAULT : newMismatchSpec;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__MISMATCH_SPEC, oldMismatchSpec, mismatchSpec));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getUnitSigmaPercent() {
		return unitSigmaPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnitSigmaPercent(double newUnitSigmaPercent) {
		double oldUnitSigmaPercent = unitSigmaPercent;
		unitSigmaPercent = newUnitSigmaPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__UNIT_SIGMA_PERCENT, oldUnitSigmaPercent, unitSigmaPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPelgromPercentUm() {
		return pelgromPercentUm;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPelgromPercentUm(double newPelgromPercentUm) {
		double oldPelgromPercentUm = pelgromPercentUm;
		pelgromPercentUm = newPelgromPercentUm;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__PELGROM_PERCENT_UM, oldPelgromPercentUm, pelgromPercentUm));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getAreaUm2() {
		return areaUm2;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAreaUm2(double newAreaUm2) {
		double oldAreaUm2 = areaUm2;
		areaUm2 = newAreaUm2;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__AREA_UM2, oldAreaUm2, areaUm2));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isCoefficientForPair() {
		return coefficientForPair;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCoefficientForPair(boolean newCoefficientForPair) {
		boolean oldCoefficientForPair = coefficientForPair;
		coefficientForPair = newCoefficientForPair;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__COEFFICIENT_FOR_PAIR, oldCoefficientForPair, coefficientForPair));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SwitchPlacement getSwitchPlacement() {
		return switchPlacement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSwitchPlacement(SwitchPlacement newSwitchPlacement) {
		SwitchPlacement oldSwitchPlacement = switchPlacement;
		switchPlacement = newSwitchPlacement == null ? SWITCH_PLACEMENT_EDEFAULT : newSwitchPlacement;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__SWITCH_PLACEMENT, oldSwitchPlacement, switchPlacement));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSwitchSigmaPercent() {
		return switchSigmaPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSwitchSigmaPercent(double newSwitchSigmaPercent) {
		double oldSwitchSigmaPercent = switchSigmaPercent;
		switchSigmaPercent = newSwitchSigmaPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__SWITCH_SIGMA_PERCENT, oldSwitchSigmaPercent, switchSigmaPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLinearGradientPercent() {
		return linearGradientPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLinearGradientPercent(double newLinearGradientPercent) {
		double oldLinearGradientPercent = linearGradientPercent;
		linearGradientPercent = newLinearGradientPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT, oldLinearGradientPercent, linearGradientPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getQuadraticGradientPercent() {
		return quadraticGradientPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setQuadraticGradientPercent(double newQuadraticGradientPercent) {
		double oldQuadraticGradientPercent = quadraticGradientPercent;
		quadraticGradientPercent = newQuadraticGradientPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT, oldQuadraticGradientPercent, quadraticGradientPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.UNIT_ELEMENT__NOMINAL_VALUE:
				return getNominalValue();
			case TrimwrightPackage.UNIT_ELEMENT__MISMATCH_SPEC:
				return getMismatchSpec();
			case TrimwrightPackage.UNIT_ELEMENT__UNIT_SIGMA_PERCENT:
				return getUnitSigmaPercent();
			case TrimwrightPackage.UNIT_ELEMENT__PELGROM_PERCENT_UM:
				return getPelgromPercentUm();
			case TrimwrightPackage.UNIT_ELEMENT__AREA_UM2:
				return getAreaUm2();
			case TrimwrightPackage.UNIT_ELEMENT__COEFFICIENT_FOR_PAIR:
				return isCoefficientForPair();
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_PLACEMENT:
				return getSwitchPlacement();
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_SIGMA_PERCENT:
				return getSwitchSigmaPercent();
			case TrimwrightPackage.UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT:
				return getLinearGradientPercent();
			case TrimwrightPackage.UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT:
				return getQuadraticGradientPercent();
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
			case TrimwrightPackage.UNIT_ELEMENT__NOMINAL_VALUE:
				setNominalValue((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__MISMATCH_SPEC:
				setMismatchSpec((MismatchSpec)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__UNIT_SIGMA_PERCENT:
				setUnitSigmaPercent((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__PELGROM_PERCENT_UM:
				setPelgromPercentUm((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__AREA_UM2:
				setAreaUm2((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__COEFFICIENT_FOR_PAIR:
				setCoefficientForPair((Boolean)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_PLACEMENT:
				setSwitchPlacement((SwitchPlacement)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_SIGMA_PERCENT:
				setSwitchSigmaPercent((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT:
				setLinearGradientPercent((Double)newValue);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT:
				setQuadraticGradientPercent((Double)newValue);
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
			case TrimwrightPackage.UNIT_ELEMENT__NOMINAL_VALUE:
				setNominalValue(NOMINAL_VALUE_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__MISMATCH_SPEC:
				setMismatchSpec(MISMATCH_SPEC_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__UNIT_SIGMA_PERCENT:
				setUnitSigmaPercent(UNIT_SIGMA_PERCENT_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__PELGROM_PERCENT_UM:
				setPelgromPercentUm(PELGROM_PERCENT_UM_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__AREA_UM2:
				setAreaUm2(AREA_UM2_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__COEFFICIENT_FOR_PAIR:
				setCoefficientForPair(COEFFICIENT_FOR_PAIR_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_PLACEMENT:
				setSwitchPlacement(SWITCH_PLACEMENT_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_SIGMA_PERCENT:
				setSwitchSigmaPercent(SWITCH_SIGMA_PERCENT_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT:
				setLinearGradientPercent(LINEAR_GRADIENT_PERCENT_EDEFAULT);
				return;
			case TrimwrightPackage.UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT:
				setQuadraticGradientPercent(QUADRATIC_GRADIENT_PERCENT_EDEFAULT);
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
			case TrimwrightPackage.UNIT_ELEMENT__NOMINAL_VALUE:
				return nominalValue != NOMINAL_VALUE_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__MISMATCH_SPEC:
				return mismatchSpec != MISMATCH_SPEC_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__UNIT_SIGMA_PERCENT:
				return unitSigmaPercent != UNIT_SIGMA_PERCENT_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__PELGROM_PERCENT_UM:
				return pelgromPercentUm != PELGROM_PERCENT_UM_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__AREA_UM2:
				return areaUm2 != AREA_UM2_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__COEFFICIENT_FOR_PAIR:
				return coefficientForPair != COEFFICIENT_FOR_PAIR_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_PLACEMENT:
				return switchPlacement != SWITCH_PLACEMENT_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__SWITCH_SIGMA_PERCENT:
				return switchSigmaPercent != SWITCH_SIGMA_PERCENT_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT:
				return linearGradientPercent != LINEAR_GRADIENT_PERCENT_EDEFAULT;
			case TrimwrightPackage.UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT:
				return quadraticGradientPercent != QUADRATIC_GRADIENT_PERCENT_EDEFAULT;
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
		result.append(" (nominalValue: ");
		result.append(nominalValue);
		result.append(", mismatchSpec: ");
		result.append(mismatchSpec);
		result.append(", unitSigmaPercent: ");
		result.append(unitSigmaPercent);
		result.append(", pelgromPercentUm: ");
		result.append(pelgromPercentUm);
		result.append(", areaUm2: ");
		result.append(areaUm2);
		result.append(", coefficientForPair: ");
		result.append(coefficientForPair);
		result.append(", switchPlacement: ");
		result.append(switchPlacement);
		result.append(", switchSigmaPercent: ");
		result.append(switchSigmaPercent);
		result.append(", linearGradientPercent: ");
		result.append(linearGradientPercent);
		result.append(", quadraticGradientPercent: ");
		result.append(quadraticGradientPercent);
		result.append(')');
		return result.toString();
	}

} //UnitElementImpl
