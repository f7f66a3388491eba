/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.trimwright.model.Access;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Coding;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.Limits;
import org.trimwright.model.ProductionSearch;
import org.trimwright.model.Stepping;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.UnitElement;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Field</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getBitOffset <em>Bit Offset</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getWidth <em>Width</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getAccess <em>Access</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getResetCode <em>Reset Code</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getRole <em>Role</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getProductionSearch <em>Production Search</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getStepping <em>Stepping</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getTarget <em>Target</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getCoding <em>Coding</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getElement <em>Element</em>}</li>
 *   <li>{@link org.trimwright.model.impl.FieldImpl#getLimits <em>Limits</em>}</li>
 * </ul>
 *
 * @generated
 */
public class FieldImpl extends MinimalEObjectImpl.Container implements Field {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getBitOffset() <em>Bit Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBitOffset()
	 * @generated
	 * @ordered
	 */
	protected static final int BIT_OFFSET_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getBitOffset() <em>Bit Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBitOffset()
	 * @generated
	 * @ordered
	 */
	protected int bitOffset = BIT_OFFSET_EDEFAULT;

	/**
	 * The default value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected static final int WIDTH_EDEFAULT = 1;

	/**
	 * The cached value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected int width = WIDTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getAccess() <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccess()
	 * @generated
	 * @ordered
	 */
	protected static final Access ACCESS_EDEFAULT = Access.READ_WRITE;

	/**
	 * The cached value of the '{@link #getAccess() <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccess()
	 * @generated
	 * @ordered
	 */
	protected Access access = ACCESS_EDEFAULT;

	/**
	 * The default value of the '{@link #getResetCode() <em>Reset Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResetCode()
	 * @generated
	 * @ordered
	 */
	protected static final long RESET_CODE_EDEFAULT = 0L;

	/**
	 * The cached value of the '{@link #getResetCode() <em>Reset Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getResetCode()
	 * @generated
	 * @ordered
	 */
	protected long resetCode = RESET_CODE_EDEFAULT;

	/**
	 * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected static final String DESCRIPTION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected String description = DESCRIPTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getRole() <em>Role</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRole()
	 * @generated
	 * @ordered
	 */
	protected static final FieldRole ROLE_EDEFAULT = FieldRole.TRIM;

	/**
	 * The cached value of the '{@link #getRole() <em>Role</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRole()
	 * @generated
	 * @ordered
	 */
	protected FieldRole role = ROLE_EDEFAULT;

	/**
	 * The default value of the '{@link #getProductionSearch() <em>Production Search</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProductionSearch()
	 * @generated
	 * @ordered
	 */
	protected static final ProductionSearch PRODUCTION_SEARCH_EDEFAULT = ProductionSearch.BINARY_SEARCH;

	/**
	 * The cached value of the '{@link #getProductionSearch() <em>Production Search</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProductionSearch()
	 * @generated
	 * @ordered
	 */
	protected ProductionSearch productionSearch = PRODUCTION_SEARCH_EDEFAULT;

	/**
	 * The default value of the '{@link #getStepping() <em>Stepping</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStepping()
	 * @generated
	 * @ordered
	 */
	protected static final Stepping STEPPING_EDEFAULT = Stepping.DIRECT;

	/**
	 * The cached value of the '{@link #getStepping() <em>Stepping</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStepping()
	 * @generated
	 * @ordered
	 */
	protected Stepping stepping = STEPPING_EDEFAULT;

	/**
	 * The cached value of the '{@link #getTarget() <em>Target</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTarget()
	 * @generated
	 * @ordered
	 */
	protected AnalogTarget target;

	/**
	 * The cached value of the '{@link #getCoding() <em>Coding</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCoding()
	 * @generated
	 * @ordered
	 */
	protected Coding coding;

	/**
	 * The cached value of the '{@link #getElement() <em>Element</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getElement()
	 * @generated
	 * @ordered
	 */
	protected UnitElement element;

	/**
	 * The cached value of the '{@link #getLimits() <em>Limits</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLimits()
	 * @generated
	 * @ordered
	 */
	protected Limits limits;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected FieldImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TrimwrightPackage.Literals.FIELD;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getBitOffset() {
		return bitOffset;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBitOffset(int newBitOffset) {
		int oldBitOffset = bitOffset;
		bitOffset = newBitOffset;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__BIT_OFFSET, oldBitOffset, bitOffset));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getWidth() {
		return width;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWidth(int newWidth) {
		int oldWidth = width;
		width = newWidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__WIDTH, oldWidth, width));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Access getAccess() {
		return access;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAccess(Access newAccess) {
		Access oldAccess = access;
		access = newAccess == null ? ACCESS_EDEFAULT : newAccess;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__ACCESS, oldAccess, access));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getResetCode() {
		return resetCode;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setResetCode(long newResetCode) {
		long oldResetCode = resetCode;
		resetCode = newResetCode;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__RESET_CODE, oldResetCode, resetCode));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDescription() {
		return description;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDescription(String newDescription) {
		String oldDescription = description;
		description = newDescription;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__DESCRIPTION, oldDescription, description));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public FieldRole getRole() {
		return role;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRole(FieldRole newRole) {
		FieldRole oldRole = role;
		role = newRole == null ? ROLE_EDEFAULT : newRole;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__ROLE, oldRole, role));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ProductionSearch getProductionSearch() {
		return productionSearch;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProductionSearch(ProductionSearch newProductionSearch) {
		ProductionSearch oldProductionSearch = productionSearch;
		productionSearch = newProductionSearch == null ? PRODUCTION_SEARCH_EDEFAULT : newProductionSearch;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__PRODUCTION_SEARCH, oldProductionSearch, productionSearch));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Stepping getStepping() {
		return stepping;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStepping(Stepping newStepping) {
		Stepping oldStepping = stepping;
		stepping = newStepping == null ? STEPPING_EDEFAULT : newStepping;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__STEPPING, oldStepping, stepping));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public AnalogTarget getTarget() {
		return target;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetTarget(AnalogTarget newTarget, NotificationChain msgs) {
		AnalogTarget oldTarget = target;
		target = newTarget;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__TARGET, oldTarget, newTarget);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTarget(AnalogTarget newTarget) {
		if (newTarget != target) {
			NotificationChain msgs = null;
			if (target != null)
				msgs = ((InternalEObject)target).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__TARGET, null, msgs);
			if (newTarget != null)
				msgs = ((InternalEObject)newTarget).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__TARGET, null, msgs);
			msgs = basicSetTarget(newTarget, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__TARGET, newTarget, newTarget));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Coding getCoding() {
		return coding;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetCoding(Coding newCoding, NotificationChain msgs) {
		Coding oldCoding = coding;
		coding = newCoding;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__CODING, oldCoding, newCoding);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCoding(Coding newCoding) {
		if (newCoding != coding) {
			NotificationChain msgs = null;
			if (coding != null)
				msgs = ((InternalEObject)coding).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__CODING, null, msgs);
			if (newCoding != null)
				msgs = ((InternalEObject)newCoding).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__CODING, null, msgs);
			msgs = basicSetCoding(newCoding, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__CODING, newCoding, newCoding));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UnitElement getElement() {
		return element;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetElement(UnitElement newElement, NotificationChain msgs) {
		UnitElement oldElement = element;
		element = newElement;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__ELEMENT, oldElement, newElement);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setElement(UnitElement newElement) {
		if (newElement != element) {
			NotificationChain msgs = null;
			if (element != null)
				msgs = ((InternalEObject)element).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__ELEMENT, null, msgs);
			if (newElement != null)
				msgs = ((InternalEObject)newElement).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__ELEMENT, null, msgs);
			msgs = basicSetElement(newElement, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__ELEMENT, newElement, newElement));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Limits getLimits() {
		return limits;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetLimits(Limits newLimits, NotificationChain msgs) {
		Limits oldLimits = limits;
		limits = newLimits;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__LIMITS, oldLimits, newLimits);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLimits(Limits newLimits) {
		if (newLimits != limits) {
			NotificationChain msgs = null;
			if (limits != null)
				msgs = ((InternalEObject)limits).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__LIMITS, null, msgs);
			if (newLimits != null)
				msgs = ((InternalEObject)newLimits).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TrimwrightPackage.FIELD__LIMITS, null, msgs);
			msgs = basicSetLimits(newLimits, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TrimwrightPackage.FIELD__LIMITS, newLimits, newLimits));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TrimwrightPackage.FIELD__TARGET:
				return basicSetTarget(null, msgs);
			case TrimwrightPackage.FIELD__CODING:
				return basicSetCoding(null, msgs);
			case TrimwrightPackage.FIELD__ELEMENT:
				return basicSetElement(null, msgs);
			case TrimwrightPackage.FIELD__LIMITS:
				return basicSetLimits(null, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TrimwrightPackage.FIELD__NAME:
				return getName();
			case TrimwrightPackage.FIELD__BIT_OFFSET:
				return getBitOffset();
			case TrimwrightPackage.FIELD__WIDTH:
				return getWidth();
			case TrimwrightPackage.FIELD__ACCESS:
				return getAccess();
			case TrimwrightPackage.FIELD__RESET_CODE:
				return getResetCode();
			case TrimwrightPackage.FIELD__DESCRIPTION:
				return getDescription();
			case TrimwrightPackage.FIELD__ROLE:
				return getRole();
			case TrimwrightPackage.FIELD__PRODUCTION_SEARCH:
				return getProductionSearch();
			case TrimwrightPackage.FIELD__STEPPING:
				return getStepping();
			case TrimwrightPackage.FIELD__TARGET:
				return getTarget();
			case TrimwrightPackage.FIELD__CODING:
				return getCoding();
			case TrimwrightPackage.FIELD__ELEMENT:
				return getElement();
			case TrimwrightPackage.FIELD__LIMITS:
				return getLimits();
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
			case TrimwrightPackage.FIELD__NAME:
				setName((String)newValue);
				return;
			case TrimwrightPackage.FIELD__BIT_OFFSET:
				setBitOffset((Integer)newValue);
				return;
			case TrimwrightPackage.FIELD__WIDTH:
				setWidth((Integer)newValue);
				return;
			case TrimwrightPackage.FIELD__ACCESS:
				setAccess((Access)newValue);
				return;
			case TrimwrightPackage.FIELD__RESET_CODE:
				setResetCode((Long)newValue);
				return;
			case TrimwrightPackage.FIELD__DESCRIPTION:
				setDescription((String)newValue);
				return;
			case TrimwrightPackage.FIELD__ROLE:
				setRole((FieldRole)newValue);
				return;
			case TrimwrightPackage.FIELD__PRODUCTION_SEARCH:
				setProductionSearch((ProductionSearch)newValue);
				return;
			case TrimwrightPackage.FIELD__STEPPING:
				setStepping((Stepping)newValue);
				return;
			case TrimwrightPackage.FIELD__TARGET:
				setTarget((AnalogTarget)newValue);
				return;
			case TrimwrightPackage.FIELD__CODING:
				setCoding((Coding)newValue);
				return;
			case TrimwrightPackage.FIELD__ELEMENT:
				setElement((UnitElement)newValue);
				return;
			case TrimwrightPackage.FIELD__LIMITS:
				setLimits((Limits)newValue);
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
			case TrimwrightPackage.FIELD__NAME:
				setName(NAME_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__BIT_OFFSET:
				setBitOffset(BIT_OFFSET_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__WIDTH:
				setWidth(WIDTH_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__ACCESS:
				setAccess(ACCESS_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__RESET_CODE:
				setResetCode(RESET_CODE_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__DESCRIPTION:
				setDescription(DESCRIPTION_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__ROLE:
				setRole(ROLE_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__PRODUCTION_SEARCH:
				setProductionSearch(PRODUCTION_SEARCH_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__STEPPING:
				setStepping(STEPPING_EDEFAULT);
				return;
			case TrimwrightPackage.FIELD__TARGET:
				setTarget((AnalogTarget)null);
				return;
			case TrimwrightPackage.FIELD__CODING:
				setCoding((Coding)null);
				return;
			case TrimwrightPackage.FIELD__ELEMENT:
				setElement((UnitElement)null);
				return;
			case TrimwrightPackage.FIELD__LIMITS:
				setLimits((Limits)null);
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
			case TrimwrightPackage.FIELD__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case TrimwrightPackage.FIELD__BIT_OFFSET:
				return bitOffset != BIT_OFFSET_EDEFAULT;
			case TrimwrightPackage.FIELD__WIDTH:
				return width != WIDTH_EDEFAULT;
			case TrimwrightPackage.FIELD__ACCESS:
				return access != ACCESS_EDEFAULT;
			case TrimwrightPackage.FIELD__RESET_CODE:
				return resetCode != RESET_CODE_EDEFAULT;
			case TrimwrightPackage.FIELD__DESCRIPTION:
				return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
			case TrimwrightPackage.FIELD__ROLE:
				return role != ROLE_EDEFAULT;
			case TrimwrightPackage.FIELD__PRODUCTION_SEARCH:
				return productionSearch != PRODUCTION_SEARCH_EDEFAULT;
			case TrimwrightPackage.FIELD__STEPPING:
				return stepping != STEPPING_EDEFAULT;
			case TrimwrightPackage.FIELD__TARGET:
				return target != null;
			case TrimwrightPackage.FIELD__CODING:
				return coding != null;
			case TrimwrightPackage.FIELD__ELEMENT:
				return element != null;
			case TrimwrightPackage.FIELD__LIMITS:
				return limits != null;
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
		result.append(" (name: ");
		result.append(name);
		result.append(", bitOffset: ");
		result.append(bitOffset);
		result.append(", width: ");
		result.append(width);
		result.append(", access: ");
		result.append(access);
		result.append(", resetCode: ");
		result.append(resetCode);
		result.append(", description: ");
		result.append(description);
		result.append(", role: ");
		result.append(role);
		result.append(", productionSearch: ");
		result.append(productionSearch);
		result.append(", stepping: ");
		result.append(stepping);
		result.append(')');
		return result.toString();
	}

} //FieldImpl
