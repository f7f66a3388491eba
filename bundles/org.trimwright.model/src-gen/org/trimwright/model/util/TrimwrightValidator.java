/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.util;

import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.ResourceLocator;

import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.util.EObjectValidator;

import org.trimwright.model.*;

/**
 * <!-- begin-user-doc -->
 * The <b>Validator</b> for the model.
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightPackage
 * @generated
 */
public class TrimwrightValidator extends EObjectValidator {
	/**
	 * The cached model package
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final TrimwrightValidator INSTANCE = new TrimwrightValidator();

	/**
	 * A constant for the {@link org.eclipse.emf.common.util.Diagnostic#getSource() source} of diagnostic {@link org.eclipse.emf.common.util.Diagnostic#getCode() codes} from this package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.common.util.Diagnostic#getSource()
	 * @see org.eclipse.emf.common.util.Diagnostic#getCode()
	 * @generated
	 */
	public static final String DIAGNOSTIC_SOURCE = "org.trimwright.model";

	/**
	 * A constant with a fixed name that can be used as the base value for additional hand written constants.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final int GENERATED_DIAGNOSTIC_CODE_COUNT = 0;

	/**
	 * A constant with a fixed name that can be used as the base value for additional hand written constants in a derived class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static final int DIAGNOSTIC_CODE_COUNT = GENERATED_DIAGNOSTIC_CODE_COUNT;

	/**
	 * Creates an instance of the switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TrimwrightValidator() {
		super();
	}

	/**
	 * Returns the package of this validator switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EPackage getEPackage() {
	  return TrimwrightPackage.eINSTANCE;
	}

	/**
	 * Calls <code>validateXXX</code> for the corresponding classifier of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected boolean validate(int classifierID, Object value, DiagnosticChain diagnostics, Map<Object, Object> context) {
		switch (classifierID) {
			case TrimwrightPackage.CHIP_SPEC:
				return validateChipSpec((ChipSpec)value, diagnostics, context);
			case TrimwrightPackage.BLOCK:
				return validateBlock((Block)value, diagnostics, context);
			case TrimwrightPackage.REGISTER:
				return validateRegister((Register)value, diagnostics, context);
			case TrimwrightPackage.FIELD:
				return validateField((Field)value, diagnostics, context);
			case TrimwrightPackage.ANALOG_TARGET:
				return validateAnalogTarget((AnalogTarget)value, diagnostics, context);
			case TrimwrightPackage.CODING:
				return validateCoding((Coding)value, diagnostics, context);
			case TrimwrightPackage.UNIT_ELEMENT:
				return validateUnitElement((UnitElement)value, diagnostics, context);
			case TrimwrightPackage.LIMITS:
				return validateLimits((Limits)value, diagnostics, context);
			case TrimwrightPackage.ACCESS:
				return validateAccess((Access)value, diagnostics, context);
			case TrimwrightPackage.FIELD_ROLE:
				return validateFieldRole((FieldRole)value, diagnostics, context);
			case TrimwrightPackage.QUANTITY:
				return validateQuantity((Quantity)value, diagnostics, context);
			case TrimwrightPackage.SIGNED_FORMAT:
				return validateSignedFormat((SignedFormat)value, diagnostics, context);
			case TrimwrightPackage.CODING_SCHEME:
				return validateCodingScheme((CodingScheme)value, diagnostics, context);
			case TrimwrightPackage.SWITCH_POLARITY:
				return validateSwitchPolarity((SwitchPolarity)value, diagnostics, context);
			case TrimwrightPackage.UNARY_SEQUENCE:
				return validateUnarySequence((UnarySequence)value, diagnostics, context);
			case TrimwrightPackage.MISMATCH_SPEC:
				return validateMismatchSpec((MismatchSpec)value, diagnostics, context);
			case TrimwrightPackage.SWITCH_PLACEMENT:
				return validateSwitchPlacement((SwitchPlacement)value, diagnostics, context);
			case TrimwrightPackage.INL_DEFINITION:
				return validateInlDefinition((InlDefinition)value, diagnostics, context);
			case TrimwrightPackage.PRODUCTION_SEARCH:
				return validateProductionSearch((ProductionSearch)value, diagnostics, context);
			case TrimwrightPackage.STEPPING:
				return validateStepping((Stepping)value, diagnostics, context);
			default:
				return true;
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateChipSpec(ChipSpec chipSpec, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(chipSpec, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(chipSpec, diagnostics, context);
		if (result || diagnostics != null) result &= validateChipSpec_uniqueBlockNames(chipSpec, diagnostics, context);
		return result;
	}

	/**
	 * Validates the uniqueBlockNames constraint of '<em>Chip Spec</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateChipSpec_uniqueBlockNames(ChipSpec chipSpec, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.uniqueBlockNames(chipSpec, diagnostics);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateBlock(Block block, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(block, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(block, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(block, diagnostics, context);
		if (result || diagnostics != null) result &= validateBlock_uniqueRegisterNames(block, diagnostics, context);
		if (result || diagnostics != null) result &= validateBlock_uniqueRegisterAddresses(block, diagnostics, context);
		return result;
	}

	/**
	 * Validates the uniqueRegisterNames constraint of '<em>Block</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateBlock_uniqueRegisterNames(Block block, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.uniqueRegisterNames(block, diagnostics);
	}

	/**
	 * Validates the uniqueRegisterAddresses constraint of '<em>Block</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateBlock_uniqueRegisterAddresses(Block block, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.uniqueRegisterAddresses(block, diagnostics);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateRegister(Register register, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(register, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(register, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(register, diagnostics, context);
		if (result || diagnostics != null) result &= validateRegister_validWidth(register, diagnostics, context);
		if (result || diagnostics != null) result &= validateRegister_noOverlappingFields(register, diagnostics, context);
		if (result || diagnostics != null) result &= validateRegister_uniqueFieldNames(register, diagnostics, context);
		return result;
	}

	/**
	 * Validates the validWidth constraint of '<em>Register</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateRegister_validWidth(Register register, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.validWidth(register, diagnostics);
	}

	/**
	 * Validates the noOverlappingFields constraint of '<em>Register</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateRegister_noOverlappingFields(Register register, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.noOverlappingFields(register, diagnostics);
	}

	/**
	 * Validates the uniqueFieldNames constraint of '<em>Register</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateRegister_uniqueFieldNames(Register register, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.uniqueFieldNames(register, diagnostics);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateField(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		if (!validate_NoCircularContainment(field, diagnostics, context)) return false;
		boolean result = validate_EveryMultiplicityConforms(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryDataValueConforms(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryReferenceIsContained(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryBidirectionalReferenceIsPaired(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryProxyResolves(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_UniqueID(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryKeyUnique(field, diagnostics, context);
		if (result || diagnostics != null) result &= validate_EveryMapEntryUnique(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_bitsInsideRegister(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_resetCodeInRange(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_trimIsWritable(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_analysable(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_rangeCoversSpread(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_stepMeetsAccuracy(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_residualMeetsAccuracy(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_monotonicRisk(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_linearityYield(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_selectCodesLegal(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_glitchWithinLimit(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_searchNeedsMonotonic(field, diagnostics, context);
		if (result || diagnostics != null) result &= validateField_codesInsideSafeLimits(field, diagnostics, context);
		return result;
	}

	/**
	 * Validates the bitsInsideRegister constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_bitsInsideRegister(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.bitsInsideRegister(field, diagnostics);
	}

	/**
	 * Validates the resetCodeInRange constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_resetCodeInRange(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.resetCodeInRange(field, diagnostics);
	}

	/**
	 * Validates the trimIsWritable constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_trimIsWritable(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.StructuralRules.trimIsWritable(field, diagnostics);
	}

	/**
	 * Validates the analysable constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_analysable(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("analysable", field, diagnostics, context);
	}

	/**
	 * Validates the rangeCoversSpread constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_rangeCoversSpread(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("rangeCoversSpread", field, diagnostics, context);
	}

	/**
	 * Validates the stepMeetsAccuracy constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_stepMeetsAccuracy(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("stepMeetsAccuracy", field, diagnostics, context);
	}

	/**
	 * Validates the residualMeetsAccuracy constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_residualMeetsAccuracy(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("residualMeetsAccuracy", field, diagnostics, context);
	}

	/**
	 * Validates the monotonicRisk constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_monotonicRisk(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("monotonicRisk", field, diagnostics, context);
	}

	/**
	 * Validates the linearityYield constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_linearityYield(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("linearityYield", field, diagnostics, context);
	}

	/**
	 * Validates the selectCodesLegal constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_selectCodesLegal(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("selectCodesLegal", field, diagnostics, context);
	}

	/**
	 * Validates the glitchWithinLimit constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_glitchWithinLimit(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("glitchWithinLimit", field, diagnostics, context);
	}

	/**
	 * Validates the searchNeedsMonotonic constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_searchNeedsMonotonic(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("searchNeedsMonotonic", field, diagnostics, context);
	}

	/**
	 * Validates the codesInsideSafeLimits constraint of '<em>Field</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated NOT
	 */
	public boolean validateField_codesInsideSafeLimits(Field field, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return org.trimwright.model.rules.FieldRules.check("codesInsideSafeLimits", field, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateAnalogTarget(AnalogTarget analogTarget, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(analogTarget, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateCoding(Coding coding, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(coding, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateUnitElement(UnitElement unitElement, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(unitElement, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateLimits(Limits limits, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return validate_EveryDefaultConstraint(limits, diagnostics, context);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateAccess(Access access, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateFieldRole(FieldRole fieldRole, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateQuantity(Quantity quantity, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSignedFormat(SignedFormat signedFormat, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateCodingScheme(CodingScheme codingScheme, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSwitchPolarity(SwitchPolarity switchPolarity, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateUnarySequence(UnarySequence unarySequence, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateMismatchSpec(MismatchSpec mismatchSpec, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateSwitchPlacement(SwitchPlacement switchPlacement, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateInlDefinition(InlDefinition inlDefinition, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateProductionSearch(ProductionSearch productionSearch, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public boolean validateStepping(Stepping stepping, DiagnosticChain diagnostics, Map<Object, Object> context) {
		return true;
	}

	/**
	 * Returns the resource locator that will be used to fetch messages for this validator's diagnostics.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResourceLocator getResourceLocator() {
		// TODO
		// Specialize this to return a resource locator for messages specific to this validator.
		// Ensure that you remove @generated or mark it @generated NOT
		return super.getResourceLocator();
	}

} //TrimwrightValidator
