/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.trimwright.model.Coding;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.SwitchPolarity;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.UnarySequence;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Coding</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.CodingImpl#getScheme <em>Scheme</em>}</li>
 *   <li>{@link org.trimwright.model.impl.CodingImpl#getUnaryBits <em>Unary Bits</em>}</li>
 *   <li>{@link org.trimwright.model.impl.CodingImpl#isZeroState <em>Zero State</em>}</li>
 *   <li>{@link org.trimwright.model.impl.CodingImpl#getPolarity <em>Polarity</em>}</li>
 *   <li>{@link org.trimwright.model.impl.CodingImpl#getSequence <em>Sequence</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CodingImpl extends MinimalEObjectImpl.Container implements Coding {
	/**
	 * The default value of the '{@link #getScheme() <em>Scheme</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScheme()
	 * @generated
	 * @ordered
	 */
	protected static final CodingScheme SCHEME_EDEFAULT = CodingScheme.BINARY;

	/**
	 * The cached value of the '{@link #getScheme() <em>Scheme</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScheme()
	 * @generated
	 * @ordered
	 */
	protected CodingScheme scheme = SCHEME_EDEFAULT;

	/**
	 * The default value of the '{@link #getUnaryBits() <em>Unary Bits</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnaryBits()
	 * @generated
	 * @ordered
	 */
	protected static final int UNARY_BITS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getUnaryBits() <em>Unary Bits</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnaryBits()
	 * @generated
	 * @ordered
	 */
	protected int unaryBits = UNARY_BITS_EDEFAULT;

	/**
	 * The default value of the '{@link #isZeroState() <em>Zero State</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isZeroState()
	 * @generated
	 * @ordered
	 */
	protected static final boolean ZERO_STATE_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isZeroState() <em>Zero State</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isZeroState()
	 * @generated
	 * @ordered
	 */
	protected boolean zeroState = ZERO_STATE_EDEFAULT;

	/**
	 * The default value of the '{@link #getPolarity() <em>Polarity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPolarity()
	 * @generated
	 * @ordered
	 */
	protected static final SwitchPolarity POLARITY_EDEFAULT = SwitchPolarity.ACTIVE_HIGH;

	/**
	 * The cached value of the '{@link #getPolarity() <em>Polarity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPolarity()
	 * @generated
	 * @ordered
	 */
	protected SwitchPolarity polarity = POLARITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getSequence() <em>Sequence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSequence()
	 * @generated
	 * @ordered
	 */
	protected static final UnarySequence SEQUENCE_EDEFAULT = UnarySequence.SEQUENTIAL;

	/**
	 * The cached value of the '{@link #getSequence() <em>Sequence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSequence()
	 * @generated
	 * @ordered
	 */
	protected UnarySequence sequence = SEQUENCE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CodingImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.CODING;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public CodingScheme getScheme() {
		return scheme;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setScheme(CodingScheme newScheme) {
		CodingScheme oldScheme = scheme;
		scheme = newScheme == null ? SCHEME_EDEFAULT : newScheme;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.CODING__SCHEME, oldScheme, scheme));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getUnaryBits() {
		return unaryBits;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnaryBits(int newUnaryBits) {
		int oldUnaryBits = unaryBits;
		unaryBits = newUnaryBits;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.CODING__UNARY_BITS, oldUnaryBits, unaryBits));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isZeroState() {
		return zeroState;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setZeroState(boolean newZeroState) {
		boolean oldZeroState = zeroState;
		zeroState = newZeroState;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.CODING__ZERO_STATE, oldZeroState, zeroState));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public SwitchPolarity getPolarity() {
		return polarity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPolarity(SwitchPolarity newPolarity) {
		SwitchPolarity oldPolarity = polarity;
		polarity = newPolarity == null ? POLARITY_EDEFAULT : newPolarity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.CODING__POLARITY, oldPolarity, polarity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UnarySequence getSequence() {
		return sequence;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSequence(UnarySequence newSequence) {
		UnarySequence oldSequence = sequence;
		sequence = newSequence == null ? SEQUENCE_EDEFAULT : newSequence;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.CODING__SEQUENCE, oldSequence, sequence));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.CODING__SCHEME:
				return getScheme();
			case TrimwrightPackage.CODING__UNARY_BITS:
				return getUnaryBits();
			case TrimwrightPackage.CODING__ZERO_STATE:
				return isZeroState();
			case TrimwrightPackage.CODING__POLARITY:
				return getPolarity();
			case TrimwrightPackage.CODING__SEQUENCE:
				return getSequence();
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
			case TrimwrightPackage.CODING__SCHEME:
				setScheme((CodingScheme)newValue);
				return;
			case TrimwrightPackage.CODING__UNARY_BITS:
				setUnaryBits((Integer)newValue);
				return;
			case TrimwrightPackage.CODING__ZERO_STATE:
				setZeroState((Boolean)newValue);
				return;
			case TrimwrightPackage.CODING__POLARITY:
				setPolarity((SwitchPolarity)newValue);
				return;
			case TrimwrightPackage.CODING__SEQUENCE:
				setSequence((UnarySequence)newValue);
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
			case TrimwrightPackage.CODING__SCHEME:
				setScheme(SCHEME_EDEFAULT);
				return;
			case TrimwrightPackage.CODING__UNARY_BITS:
				setUnaryBits(UNARY_BITS_EDEFAULT);
				return;
			case TrimwrightPackage.CODING__ZERO_STATE:
				setZeroState(ZERO_STATE_EDEFAULT);
				return;
			case TrimwrightPackage.CODING__POLARITY:
				setPolarity(POLARITY_EDEFAULT);
				return;
			case TrimwrightPackage.CODING__SEQUENCE:
				setSequence(SEQUENCE_EDEFAULT);
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
			case TrimwrightPackage.CODING__SCHEME:
				return scheme != SCHEME_EDEFAULT;
			case TrimwrightPackage.CODING__UNARY_BITS:
				return unaryBits != UNARY_BITS_EDEFAULT;
			case TrimwrightPackage.CODING__ZERO_STATE:
				return zeroState != ZERO_STATE_EDEFAULT;
			case TrimwrightPackage.CODING__POLARITY:
				return polarity != POLARITY_EDEFAULT;
			case TrimwrightPackage.CODING__SEQUENCE:
				return sequence != SEQUENCE_EDEFAULT;
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
		result.append(" (scheme: ");
		result.append(scheme);
		result.append(", unaryBits: ");
		result.append(unaryBits);
		result.append(", zeroState: ");
		result.append(zeroState);
		result.append(", polarity: ");
		result.append(polarity);
		result.append(", sequence: ");
		result.append(sequence);
		result.append(')');
		return result.toString();
	}

} //CodingImpl
