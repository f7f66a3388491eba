/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.impl.EFactoryImpl;

import org.eclipse.emf.ecore.plugin.EcorePlugin;

import org.trimwright.model.*;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Factory</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class TrimwrightFactoryImpl extends EFactoryImpl implements TrimwrightFactory {
	/**
	 * Creates the default factory implementation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static TrimwrightFactory init() {
		try {
			TrimwrightFactory theTrimwrightFactory = (TrimwrightFactory)EPackage.Registry.INSTANCE.getEFactory(TrimwrightPackage.eNS_URI);
			if (theTrimwrightFactory != null) {
				return theTrimwrightFactory;
			}
		}
		catch (Exception exception) {
			EcorePlugin.INSTANCE.log(exception);
		}
		return new TrimwrightFactoryImpl();
	}

	/**
	 * Creates an instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TrimwrightFactoryImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EObject create(EClass eClass) {
		switch (eClass.getClassifierID()) {
			case TrimwrightPackage.CHIP_SPEC: return createChipSpec();
			case TrimwrightPackage.BLOCK: return createBlock();
			case TrimwrightPackage.REGISTER: return createRegister();
			case TrimwrightPackage.FIELD: return createField();
			case TrimwrightPackage.ANALOG_TARGET: return createAnalogTarget();
			case TrimwrightPackage.CODING: return createCoding();
			case TrimwrightPackage.UNIT_ELEMENT: return createUnitElement();
			case TrimwrightPackage.LIMITS: return createLimits();
			default:
				throw new IllegalArgumentException("The class '" + eClass.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object createFromString(EDataType eDataType, String initialValue) {
		switch (eDataType.getClassifierID()) {
			case TrimwrightPackage.ACCESS:
				return createAccessFromString(eDataType, initialValue);
			case TrimwrightPackage.FIELD_ROLE:
				return createFieldRoleFromString(eDataType, initialValue);
			case TrimwrightPackage.QUANTITY:
				return createQuantityFromString(eDataType, initialValue);
			case TrimwrightPackage.SIGNED_FORMAT:
				return createSignedFormatFromString(eDataType, initialValue);
			case TrimwrightPackage.CODING_SCHEME:
				return createCodingSchemeFromString(eDataType, initialValue);
			case TrimwrightPackage.SWITCH_POLARITY:
				return createSwitchPolarityFromString(eDataType, initialValue);
			case TrimwrightPackage.UNARY_SEQUENCE:
				return createUnarySequenceFromString(eDataType, initialValue);
			case TrimwrightPackage.MISMATCH_SPEC:
				return createMismatchSpecFromString(eDataType, initialValue);
			case TrimwrightPackage.SWITCH_PLACEMENT:
				return createSwitchPlacementFromString(eDataType, initialValue);
			case TrimwrightPackage.INL_DEFINITION:
				return createInlDefinitionFromString(eDataType, initialValue);
			case TrimwrightPackage.PRODUCTION_SEARCH:
				return createProductionSearchFromString(eDataType, initialValue);
			case TrimwrightPackage.STEPPING:
				return createSteppingFromString(eDataType, initialValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String convertToString(EDataType eDataType, Object instanceValue) {
		switch (eDataType.getClassifierID()) {
			case TrimwrightPackage.ACCESS:
				return convertAccessToString(eDataType, instanceValue);
			case TrimwrightPackage.FIELD_ROLE:
				return convertFieldRoleToString(eDataType, instanceValue);
			case TrimwrightPackage.QUANTITY:
				return convertQuantityToString(eDataType, instanceValue);
			case TrimwrightPackage.SIGNED_FORMAT:
				return convertSignedFormatToString(eDataType, instanceValue);
			case TrimwrightPackage.CODING_SCHEME:
				return convertCodingSchemeToString(eDataType, instanceValue);
			case TrimwrightPackage.SWITCH_POLARITY:
				return convertSwitchPolarityToString(eDataType, instanceValue);
			case TrimwrightPackage.UNARY_SEQUENCE:
				return convertUnarySequenceToString(eDataType, instanceValue);
			case TrimwrightPackage.MISMATCH_SPEC:
				return convertMismatchSpecToString(eDataType, instanceValue);
			case TrimwrightPackage.SWITCH_PLACEMENT:
				return convertSwitchPlacementToString(eDataType, instanceValue);
			case TrimwrightPackage.INL_DEFINITION:
				return convertInlDefinitionToString(eDataType, instanceValue);
			case TrimwrightPackage.PRODUCTION_SEARCH:
				return convertProductionSearchToString(eDataType, instanceValue);
			case TrimwrightPackage.STEPPING:
				return convertSteppingToString(eDataType, instanceValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier");
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ChipSpec createChipSpec() {
		ChipSpecImpl chipSpec = new ChipSpecImpl();
		return chipSpec;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Block createBlock() {
		BlockImpl block = new BlockImpl();
		return block;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Register createRegister() {
		RegisterImpl register = new RegisterImpl();
		return register;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Field createField() {
		FieldImpl field = new FieldImpl();
		return field;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public AnalogTarget createAnalogTarget() {
		AnalogTargetImpl analogTarget = new AnalogTargetImpl();
		return analogTarget;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Coding createCoding() {
		CodingImpl coding = new CodingImpl();
		return coding;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UnitElement createUnitElement() {
		UnitElementImpl unitElement = new UnitElementImpl();
		return unitElement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Limits createLimits() {
		LimitsImpl limits = new LimitsImpl();
		return limits;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Access createAccessFromString(EDataType eDataType, String initialValue) {
		Access result = Access.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertAccessToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public FieldRole createFieldRoleFromString(EDataType eDataType, String initialValue) {
		FieldRole result = FieldRole.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertFieldRoleToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Quantity createQuantityFromString(EDataType eDataType, String initialValue) {
		Quantity result = Quantity.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertQuantityToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SignedFormat createSignedFormatFromString(EDataType eDataType, String initialValue) {
		SignedFormat result = SignedFormat.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSignedFormatToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public CodingScheme createCodingSchemeFromString(EDataType eDataType, String initialValue) {
		CodingScheme result = CodingScheme.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertCodingSchemeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SwitchPolarity createSwitchPolarityFromString(EDataType eDataType, String initialValue) {
		SwitchPolarity result = SwitchPolarity.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSwitchPolarityToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public UnarySequence createUnarySequenceFromString(EDataType eDataType, String initialValue) {
		UnarySequence result = UnarySequence.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertUnarySequenceToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public MismatchSpec createMismatchSpecFromString(EDataType eDataType, String initialValue) {
		MismatchSpec result = MismatchSpec.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertMismatchSpecToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public SwitchPlacement createSwitchPlacementFromString(EDataType eDataType, String initialValue) {
		SwitchPlacement result = SwitchPlacement.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSwitchPlacementToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public InlDefinition createInlDefinitionFromString(EDataType eDataType, String initialValue) {
		InlDefinition result = InlDefinition.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertInlDefinitionToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ProductionSearch createProductionSearchFromString(EDataType eDataType, String initialValue) {
		ProductionSearch result = ProductionSearch.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertProductionSearchToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Stepping createSteppingFromString(EDataType eDataType, String initialValue) {
		Stepping result = Stepping.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'");
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertSteppingToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TrimwrightPackage getTrimwrightPackage() {
		return (TrimwrightPackage)getEPackage();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @deprecated
	 * @generated
	 */
	@Deprecated
	public static TrimwrightPackage getPackage() {
		return TrimwrightPackage.eINSTANCE;
	}

} //TrimwrightFactoryImpl
