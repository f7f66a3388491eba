/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Field</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A bit field of a register; trims carry an analog target, a coding, a unit element and limits.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.trimwright.model.Field#getName <em>Name</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getBitOffset <em>Bit Offset</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getWidth <em>Width</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getAccess <em>Access</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getResetCode <em>Reset Code</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getDescription <em>Description</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getRole <em>Role</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getProductionSearch <em>Production Search</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getStepping <em>Stepping</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getTarget <em>Target</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getCoding <em>Coding</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getElement <em>Element</em>}</li>
 *   <li>{@link org.trimwright.model.Field#getLimits <em>Limits</em>}</li>
 * </ul>
 *
 * @see org.trimwright.model.TrimwrightPackage#getField()
 * @model annotation="http://www.eclipse.org/emf/2002/Ecore constraints='bitsInsideRegister resetCodeInRange trimIsWritable analysable rangeCoversSpread stepMeetsAccuracy residualMeetsAccuracy monotonicRisk linearityYield selectCodesLegal glitchWithinLimit searchNeedsMonotonic codesInsideSafeLimits'"
 * @generated
 */
public interface Field extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Bit Offset</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Bit Offset</em>' attribute.
	 * @see #setBitOffset(int)
	 * @see org.trimwright.model.TrimwrightPackage#getField_BitOffset()
	 * @model
	 * @generated
	 */
	int getBitOffset();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getBitOffset <em>Bit Offset</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bit Offset</em>' attribute.
	 * @see #getBitOffset()
	 * @generated
	 */
	void setBitOffset(int value);

	/**
	 * Returns the value of the '<em><b>Width</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Width</em>' attribute.
	 * @see #setWidth(int)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Width()
	 * @model default="1"
	 * @generated
	 */
	int getWidth();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getWidth <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Width</em>' attribute.
	 * @see #getWidth()
	 * @generated
	 */
	void setWidth(int value);

	/**
	 * Returns the value of the '<em><b>Access</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.Access}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Access</em>' attribute.
	 * @see org.trimwright.model.Access
	 * @see #setAccess(Access)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Access()
	 * @model
	 * @generated
	 */
	Access getAccess();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getAccess <em>Access</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Access</em>' attribute.
	 * @see org.trimwright.model.Access
	 * @see #getAccess()
	 * @generated
	 */
	void setAccess(Access value);

	/**
	 * Returns the value of the '<em><b>Reset Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Reset Code</em>' attribute.
	 * @see #setResetCode(long)
	 * @see org.trimwright.model.TrimwrightPackage#getField_ResetCode()
	 * @model
	 * @generated
	 */
	long getResetCode();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getResetCode <em>Reset Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reset Code</em>' attribute.
	 * @see #getResetCode()
	 * @generated
	 */
	void setResetCode(long value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Role</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.FieldRole}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Role</em>' attribute.
	 * @see org.trimwright.model.FieldRole
	 * @see #setRole(FieldRole)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Role()
	 * @model
	 * @generated
	 */
	FieldRole getRole();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getRole <em>Role</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Role</em>' attribute.
	 * @see org.trimwright.model.FieldRole
	 * @see #getRole()
	 * @generated
	 */
	void setRole(FieldRole value);

	/**
	 * Returns the value of the '<em><b>Production Search</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.ProductionSearch}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Production Search</em>' attribute.
	 * @see org.trimwright.model.ProductionSearch
	 * @see #setProductionSearch(ProductionSearch)
	 * @see org.trimwright.model.TrimwrightPackage#getField_ProductionSearch()
	 * @model
	 * @generated
	 */
	ProductionSearch getProductionSearch();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getProductionSearch <em>Production Search</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Production Search</em>' attribute.
	 * @see org.trimwright.model.ProductionSearch
	 * @see #getProductionSearch()
	 * @generated
	 */
	void setProductionSearch(ProductionSearch value);

	/**
	 * Returns the value of the '<em><b>Stepping</b></em>' attribute.
	 * The literals are from the enumeration {@link org.trimwright.model.Stepping}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Stepping</em>' attribute.
	 * @see org.trimwright.model.Stepping
	 * @see #setStepping(Stepping)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Stepping()
	 * @model
	 * @generated
	 */
	Stepping getStepping();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getStepping <em>Stepping</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Stepping</em>' attribute.
	 * @see org.trimwright.model.Stepping
	 * @see #getStepping()
	 * @generated
	 */
	void setStepping(Stepping value);

	/**
	 * Returns the value of the '<em><b>Target</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Target</em>' containment reference.
	 * @see #setTarget(AnalogTarget)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Target()
	 * @model containment="true"
	 * @generated
	 */
	AnalogTarget getTarget();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getTarget <em>Target</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Target</em>' containment reference.
	 * @see #getTarget()
	 * @generated
	 */
	void setTarget(AnalogTarget value);

	/**
	 * Returns the value of the '<em><b>Coding</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Coding</em>' containment reference.
	 * @see #setCoding(Coding)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Coding()
	 * @model containment="true"
	 * @generated
	 */
	Coding getCoding();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getCoding <em>Coding</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Coding</em>' containment reference.
	 * @see #getCoding()
	 * @generated
	 */
	void setCoding(Coding value);

	/**
	 * Returns the value of the '<em><b>Element</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Element</em>' containment reference.
	 * @see #setElement(UnitElement)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Element()
	 * @model containment="true"
	 * @generated
	 */
	UnitElement getElement();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getElement <em>Element</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Element</em>' containment reference.
	 * @see #getElement()
	 * @generated
	 */
	void setElement(UnitElement value);

	/**
	 * Returns the value of the '<em><b>Limits</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Limits</em>' containment reference.
	 * @see #setLimits(Limits)
	 * @see org.trimwright.model.TrimwrightPackage#getField_Limits()
	 * @model containment="true"
	 * @generated
	 */
	Limits getLimits();

	/**
	 * Sets the value of the '{@link org.trimwright.model.Field#getLimits <em>Limits</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Limits</em>' containment reference.
	 * @see #getLimits()
	 * @generated
	 */
	void setLimits(Limits value);

} // Field
