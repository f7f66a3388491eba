/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each operation of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightFactory
 * @model kind="package"
 * @generated
 */
public interface TrimwrightPackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "model";

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "http://trimwright.org/spec/1.0";

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "tw";

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	TrimwrightPackage eINSTANCE = org.trimwright.model.impl.TrimwrightPackageImpl.init();

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.ChipSpecImpl <em>Chip Spec</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.ChipSpecImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getChipSpec()
	 * @generated
	 */
	int CHIP_SPEC = 0;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC__NAME = 0;

	/**
	 * The feature id for the '<em><b>Revision</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC__REVISION = 1;

	/**
	 * The feature id for the '<em><b>Author</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC__AUTHOR = 2;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC__DESCRIPTION = 3;

	/**
	 * The feature id for the '<em><b>Blocks</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC__BLOCKS = 4;

	/**
	 * The number of structural features of the '<em>Chip Spec</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Chip Spec</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CHIP_SPEC_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.BlockImpl <em>Block</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.BlockImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getBlock()
	 * @generated
	 */
	int BLOCK = 1;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK__NAME = 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK__DESCRIPTION = 1;

	/**
	 * The feature id for the '<em><b>Base Address</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK__BASE_ADDRESS = 2;

	/**
	 * The feature id for the '<em><b>Registers</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK__REGISTERS = 3;

	/**
	 * The number of structural features of the '<em>Block</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK_FEATURE_COUNT = 4;

	/**
	 * The number of operations of the '<em>Block</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BLOCK_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.RegisterImpl <em>Register</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.RegisterImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getRegister()
	 * @generated
	 */
	int REGISTER = 2;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__NAME = 0;

	/**
	 * The feature id for the '<em><b>Address Offset</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__ADDRESS_OFFSET = 1;

	/**
	 * The feature id for the '<em><b>Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__WIDTH = 2;

	/**
	 * The feature id for the '<em><b>Access</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__ACCESS = 3;

	/**
	 * The feature id for the '<em><b>Reset Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__RESET_VALUE = 4;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__DESCRIPTION = 5;

	/**
	 * The feature id for the '<em><b>Fields</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER__FIELDS = 6;

	/**
	 * The number of structural features of the '<em>Register</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Register</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REGISTER_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.FieldImpl <em>Field</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.FieldImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getField()
	 * @generated
	 */
	int FIELD = 3;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__NAME = 0;

	/**
	 * The feature id for the '<em><b>Bit Offset</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__BIT_OFFSET = 1;

	/**
	 * The feature id for the '<em><b>Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__WIDTH = 2;

	/**
	 * The feature id for the '<em><b>Access</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__ACCESS = 3;

	/**
	 * The feature id for the '<em><b>Reset Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__RESET_CODE = 4;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__DESCRIPTION = 5;

	/**
	 * The feature id for the '<em><b>Role</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__ROLE = 6;

	/**
	 * The feature id for the '<em><b>Production Search</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__PRODUCTION_SEARCH = 7;

	/**
	 * The feature id for the '<em><b>Stepping</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__STEPPING = 8;

	/**
	 * The feature id for the '<em><b>Target</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__TARGET = 9;

	/**
	 * The feature id for the '<em><b>Coding</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__CODING = 10;

	/**
	 * The feature id for the '<em><b>Element</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__ELEMENT = 11;

	/**
	 * The feature id for the '<em><b>Limits</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD__LIMITS = 12;

	/**
	 * The number of structural features of the '<em>Field</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD_FEATURE_COUNT = 13;

	/**
	 * The number of operations of the '<em>Field</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FIELD_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.AnalogTargetImpl <em>Analog Target</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.AnalogTargetImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getAnalogTarget()
	 * @generated
	 */
	int ANALOG_TARGET = 4;

	/**
	 * The feature id for the '<em><b>Quantity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__QUANTITY = 0;

	/**
	 * The feature id for the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__UNIT = 1;

	/**
	 * The feature id for the '<em><b>Value At Zero</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__VALUE_AT_ZERO = 2;

	/**
	 * The feature id for the '<em><b>Step</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__STEP = 3;

	/**
	 * The feature id for the '<em><b>Signed Format</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__SIGNED_FORMAT = 4;

	/**
	 * The feature id for the '<em><b>Target Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__TARGET_VALUE = 5;

	/**
	 * The feature id for the '<em><b>Spread Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__SPREAD_MIN = 6;

	/**
	 * The feature id for the '<em><b>Spread Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__SPREAD_MAX = 7;

	/**
	 * The feature id for the '<em><b>Accuracy</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__ACCURACY = 8;

	/**
	 * The feature id for the '<em><b>Safe Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__SAFE_MIN = 9;

	/**
	 * The feature id for the '<em><b>Safe Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET__SAFE_MAX = 10;

	/**
	 * The number of structural features of the '<em>Analog Target</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET_FEATURE_COUNT = 11;

	/**
	 * The number of operations of the '<em>Analog Target</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ANALOG_TARGET_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.CodingImpl <em>Coding</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.CodingImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getCoding()
	 * @generated
	 */
	int CODING = 5;

	/**
	 * The feature id for the '<em><b>Scheme</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING__SCHEME = 0;

	/**
	 * The feature id for the '<em><b>Unary Bits</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING__UNARY_BITS = 1;

	/**
	 * The feature id for the '<em><b>Zero State</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING__ZERO_STATE = 2;

	/**
	 * The feature id for the '<em><b>Polarity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING__POLARITY = 3;

	/**
	 * The feature id for the '<em><b>Sequence</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING__SEQUENCE = 4;

	/**
	 * The number of structural features of the '<em>Coding</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING_FEATURE_COUNT = 5;

	/**
	 * The number of operations of the '<em>Coding</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CODING_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.UnitElementImpl <em>Unit Element</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.UnitElementImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getUnitElement()
	 * @generated
	 */
	int UNIT_ELEMENT = 6;

	/**
	 * The feature id for the '<em><b>Nominal Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__NOMINAL_VALUE = 0;

	/**
	 * The feature id for the '<em><b>Mismatch Spec</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__MISMATCH_SPEC = 1;

	/**
	 * The feature id for the '<em><b>Unit Sigma Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__UNIT_SIGMA_PERCENT = 2;

	/**
	 * The feature id for the '<em><b>Pelgrom Percent Um</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__PELGROM_PERCENT_UM = 3;

	/**
	 * The feature id for the '<em><b>Area Um2</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__AREA_UM2 = 4;

	/**
	 * The feature id for the '<em><b>Coefficient For Pair</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__COEFFICIENT_FOR_PAIR = 5;

	/**
	 * The feature id for the '<em><b>Switch Placement</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__SWITCH_PLACEMENT = 6;

	/**
	 * The feature id for the '<em><b>Switch Sigma Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__SWITCH_SIGMA_PERCENT = 7;

	/**
	 * The feature id for the '<em><b>Linear Gradient Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT = 8;

	/**
	 * The feature id for the '<em><b>Quadratic Gradient Percent</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT = 9;

	/**
	 * The number of structural features of the '<em>Unit Element</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT_FEATURE_COUNT = 10;

	/**
	 * The number of operations of the '<em>Unit Element</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int UNIT_ELEMENT_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.impl.LimitsImpl <em>Limits</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.impl.LimitsImpl
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getLimits()
	 * @generated
	 */
	int LIMITS = 7;

	/**
	 * The feature id for the '<em><b>Must Be Monotonic</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__MUST_BE_MONOTONIC = 0;

	/**
	 * The feature id for the '<em><b>Max Non Monotonic Risk</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__MAX_NON_MONOTONIC_RISK = 1;

	/**
	 * The feature id for the '<em><b>Max Dnl Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__MAX_DNL_LSB = 2;

	/**
	 * The feature id for the '<em><b>Max Inl Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__MAX_INL_LSB = 3;

	/**
	 * The feature id for the '<em><b>Inl Definition</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__INL_DEFINITION = 4;

	/**
	 * The feature id for the '<em><b>Target Yield</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__TARGET_YIELD = 5;

	/**
	 * The feature id for the '<em><b>Max Glitch Lsb</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS__MAX_GLITCH_LSB = 6;

	/**
	 * The number of structural features of the '<em>Limits</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS_FEATURE_COUNT = 7;

	/**
	 * The number of operations of the '<em>Limits</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LIMITS_OPERATION_COUNT = 0;

	/**
	 * The meta object id for the '{@link org.trimwright.model.Access <em>Access</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.Access
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getAccess()
	 * @generated
	 */
	int ACCESS = 8;

	/**
	 * The meta object id for the '{@link org.trimwright.model.FieldRole <em>Field Role</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.FieldRole
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getFieldRole()
	 * @generated
	 */
	int FIELD_ROLE = 9;

	/**
	 * The meta object id for the '{@link org.trimwright.model.Quantity <em>Quantity</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.Quantity
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getQuantity()
	 * @generated
	 */
	int QUANTITY = 10;

	/**
	 * The meta object id for the '{@link org.trimwright.model.SignedFormat <em>Signed Format</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.SignedFormat
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSignedFormat()
	 * @generated
	 */
	int SIGNED_FORMAT = 11;

	/**
	 * The meta object id for the '{@link org.trimwright.model.CodingScheme <em>Coding Scheme</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.CodingScheme
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getCodingScheme()
	 * @generated
	 */
	int CODING_SCHEME = 12;

	/**
	 * The meta object id for the '{@link org.trimwright.model.SwitchPolarity <em>Switch Polarity</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.SwitchPolarity
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSwitchPolarity()
	 * @generated
	 */
	int SWITCH_POLARITY = 13;

	/**
	 * The meta object id for the '{@link org.trimwright.model.UnarySequence <em>Unary Sequence</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.UnarySequence
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getUnarySequence()
	 * @generated
	 */
	int UNARY_SEQUENCE = 14;

	/**
	 * The meta object id for the '{@link org.trimwright.model.MismatchSpec <em>Mismatch Spec</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.MismatchSpec
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getMismatchSpec()
	 * @generated
	 */
	int MISMATCH_SPEC = 15;

	/**
	 * The meta object id for the '{@link org.trimwright.model.SwitchPlacement <em>Switch Placement</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.SwitchPlacement
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSwitchPlacement()
	 * @generated
	 */
	int SWITCH_PLACEMENT = 16;

	/**
	 * The meta object id for the '{@link org.trimwright.model.InlDefinition <em>Inl Definition</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.InlDefinition
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getInlDefinition()
	 * @generated
	 */
	int INL_DEFINITION = 17;

	/**
	 * The meta object id for the '{@link org.trimwright.model.ProductionSearch <em>Production Search</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.ProductionSearch
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getProductionSearch()
	 * @generated
	 */
	int PRODUCTION_SEARCH = 18;

	/**
	 * The meta object id for the '{@link org.trimwright.model.Stepping <em>Stepping</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.trimwright.model.Stepping
	 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getStepping()
	 * @generated
	 */
	int STEPPING = 19;


	/**
	 * Returns the meta object for class '{@link org.trimwright.model.ChipSpec <em>Chip Spec</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Chip Spec</em>'.
	 * @see org.trimwright.model.ChipSpec
	 * @generated
	 */
	EClass getChipSpec();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.ChipSpec#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.trimwright.model.ChipSpec#getName()
	 * @see #getChipSpec()
	 * @generated
	 */
	EAttribute getChipSpec_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.ChipSpec#getRevision <em>Revision</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Revision</em>'.
	 * @see org.trimwright.model.ChipSpec#getRevision()
	 * @see #getChipSpec()
	 * @generated
	 */
	EAttribute getChipSpec_Revision();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.ChipSpec#getAuthor <em>Author</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Author</em>'.
	 * @see org.trimwright.model.ChipSpec#getAuthor()
	 * @see #getChipSpec()
	 * @generated
	 */
	EAttribute getChipSpec_Author();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.ChipSpec#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.trimwright.model.ChipSpec#getDescription()
	 * @see #getChipSpec()
	 * @generated
	 */
	EAttribute getChipSpec_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link org.trimwright.model.ChipSpec#getBlocks <em>Blocks</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Blocks</em>'.
	 * @see org.trimwright.model.ChipSpec#getBlocks()
	 * @see #getChipSpec()
	 * @generated
	 */
	EReference getChipSpec_Blocks();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.Block <em>Block</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Block</em>'.
	 * @see org.trimwright.model.Block
	 * @generated
	 */
	EClass getBlock();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Block#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.trimwright.model.Block#getName()
	 * @see #getBlock()
	 * @generated
	 */
	EAttribute getBlock_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Block#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.trimwright.model.Block#getDescription()
	 * @see #getBlock()
	 * @generated
	 */
	EAttribute getBlock_Description();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Block#getBaseAddress <em>Base Address</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Base Address</em>'.
	 * @see org.trimwright.model.Block#getBaseAddress()
	 * @see #getBlock()
	 * @generated
	 */
	EAttribute getBlock_BaseAddress();

	/**
	 * Returns the meta object for the containment reference list '{@link org.trimwright.model.Block#getRegisters <em>Registers</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Registers</em>'.
	 * @see org.trimwright.model.Block#getRegisters()
	 * @see #getBlock()
	 * @generated
	 */
	EReference getBlock_Registers();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.Register <em>Register</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Register</em>'.
	 * @see org.trimwright.model.Register
	 * @generated
	 */
	EClass getRegister();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.trimwright.model.Register#getName()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getAddressOffset <em>Address Offset</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Address Offset</em>'.
	 * @see org.trimwright.model.Register#getAddressOffset()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_AddressOffset();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getWidth <em>Width</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Width</em>'.
	 * @see org.trimwright.model.Register#getWidth()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_Width();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getAccess <em>Access</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Access</em>'.
	 * @see org.trimwright.model.Register#getAccess()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_Access();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getResetValue <em>Reset Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reset Value</em>'.
	 * @see org.trimwright.model.Register#getResetValue()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_ResetValue();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Register#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.trimwright.model.Register#getDescription()
	 * @see #getRegister()
	 * @generated
	 */
	EAttribute getRegister_Description();

	/**
	 * Returns the meta object for the containment reference list '{@link org.trimwright.model.Register#getFields <em>Fields</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Fields</em>'.
	 * @see org.trimwright.model.Register#getFields()
	 * @see #getRegister()
	 * @generated
	 */
	EReference getRegister_Fields();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.Field <em>Field</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Field</em>'.
	 * @see org.trimwright.model.Field
	 * @generated
	 */
	EClass getField();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.trimwright.model.Field#getName()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getBitOffset <em>Bit Offset</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bit Offset</em>'.
	 * @see org.trimwright.model.Field#getBitOffset()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_BitOffset();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getWidth <em>Width</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Width</em>'.
	 * @see org.trimwright.model.Field#getWidth()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Width();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getAccess <em>Access</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Access</em>'.
	 * @see org.trimwright.model.Field#getAccess()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Access();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getResetCode <em>Reset Code</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Reset Code</em>'.
	 * @see org.trimwright.model.Field#getResetCode()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_ResetCode();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.trimwright.model.Field#getDescription()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Description();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getRole <em>Role</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Role</em>'.
	 * @see org.trimwright.model.Field#getRole()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Role();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getProductionSearch <em>Production Search</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Production Search</em>'.
	 * @see org.trimwright.model.Field#getProductionSearch()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_ProductionSearch();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Field#getStepping <em>Stepping</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Stepping</em>'.
	 * @see org.trimwright.model.Field#getStepping()
	 * @see #getField()
	 * @generated
	 */
	EAttribute getField_Stepping();

	/**
	 * Returns the meta object for the containment reference '{@link org.trimwright.model.Field#getTarget <em>Target</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Target</em>'.
	 * @see org.trimwright.model.Field#getTarget()
	 * @see #getField()
	 * @generated
	 */
	EReference getField_Target();

	/**
	 * Returns the meta object for the containment reference '{@link org.trimwright.model.Field#getCoding <em>Coding</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Coding</em>'.
	 * @see org.trimwright.model.Field#getCoding()
	 * @see #getField()
	 * @generated
	 */
	EReference getField_Coding();

	/**
	 * Returns the meta object for the containment reference '{@link org.trimwright.model.Field#getElement <em>Element</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Element</em>'.
	 * @see org.trimwright.model.Field#getElement()
	 * @see #getField()
	 * @generated
	 */
	EReference getField_Element();

	/**
	 * Returns the meta object for the containment reference '{@link org.trimwright.model.Field#getLimits <em>Limits</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Limits</em>'.
	 * @see org.trimwright.model.Field#getLimits()
	 * @see #getField()
	 * @generated
	 */
	EReference getField_Limits();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.AnalogTarget <em>Analog Target</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Analog Target</em>'.
	 * @see org.trimwright.model.AnalogTarget
	 * @generated
	 */
	EClass getAnalogTarget();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getQuantity <em>Quantity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Quantity</em>'.
	 * @see org.trimwright.model.AnalogTarget#getQuantity()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_Quantity();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getUnit <em>Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit</em>'.
	 * @see org.trimwright.model.AnalogTarget#getUnit()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_Unit();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getValueAtZero <em>Value At Zero</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Value At Zero</em>'.
	 * @see org.trimwright.model.AnalogTarget#getValueAtZero()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_ValueAtZero();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getStep <em>Step</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Step</em>'.
	 * @see org.trimwright.model.AnalogTarget#getStep()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_Step();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getSignedFormat <em>Signed Format</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Signed Format</em>'.
	 * @see org.trimwright.model.AnalogTarget#getSignedFormat()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_SignedFormat();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getTargetValue <em>Target Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Target Value</em>'.
	 * @see org.trimwright.model.AnalogTarget#getTargetValue()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_TargetValue();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getSpreadMin <em>Spread Min</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spread Min</em>'.
	 * @see org.trimwright.model.AnalogTarget#getSpreadMin()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_SpreadMin();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getSpreadMax <em>Spread Max</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Spread Max</em>'.
	 * @see org.trimwright.model.AnalogTarget#getSpreadMax()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_SpreadMax();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getAccuracy <em>Accuracy</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Accuracy</em>'.
	 * @see org.trimwright.model.AnalogTarget#getAccuracy()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_Accuracy();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getSafeMin <em>Safe Min</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Safe Min</em>'.
	 * @see org.trimwright.model.AnalogTarget#getSafeMin()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_SafeMin();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.AnalogTarget#getSafeMax <em>Safe Max</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Safe Max</em>'.
	 * @see org.trimwright.model.AnalogTarget#getSafeMax()
	 * @see #getAnalogTarget()
	 * @generated
	 */
	EAttribute getAnalogTarget_SafeMax();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.Coding <em>Coding</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Coding</em>'.
	 * @see org.trimwright.model.Coding
	 * @generated
	 */
	EClass getCoding();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Coding#getScheme <em>Scheme</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Scheme</em>'.
	 * @see org.trimwright.model.Coding#getScheme()
	 * @see #getCoding()
	 * @generated
	 */
	EAttribute getCoding_Scheme();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Coding#getUnaryBits <em>Unary Bits</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unary Bits</em>'.
	 * @see org.trimwright.model.Coding#getUnaryBits()
	 * @see #getCoding()
	 * @generated
	 */
	EAttribute getCoding_UnaryBits();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Coding#isZeroState <em>Zero State</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Zero State</em>'.
	 * @see org.trimwright.model.Coding#isZeroState()
	 * @see #getCoding()
	 * @generated
	 */
	EAttribute getCoding_ZeroState();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Coding#getPolarity <em>Polarity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Polarity</em>'.
	 * @see org.trimwright.model.Coding#getPolarity()
	 * @see #getCoding()
	 * @generated
	 */
	EAttribute getCoding_Polarity();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Coding#getSequence <em>Sequence</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sequence</em>'.
	 * @see org.trimwright.model.Coding#getSequence()
	 * @see #getCoding()
	 * @generated
	 */
	EAttribute getCoding_Sequence();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.UnitElement <em>Unit Element</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Unit Element</em>'.
	 * @see org.trimwright.model.UnitElement
	 * @generated
	 */
	EClass getUnitElement();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getNominalValue <em>Nominal Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nominal Value</em>'.
	 * @see org.trimwright.model.UnitElement#getNominalValue()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_NominalValue();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getMismatchSpec <em>Mismatch Spec</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Mismatch Spec</em>'.
	 * @see org.trimwright.model.UnitElement#getMismatchSpec()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_MismatchSpec();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getUnitSigmaPercent <em>Unit Sigma Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Unit Sigma Percent</em>'.
	 * @see org.trimwright.model.UnitElement#getUnitSigmaPercent()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_UnitSigmaPercent();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getPelgromPercentUm <em>Pelgrom Percent Um</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pelgrom Percent Um</em>'.
	 * @see org.trimwright.model.UnitElement#getPelgromPercentUm()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_PelgromPercentUm();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getAreaUm2 <em>Area Um2</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Area Um2</em>'.
	 * @see org.trimwright.model.UnitElement#getAreaUm2()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_AreaUm2();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#isCoefficientForPair <em>Coefficient For Pair</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Coefficient For Pair</em>'.
	 * @see org.trimwright.model.UnitElement#isCoefficientForPair()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_CoefficientForPair();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getSwitchPlacement <em>Switch Placement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Switch Placement</em>'.
	 * @see org.trimwright.model.UnitElement#getSwitchPlacement()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_SwitchPlacement();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getSwitchSigmaPercent <em>Switch Sigma Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Switch Sigma Percent</em>'.
	 * @see org.trimwright.model.UnitElement#getSwitchSigmaPercent()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_SwitchSigmaPercent();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getLinearGradientPercent <em>Linear Gradient Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Linear Gradient Percent</em>'.
	 * @see org.trimwright.model.UnitElement#getLinearGradientPercent()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_LinearGradientPercent();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.UnitElement#getQuadraticGradientPercent <em>Quadratic Gradient Percent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Quadratic Gradient Percent</em>'.
	 * @see org.trimwright.model.UnitElement#getQuadraticGradientPercent()
	 * @see #getUnitElement()
	 * @generated
	 */
	EAttribute getUnitElement_QuadraticGradientPercent();

	/**
	 * Returns the meta object for class '{@link org.trimwright.model.Limits <em>Limits</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Limits</em>'.
	 * @see org.trimwright.model.Limits
	 * @generated
	 */
	EClass getLimits();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#isMustBeMonotonic <em>Must Be Monotonic</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Must Be Monotonic</em>'.
	 * @see org.trimwright.model.Limits#isMustBeMonotonic()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_MustBeMonotonic();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getMaxNonMonotonicRisk <em>Max Non Monotonic Risk</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Non Monotonic Risk</em>'.
	 * @see org.trimwright.model.Limits#getMaxNonMonotonicRisk()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_MaxNonMonotonicRisk();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getMaxDnlLsb <em>Max Dnl Lsb</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Dnl Lsb</em>'.
	 * @see org.trimwright.model.Limits#getMaxDnlLsb()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_MaxDnlLsb();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getMaxInlLsb <em>Max Inl Lsb</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Inl Lsb</em>'.
	 * @see org.trimwright.model.Limits#getMaxInlLsb()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_MaxInlLsb();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getInlDefinition <em>Inl Definition</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Inl Definition</em>'.
	 * @see org.trimwright.model.Limits#getInlDefinition()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_InlDefinition();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getTargetYield <em>Target Yield</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Target Yield</em>'.
	 * @see org.trimwright.model.Limits#getTargetYield()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_TargetYield();

	/**
	 * Returns the meta object for the attribute '{@link org.trimwright.model.Limits#getMaxGlitchLsb <em>Max Glitch Lsb</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Glitch Lsb</em>'.
	 * @see org.trimwright.model.Limits#getMaxGlitchLsb()
	 * @see #getLimits()
	 * @generated
	 */
	EAttribute getLimits_MaxGlitchLsb();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.Access <em>Access</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Access</em>'.
	 * @see org.trimwright.model.Access
	 * @generated
	 */
	EEnum getAccess();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.FieldRole <em>Field Role</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Field Role</em>'.
	 * @see org.trimwright.model.FieldRole
	 * @generated
	 */
	EEnum getFieldRole();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.Quantity <em>Quantity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Quantity</em>'.
	 * @see org.trimwright.model.Quantity
	 * @generated
	 */
	EEnum getQuantity();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.SignedFormat <em>Signed Format</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Signed Format</em>'.
	 * @see org.trimwright.model.SignedFormat
	 * @generated
	 */
	EEnum getSignedFormat();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.CodingScheme <em>Coding Scheme</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Coding Scheme</em>'.
	 * @see org.trimwright.model.CodingScheme
	 * @generated
	 */
	EEnum getCodingScheme();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.SwitchPolarity <em>Switch Polarity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Switch Polarity</em>'.
	 * @see org.trimwright.model.SwitchPolarity
	 * @generated
	 */
	EEnum getSwitchPolarity();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.UnarySequence <em>Unary Sequence</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Unary Sequence</em>'.
	 * @see org.trimwright.model.UnarySequence
	 * @generated
	 */
	EEnum getUnarySequence();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.MismatchSpec <em>Mismatch Spec</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Mismatch Spec</em>'.
	 * @see org.trimwright.model.MismatchSpec
	 * @generated
	 */
	EEnum getMismatchSpec();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.SwitchPlacement <em>Switch Placement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Switch Placement</em>'.
	 * @see org.trimwright.model.SwitchPlacement
	 * @generated
	 */
	EEnum getSwitchPlacement();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.InlDefinition <em>Inl Definition</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Inl Definition</em>'.
	 * @see org.trimwright.model.InlDefinition
	 * @generated
	 */
	EEnum getInlDefinition();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.ProductionSearch <em>Production Search</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Production Search</em>'.
	 * @see org.trimwright.model.ProductionSearch
	 * @generated
	 */
	EEnum getProductionSearch();

	/**
	 * Returns the meta object for enum '{@link org.trimwright.model.Stepping <em>Stepping</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Stepping</em>'.
	 * @see org.trimwright.model.Stepping
	 * @generated
	 */
	EEnum getStepping();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	TrimwrightFactory getTrimwrightFactory();

	/**
	 * <!-- begin-user-doc -->
	 * Defines literals for the meta objects that represent
	 * <ul>
	 *   <li>each class,</li>
	 *   <li>each feature of each class,</li>
	 *   <li>each operation of each class,</li>
	 *   <li>each enum,</li>
	 *   <li>and each data type</li>
	 * </ul>
	 * <!-- end-user-doc -->
	 * @generated
	 */
	interface Literals {
		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.ChipSpecImpl <em>Chip Spec</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.ChipSpecImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getChipSpec()
		 * @generated
		 */
		EClass CHIP_SPEC = eINSTANCE.getChipSpec();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CHIP_SPEC__NAME = eINSTANCE.getChipSpec_Name();

		/**
		 * The meta object literal for the '<em><b>Revision</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CHIP_SPEC__REVISION = eINSTANCE.getChipSpec_Revision();

		/**
		 * The meta object literal for the '<em><b>Author</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CHIP_SPEC__AUTHOR = eINSTANCE.getChipSpec_Author();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CHIP_SPEC__DESCRIPTION = eINSTANCE.getChipSpec_Description();

		/**
		 * The meta object literal for the '<em><b>Blocks</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CHIP_SPEC__BLOCKS = eINSTANCE.getChipSpec_Blocks();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.BlockImpl <em>Block</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.BlockImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getBlock()
		 * @generated
		 */
		EClass BLOCK = eINSTANCE.getBlock();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BLOCK__NAME = eINSTANCE.getBlock_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BLOCK__DESCRIPTION = eINSTANCE.getBlock_Description();

		/**
		 * The meta object literal for the '<em><b>Base Address</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BLOCK__BASE_ADDRESS = eINSTANCE.getBlock_BaseAddress();

		/**
		 * The meta object literal for the '<em><b>Registers</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference BLOCK__REGISTERS = eINSTANCE.getBlock_Registers();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.RegisterImpl <em>Register</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.RegisterImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getRegister()
		 * @generated
		 */
		EClass REGISTER = eINSTANCE.getRegister();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__NAME = eINSTANCE.getRegister_Name();

		/**
		 * The meta object literal for the '<em><b>Address Offset</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__ADDRESS_OFFSET = eINSTANCE.getRegister_AddressOffset();

		/**
		 * The meta object literal for the '<em><b>Width</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__WIDTH = eINSTANCE.getRegister_Width();

		/**
		 * The meta object literal for the '<em><b>Access</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__ACCESS = eINSTANCE.getRegister_Access();

		/**
		 * The meta object literal for the '<em><b>Reset Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__RESET_VALUE = eINSTANCE.getRegister_ResetValue();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REGISTER__DESCRIPTION = eINSTANCE.getRegister_Description();

		/**
		 * The meta object literal for the '<em><b>Fields</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REGISTER__FIELDS = eINSTANCE.getRegister_Fields();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.FieldImpl <em>Field</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.FieldImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getField()
		 * @generated
		 */
		EClass FIELD = eINSTANCE.getField();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__NAME = eINSTANCE.getField_Name();

		/**
		 * The meta object literal for the '<em><b>Bit Offset</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__BIT_OFFSET = eINSTANCE.getField_BitOffset();

		/**
		 * The meta object literal for the '<em><b>Width</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__WIDTH = eINSTANCE.getField_Width();

		/**
		 * The meta object literal for the '<em><b>Access</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__ACCESS = eINSTANCE.getField_Access();

		/**
		 * The meta object literal for the '<em><b>Reset Code</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__RESET_CODE = eINSTANCE.getField_ResetCode();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__DESCRIPTION = eINSTANCE.getField_Description();

		/**
		 * The meta object literal for the '<em><b>Role</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__ROLE = eINSTANCE.getField_Role();

		/**
		 * The meta object literal for the '<em><b>Production Search</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__PRODUCTION_SEARCH = eINSTANCE.getField_ProductionSearch();

		/**
		 * The meta object literal for the '<em><b>Stepping</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FIELD__STEPPING = eINSTANCE.getField_Stepping();

		/**
		 * The meta object literal for the '<em><b>Target</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FIELD__TARGET = eINSTANCE.getField_Target();

		/**
		 * The meta object literal for the '<em><b>Coding</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FIELD__CODING = eINSTANCE.getField_Coding();

		/**
		 * The meta object literal for the '<em><b>Element</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FIELD__ELEMENT = eINSTANCE.getField_Element();

		/**
		 * The meta object literal for the '<em><b>Limits</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference FIELD__LIMITS = eINSTANCE.getField_Limits();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.AnalogTargetImpl <em>Analog Target</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.AnalogTargetImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getAnalogTarget()
		 * @generated
		 */
		EClass ANALOG_TARGET = eINSTANCE.getAnalogTarget();

		/**
		 * The meta object literal for the '<em><b>Quantity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__QUANTITY = eINSTANCE.getAnalogTarget_Quantity();

		/**
		 * The meta object literal for the '<em><b>Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__UNIT = eINSTANCE.getAnalogTarget_Unit();

		/**
		 * The meta object literal for the '<em><b>Value At Zero</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__VALUE_AT_ZERO = eINSTANCE.getAnalogTarget_ValueAtZero();

		/**
		 * The meta object literal for the '<em><b>Step</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__STEP = eINSTANCE.getAnalogTarget_Step();

		/**
		 * The meta object literal for the '<em><b>Signed Format</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__SIGNED_FORMAT = eINSTANCE.getAnalogTarget_SignedFormat();

		/**
		 * The meta object literal for the '<em><b>Target Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__TARGET_VALUE = eINSTANCE.getAnalogTarget_TargetValue();

		/**
		 * The meta object literal for the '<em><b>Spread Min</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__SPREAD_MIN = eINSTANCE.getAnalogTarget_SpreadMin();

		/**
		 * The meta object literal for the '<em><b>Spread Max</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__SPREAD_MAX = eINSTANCE.getAnalogTarget_SpreadMax();

		/**
		 * The meta object literal for the '<em><b>Accuracy</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__ACCURACY = eINSTANCE.getAnalogTarget_Accuracy();

		/**
		 * The meta object literal for the '<em><b>Safe Min</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__SAFE_MIN = eINSTANCE.getAnalogTarget_SafeMin();

		/**
		 * The meta object literal for the '<em><b>Safe Max</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ANALOG_TARGET__SAFE_MAX = eINSTANCE.getAnalogTarget_SafeMax();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.CodingImpl <em>Coding</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.CodingImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getCoding()
		 * @generated
		 */
		EClass CODING = eINSTANCE.getCoding();

		/**
		 * The meta object literal for the '<em><b>Scheme</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CODING__SCHEME = eINSTANCE.getCoding_Scheme();

		/**
		 * The meta object literal for the '<em><b>Unary Bits</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CODING__UNARY_BITS = eINSTANCE.getCoding_UnaryBits();

		/**
		 * The meta object literal for the '<em><b>Zero State</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CODING__ZERO_STATE = eINSTANCE.getCoding_ZeroState();

		/**
		 * The meta object literal for the '<em><b>Polarity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CODING__POLARITY = eINSTANCE.getCoding_Polarity();

		/**
		 * The meta object literal for the '<em><b>Sequence</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CODING__SEQUENCE = eINSTANCE.getCoding_Sequence();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.UnitElementImpl <em>Unit Element</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.UnitElementImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getUnitElement()
		 * @generated
		 */
		EClass UNIT_ELEMENT = eINSTANCE.getUnitElement();

		/**
		 * The meta object literal for the '<em><b>Nominal Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__NOMINAL_VALUE = eINSTANCE.getUnitElement_NominalValue();

		/**
		 * The meta object literal for the '<em><b>Mismatch Spec</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__MISMATCH_SPEC = eINSTANCE.getUnitElement_MismatchSpec();

		/**
		 * The meta object literal for the '<em><b>Unit Sigma Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__UNIT_SIGMA_PERCENT = eINSTANCE.getUnitElement_UnitSigmaPercent();

		/**
		 * The meta object literal for the '<em><b>Pelgrom Percent Um</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__PELGROM_PERCENT_UM = eINSTANCE.getUnitElement_PelgromPercentUm();

		/**
		 * The meta object literal for the '<em><b>Area Um2</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__AREA_UM2 = eINSTANCE.getUnitElement_AreaUm2();

		/**
		 * The meta object literal for the '<em><b>Coefficient For Pair</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__COEFFICIENT_FOR_PAIR = eINSTANCE.getUnitElement_CoefficientForPair();

		/**
		 * The meta object literal for the '<em><b>Switch Placement</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__SWITCH_PLACEMENT = eINSTANCE.getUnitElement_SwitchPlacement();

		/**
		 * The meta object literal for the '<em><b>Switch Sigma Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__SWITCH_SIGMA_PERCENT = eINSTANCE.getUnitElement_SwitchSigmaPercent();

		/**
		 * The meta object literal for the '<em><b>Linear Gradient Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT = eINSTANCE.getUnitElement_LinearGradientPercent();

		/**
		 * The meta object literal for the '<em><b>Quadratic Gradient Percent</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT = eINSTANCE.getUnitElement_QuadraticGradientPercent();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.impl.LimitsImpl <em>Limits</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.impl.LimitsImpl
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getLimits()
		 * @generated
		 */
		EClass LIMITS = eINSTANCE.getLimits();

		/**
		 * The meta object literal for the '<em><b>Must Be Monotonic</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__MUST_BE_MONOTONIC = eINSTANCE.getLimits_MustBeMonotonic();

		/**
		 * The meta object literal for the '<em><b>Max Non Monotonic Risk</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__MAX_NON_MONOTONIC_RISK = eINSTANCE.getLimits_MaxNonMonotonicRisk();

		/**
		 * The meta object literal for the '<em><b>Max Dnl Lsb</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__MAX_DNL_LSB = eINSTANCE.getLimits_MaxDnlLsb();

		/**
		 * The meta object literal for the '<em><b>Max Inl Lsb</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__MAX_INL_LSB = eINSTANCE.getLimits_MaxInlLsb();

		/**
		 * The meta object literal for the '<em><b>Inl Definition</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__INL_DEFINITION = eINSTANCE.getLimits_InlDefinition();

		/**
		 * The meta object literal for the '<em><b>Target Yield</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__TARGET_YIELD = eINSTANCE.getLimits_TargetYield();

		/**
		 * The meta object literal for the '<em><b>Max Glitch Lsb</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LIMITS__MAX_GLITCH_LSB = eINSTANCE.getLimits_MaxGlitchLsb();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.Access <em>Access</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.Access
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getAccess()
		 * @generated
		 */
		EEnum ACCESS = eINSTANCE.getAccess();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.FieldRole <em>Field Role</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.FieldRole
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getFieldRole()
		 * @generated
		 */
		EEnum FIELD_ROLE = eINSTANCE.getFieldRole();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.Quantity <em>Quantity</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.Quantity
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getQuantity()
		 * @generated
		 */
		EEnum QUANTITY = eINSTANCE.getQuantity();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.SignedFormat <em>Signed Format</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.SignedFormat
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSignedFormat()
		 * @generated
		 */
		EEnum SIGNED_FORMAT = eINSTANCE.getSignedFormat();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.CodingScheme <em>Coding Scheme</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.CodingScheme
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getCodingScheme()
		 * @generated
		 */
		EEnum CODING_SCHEME = eINSTANCE.getCodingScheme();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.SwitchPolarity <em>Switch Polarity</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.SwitchPolarity
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSwitchPolarity()
		 * @generated
		 */
		EEnum SWITCH_POLARITY = eINSTANCE.getSwitchPolarity();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.UnarySequence <em>Unary Sequence</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.UnarySequence
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getUnarySequence()
		 * @generated
		 */
		EEnum UNARY_SEQUENCE = eINSTANCE.getUnarySequence();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.MismatchSpec <em>Mismatch Spec</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.MismatchSpec
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getMismatchSpec()
		 * @generated
		 */
		EEnum MISMATCH_SPEC = eINSTANCE.getMismatchSpec();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.SwitchPlacement <em>Switch Placement</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.SwitchPlacement
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getSwitchPlacement()
		 * @generated
		 */
		EEnum SWITCH_PLACEMENT = eINSTANCE.getSwitchPlacement();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.InlDefinition <em>Inl Definition</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.InlDefinition
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getInlDefinition()
		 * @generated
		 */
		EEnum INL_DEFINITION = eINSTANCE.getInlDefinition();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.ProductionSearch <em>Production Search</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.ProductionSearch
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getProductionSearch()
		 * @generated
		 */
		EEnum PRODUCTION_SEARCH = eINSTANCE.getProductionSearch();

		/**
		 * The meta object literal for the '{@link org.trimwright.model.Stepping <em>Stepping</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.trimwright.model.Stepping
		 * @see org.trimwright.model.impl.TrimwrightPackageImpl#getStepping()
		 * @generated
		 */
		EEnum STEPPING = eINSTANCE.getStepping();

	}

} //TrimwrightPackage
