/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model.impl;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EValidator;

import org.eclipse.emf.ecore.impl.EPackageImpl;

import org.trimwright.model.Access;
import org.trimwright.model.AnalogTarget;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Coding;
import org.trimwright.model.CodingScheme;
import org.trimwright.model.Field;
import org.trimwright.model.FieldRole;
import org.trimwright.model.InlDefinition;
import org.trimwright.model.Limits;
import org.trimwright.model.MismatchSpec;
import org.trimwright.model.ProductionSearch;
import org.trimwright.model.Quantity;
import org.trimwright.model.Register;
import org.trimwright.model.SignedFormat;
import org.trimwright.model.Stepping;
import org.trimwright.model.SwitchPlacement;
import org.trimwright.model.SwitchPolarity;
import org.trimwright.model.TrimwrightFactory;
import org.trimwright.model.TrimwrightPackage;
import org.trimwright.model.UnarySequence;
import org.trimwright.model.UnitElement;

import org.trimwright.model.util.TrimwrightValidator;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Package</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class TrimwrightPackageImpl extends EPackageImpl implements TrimwrightPackage {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass chipSpecEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass blockEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass registerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass fieldEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass analogTargetEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass codingEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass unitElementEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass limitsEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum accessEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum fieldRoleEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum quantityEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum signedFormatEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum codingSchemeEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum switchPolarityEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum unarySequenceEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum mismatchSpecEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum switchPlacementEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum inlDefinitionEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum productionSearchEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum steppingEEnum = null;

	/**
	 * Creates an instance of the model <b>Package</b>, registered with
	 * {@link org.eclipse.emf.ecore.EPackage.Registry EPackage.Registry} by the package
	 * package URI value.
	 * <p>Note: the correct way to create the package is via the static
	 * factory method {@link #init init()}, which also performs
	 * initialization of the package, or returns the registered package,
	 * if one already exists.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.ecore.EPackage.Registry
	 * @see org.trimwright.model.TrimwrightPackage#eNS_URI
	 * @see #init()
	 * @generated
	 */
	private TrimwrightPackageImpl() {
		super(eNS_URI, TrimwrightFactory.eINSTANCE);
	}
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static boolean isInited = false;

	/**
	 * Creates, registers, and initializes the <b>Package</b> for this model, and for any others upon which it depends.
	 *
	 * <p>This method is used to initialize {@link TrimwrightPackage#eINSTANCE} when that field is accessed.
	 * Clients should not invoke it directly. Instead, they should simply access that field to obtain the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #eNS_URI
	 * @see #createPackageContents()
	 * @see #initializePackageContents()
	 * @generated
	 */
	public static TrimwrightPackage init() {
		if (isInited) return (TrimwrightPackage)EPackage.Registry.INSTANCE.getEPackage(TrimwrightPackage.eNS_URI);

		// Obtain or create and register package
		Object registeredTrimwrightPackage = EPackage.Registry.INSTANCE.get(eNS_URI);
		TrimwrightPackageImpl theTrimwrightPackage = registeredTrimwrightPackage instanceof TrimwrightPackageImpl ? (TrimwrightPackageImpl)registeredTrimwrightPackage : new TrimwrightPackageImpl();

		isInited = true;

		// Create package meta-data objects
		theTrimwrightPackage.createPackageContents();

		// Initialize created meta-data
		theTrimwrightPackage.initializePackageContents();

		// Register package validator
		EValidator.Registry.INSTANCE.put
			(theTrimwrightPackage,
			 new EValidator.Descriptor() {
				 @Override
				 public EValidator getEValidator() {
					 return TrimwrightValidator.INSTANCE;
				 }
			 });

		// Mark meta-data to indicate it can't be changed
		theTrimwrightPackage.freeze();

		// Update the registry and return the package
		EPackage.Registry.INSTANCE.put(TrimwrightPackage.eNS_URI, theTrimwrightPackage);
		return theTrimwrightPackage;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getChipSpec() {
		return chipSpecEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getChipSpec_Name() {
		return (EAttribute)chipSpecEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getChipSpec_Revision() {
		return (EAttribute)chipSpecEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getChipSpec_Author() {
		return (EAttribute)chipSpecEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getChipSpec_Description() {
		return (EAttribute)chipSpecEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getChipSpec_Blocks() {
		return (EReference)chipSpecEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getBlock() {
		return blockEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBlock_Name() {
		return (EAttribute)blockEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBlock_Description() {
		return (EAttribute)blockEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBlock_BaseAddress() {
		return (EAttribute)blockEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getBlock_Registers() {
		return (EReference)blockEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRegister() {
		return registerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_Name() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_AddressOffset() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_Width() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_Access() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_ResetValue() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRegister_Description() {
		return (EAttribute)registerEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRegister_Fields() {
		return (EReference)registerEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getField() {
		return fieldEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Name() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_BitOffset() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Width() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Access() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_ResetCode() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Description() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Role() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_ProductionSearch() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getField_Stepping() {
		return (EAttribute)fieldEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getField_Target() {
		return (EReference)fieldEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getField_Coding() {
		return (EReference)fieldEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getField_Element() {
		return (EReference)fieldEClass.getEStructuralFeatures().get(11);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getField_Limits() {
		return (EReference)fieldEClass.getEStructuralFeatures().get(12);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getAnalogTarget() {
		return analogTargetEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_Quantity() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_Unit() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_ValueAtZero() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_Step() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_SignedFormat() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_TargetValue() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_SpreadMin() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_SpreadMax() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_Accuracy() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_SafeMin() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAnalogTarget_SafeMax() {
		return (EAttribute)analogTargetEClass.getEStructuralFeatures().get(10);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCoding() {
		return codingEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCoding_Scheme() {
		return (EAttribute)codingEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCoding_UnaryBits() {
		return (EAttribute)codingEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCoding_ZeroState() {
		return (EAttribute)codingEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCoding_Polarity() {
		return (EAttribute)codingEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCoding_Sequence() {
		return (EAttribute)codingEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getUnitElement() {
		return unitElementEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_NominalValue() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_MismatchSpec() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_UnitSigmaPercent() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_PelgromPercentUm() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_AreaUm2() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_CoefficientForPair() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_SwitchPlacement() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_SwitchSigmaPercent() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_LinearGradientPercent() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getUnitElement_QuadraticGradientPercent() {
		return (EAttribute)unitElementEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLimits() {
		return limitsEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_MustBeMonotonic() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_MaxNonMonotonicRisk() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_MaxDnlLsb() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_MaxInlLsb() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_InlDefinition() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_TargetYield() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLimits_MaxGlitchLsb() {
		return (EAttribute)limitsEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getAccess() {
		return accessEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getFieldRole() {
		return fieldRoleEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getQuantity() {
		return quantityEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSignedFormat() {
		return signedFormatEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getCodingScheme() {
		return codingSchemeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSwitchPolarity() {
		return switchPolarityEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getUnarySequence() {
		return unarySequenceEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getMismatchSpec() {
		return mismatchSpecEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getSwitchPlacement() {
		return switchPlacementEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getInlDefinition() {
		return inlDefinitionEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getProductionSearch() {
		return productionSearchEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getStepping() {
		return steppingEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TrimwrightFactory getTrimwrightFactory() {
		return (TrimwrightFactory)getEFactoryInstance();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isCreated = false;

	/**
	 * Creates the meta-model objects for the package.  This method is
	 * guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void createPackageContents() {
		if (isCreated) return;
		isCreated = true;

		// Create classes and their features
		chipSpecEClass = createEClass(CHIP_SPEC);
		createEAttribute(chipSpecEClass, CHIP_SPEC__NAME);
		createEAttribute(chipSpecEClass, CHIP_SPEC__REVISION);
		createEAttribute(chipSpecEClass, CHIP_SPEC__AUTHOR);
		createEAttribute(chipSpecEClass, CHIP_SPEC__DESCRIPTION);
		createEReference(chipSpecEClass, CHIP_SPEC__BLOCKS);

		blockEClass = createEClass(BLOCK);
		createEAttribute(blockEClass, BLOCK__NAME);
		createEAttribute(blockEClass, BLOCK__DESCRIPTION);
		createEAttribute(blockEClass, BLOCK__BASE_ADDRESS);
		createEReference(blockEClass, BLOCK__REGISTERS);

		registerEClass = createEClass(REGISTER);
		createEAttribute(registerEClass, REGISTER__NAME);
		createEAttribute(registerEClass, REGISTER__ADDRESS_OFFSET);
		createEAttribute(registerEClass, REGISTER__WIDTH);
		createEAttribute(registerEClass, REGISTER__ACCESS);
		createEAttribute(registerEClass, REGISTER__RESET_VALUE);
		createEAttribute(registerEClass, REGISTER__DESCRIPTION);
		createEReference(registerEClass, REGISTER__FIELDS);

		fieldEClass = createEClass(FIELD);
		createEAttribute(fieldEClass, FIELD__NAME);
		createEAttribute(fieldEClass, FIELD__BIT_OFFSET);
		createEAttribute(fieldEClass, FIELD__WIDTH);
		createEAttribute(fieldEClass, FIELD__ACCESS);
		createEAttribute(fieldEClass, FIELD__RESET_CODE);
		createEAttribute(fieldEClass, FIELD__DESCRIPTION);
		createEAttribute(fieldEClass, FIELD__ROLE);
		createEAttribute(fieldEClass, FIELD__PRODUCTION_SEARCH);
		createEAttribute(fieldEClass, FIELD__STEPPING);
		createEReference(fieldEClass, FIELD__TARGET);
		createEReference(fieldEClass, FIELD__CODING);
		createEReference(fieldEClass, FIELD__ELEMENT);
		createEReference(fieldEClass, FIELD__LIMITS);

		analogTargetEClass = createEClass(ANALOG_TARGET);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__QUANTITY);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__UNIT);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__VALUE_AT_ZERO);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__STEP);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__SIGNED_FORMAT);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__TARGET_VALUE);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__SPREAD_MIN);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__SPREAD_MAX);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__ACCURACY);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__SAFE_MIN);
		createEAttribute(analogTargetEClass, ANALOG_TARGET__SAFE_MAX);

		codingEClass = createEClass(CODING);
		createEAttribute(codingEClass, CODING__SCHEME);
		createEAttribute(codingEClass, CODING__UNARY_BITS);
		createEAttribute(codingEClass, CODING__ZERO_STATE);
		createEAttribute(codingEClass, CODING__POLARITY);
		createEAttribute(codingEClass, CODING__SEQUENCE);

		unitElementEClass = createEClass(UNIT_ELEMENT);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__NOMINAL_VALUE);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__MISMATCH_SPEC);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__UNIT_SIGMA_PERCENT);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__PELGROM_PERCENT_UM);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__AREA_UM2);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__COEFFICIENT_FOR_PAIR);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__SWITCH_PLACEMENT);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__SWITCH_SIGMA_PERCENT);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__LINEAR_GRADIENT_PERCENT);
		createEAttribute(unitElementEClass, UNIT_ELEMENT__QUADRATIC_GRADIENT_PERCENT);

		limitsEClass = createEClass(LIMITS);
		createEAttribute(limitsEClass, LIMITS__MUST_BE_MONOTONIC);
		createEAttribute(limitsEClass, LIMITS__MAX_NON_MONOTONIC_RISK);
		createEAttribute(limitsEClass, LIMITS__MAX_DNL_LSB);
		createEAttribute(limitsEClass, LIMITS__MAX_INL_LSB);
		createEAttribute(limitsEClass, LIMITS__INL_DEFINITION);
		createEAttribute(limitsEClass, LIMITS__TARGET_YIELD);
		createEAttribute(limitsEClass, LIMITS__MAX_GLITCH_LSB);

		// Create enums
		accessEEnum = createEEnum(ACCESS);
		fieldRoleEEnum = createEEnum(FIELD_ROLE);
		quantityEEnum = createEEnum(QUANTITY);
		signedFormatEEnum = createEEnum(SIGNED_FORMAT);
		codingSchemeEEnum = createEEnum(CODING_SCHEME);
		switchPolarityEEnum = createEEnum(SWITCH_POLARITY);
		unarySequenceEEnum = createEEnum(UNARY_SEQUENCE);
		mismatchSpecEEnum = createEEnum(MISMATCH_SPEC);
		switchPlacementEEnum = createEEnum(SWITCH_PLACEMENT);
		inlDefinitionEEnum = createEEnum(INL_DEFINITION);
		productionSearchEEnum = createEEnum(PRODUCTION_SEARCH);
		steppingEEnum = createEEnum(STEPPING);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isInitialized = false;

	/**
	 * Complete the initialization of the package and its meta-model.  This
	 * method is guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void initializePackageContents() {
		if (isInitialized) return;
		isInitialized = true;

		// Initialize package
		setName(eNAME);
		setNsPrefix(eNS_PREFIX);
		setNsURI(eNS_URI);

		// Create type parameters

		// Set bounds for type parameters

		// Add supertypes to classes

		// Initialize classes, features, and operations; add parameters
		initEClass(chipSpecEClass, ChipSpec.class, "ChipSpec", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getChipSpec_Name(), ecorePackage.getEString(), "name", null, 0, 1, ChipSpec.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getChipSpec_Revision(), ecorePackage.getEString(), "revision", null, 0, 1, ChipSpec.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getChipSpec_Author(), ecorePackage.getEString(), "author", null, 0, 1, ChipSpec.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getChipSpec_Description(), ecorePackage.getEString(), "description", null, 0, 1, ChipSpec.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getChipSpec_Blocks(), this.getBlock(), null, "blocks", null, 0, -1, ChipSpec.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(blockEClass, Block.class, "Block", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getBlock_Name(), ecorePackage.getEString(), "name", null, 0, 1, Block.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBlock_Description(), ecorePackage.getEString(), "description", null, 0, 1, Block.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getBlock_BaseAddress(), ecorePackage.getELong(), "baseAddress", null, 0, 1, Block.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getBlock_Registers(), this.getRegister(), null, "registers", null, 0, -1, Block.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(registerEClass, Register.class, "Register", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getRegister_Name(), ecorePackage.getEString(), "name", null, 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRegister_AddressOffset(), ecorePackage.getELong(), "addressOffset", null, 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRegister_Width(), ecorePackage.getEInt(), "width", "8", 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRegister_Access(), this.getAccess(), "access", null, 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRegister_ResetValue(), ecorePackage.getELong(), "resetValue", null, 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getRegister_Description(), ecorePackage.getEString(), "description", null, 0, 1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getRegister_Fields(), this.getField(), null, "fields", null, 0, -1, Register.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(fieldEClass, Field.class, "Field", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getField_Name(), ecorePackage.getEString(), "name", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_BitOffset(), ecorePackage.getEInt(), "bitOffset", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_Width(), ecorePackage.getEInt(), "width", "1", 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_Access(), this.getAccess(), "access", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_ResetCode(), ecorePackage.getELong(), "resetCode", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_Description(), ecorePackage.getEString(), "description", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_Role(), this.getFieldRole(), "role", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_ProductionSearch(), this.getProductionSearch(), "productionSearch", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getField_Stepping(), this.getStepping(), "stepping", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getField_Target(), this.getAnalogTarget(), null, "target", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getField_Coding(), this.getCoding(), null, "coding", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getField_Element(), this.getUnitElement(), null, "element", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEReference(getField_Limits(), this.getLimits(), null, "limits", null, 0, 1, Field.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(analogTargetEClass, AnalogTarget.class, "AnalogTarget", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getAnalogTarget_Quantity(), this.getQuantity(), "quantity", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_Unit(), ecorePackage.getEString(), "unit", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_ValueAtZero(), ecorePackage.getEDouble(), "valueAtZero", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_Step(), ecorePackage.getEDouble(), "step", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_SignedFormat(), this.getSignedFormat(), "signedFormat", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_TargetValue(), ecorePackage.getEDouble(), "targetValue", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_SpreadMin(), ecorePackage.getEDouble(), "spreadMin", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_SpreadMax(), ecorePackage.getEDouble(), "spreadMax", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_Accuracy(), ecorePackage.getEDouble(), "accuracy", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_SafeMin(), ecorePackage.getEDouble(), "safeMin", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getAnalogTarget_SafeMax(), ecorePackage.getEDouble(), "safeMax", null, 0, 1, AnalogTarget.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(codingEClass, Coding.class, "Coding", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getCoding_Scheme(), this.getCodingScheme(), "scheme", null, 0, 1, Coding.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCoding_UnaryBits(), ecorePackage.getEInt(), "unaryBits", null, 0, 1, Coding.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCoding_ZeroState(), ecorePackage.getEBoolean(), "zeroState", null, 0, 1, Coding.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCoding_Polarity(), this.getSwitchPolarity(), "polarity", null, 0, 1, Coding.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getCoding_Sequence(), this.getUnarySequence(), "sequence", null, 0, 1, Coding.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(unitElementEClass, UnitElement.class, "UnitElement", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getUnitElement_NominalValue(), ecorePackage.getEDouble(), "nominalValue", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_MismatchSpec(), this.getMismatchSpec(), "mismatchSpec", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_UnitSigmaPercent(), ecorePackage.getEDouble(), "unitSigmaPercent", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_PelgromPercentUm(), ecorePackage.getEDouble(), "pelgromPercentUm", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_AreaUm2(), ecorePackage.getEDouble(), "areaUm2", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_CoefficientForPair(), ecorePackage.getEBoolean(), "coefficientForPair", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_SwitchPlacement(), this.getSwitchPlacement(), "switchPlacement", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_SwitchSigmaPercent(), ecorePackage.getEDouble(), "switchSigmaPercent", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_LinearGradientPercent(), ecorePackage.getEDouble(), "linearGradientPercent", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getUnitElement_QuadraticGradientPercent(), ecorePackage.getEDouble(), "quadraticGradientPercent", null, 0, 1, UnitElement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		initEClass(limitsEClass, Limits.class, "Limits", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS);
		initEAttribute(getLimits_MustBeMonotonic(), ecorePackage.getEBoolean(), "mustBeMonotonic", null, 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_MaxNonMonotonicRisk(), ecorePackage.getEDouble(), "maxNonMonotonicRisk", "1.0E-6", 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_MaxDnlLsb(), ecorePackage.getEDouble(), "maxDnlLsb", null, 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_MaxInlLsb(), ecorePackage.getEDouble(), "maxInlLsb", null, 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_InlDefinition(), this.getInlDefinition(), "inlDefinition", null, 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_TargetYield(), ecorePackage.getEDouble(), "targetYield", "0.99", 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);
		initEAttribute(getLimits_MaxGlitchLsb(), ecorePackage.getEDouble(), "maxGlitchLsb", null, 0, 1, Limits.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED);

		// Initialize enums and add enum literals
		initEEnum(accessEEnum, Access.class, "Access");
		addEEnumLiteral(accessEEnum, Access.READ_WRITE);
		addEEnumLiteral(accessEEnum, Access.READ_ONLY);
		addEEnumLiteral(accessEEnum, Access.WRITE_ONLY);
		addEEnumLiteral(accessEEnum, Access.WRITE1_TO_CLEAR);

		initEEnum(fieldRoleEEnum, FieldRole.class, "FieldRole");
		addEEnumLiteral(fieldRoleEEnum, FieldRole.TRIM);
		addEEnumLiteral(fieldRoleEEnum, FieldRole.MODE_SELECT);
		addEEnumLiteral(fieldRoleEEnum, FieldRole.ENABLE);

		initEEnum(quantityEEnum, Quantity.class, "Quantity");
		addEEnumLiteral(quantityEEnum, Quantity.VOLTAGE);
		addEEnumLiteral(quantityEEnum, Quantity.CURRENT);
		addEEnumLiteral(quantityEEnum, Quantity.RESISTANCE);
		addEEnumLiteral(quantityEEnum, Quantity.FREQUENCY);
		addEEnumLiteral(quantityEEnum, Quantity.TIME);
		addEEnumLiteral(quantityEEnum, Quantity.CAPACITANCE);
		addEEnumLiteral(quantityEEnum, Quantity.RATIO);

		initEEnum(signedFormatEEnum, SignedFormat.class, "SignedFormat");
		addEEnumLiteral(signedFormatEEnum, SignedFormat.UNSIGNED);
		addEEnumLiteral(signedFormatEEnum, SignedFormat.OFFSET_BINARY);
		addEEnumLiteral(signedFormatEEnum, SignedFormat.TWOS_COMPLEMENT);
		addEEnumLiteral(signedFormatEEnum, SignedFormat.SIGN_MAGNITUDE);

		initEEnum(codingSchemeEEnum, CodingScheme.class, "CodingScheme");
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.BINARY);
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.THERMOMETER);
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.ONE_HOT);
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.ONE_COLD);
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.GRAY);
		addEEnumLiteral(codingSchemeEEnum, CodingScheme.SEGMENTED);

		initEEnum(switchPolarityEEnum, SwitchPolarity.class, "SwitchPolarity");
		addEEnumLiteral(switchPolarityEEnum, SwitchPolarity.ACTIVE_HIGH);
		addEEnumLiteral(switchPolarityEEnum, SwitchPolarity.ACTIVE_LOW);

		initEEnum(unarySequenceEEnum, UnarySequence.class, "UnarySequence");
		addEEnumLiteral(unarySequenceEEnum, UnarySequence.SEQUENTIAL);
		addEEnumLiteral(unarySequenceEEnum, UnarySequence.SYMMETRIC);
		addEEnumLiteral(unarySequenceEEnum, UnarySequence.HIERARCHICAL);
		addEEnumLiteral(unarySequenceEEnum, UnarySequence.OPTIMISED);

		initEEnum(mismatchSpecEEnum, MismatchSpec.class, "MismatchSpec");
		addEEnumLiteral(mismatchSpecEEnum, MismatchSpec.RELATIVE_SIGMA);
		addEEnumLiteral(mismatchSpecEEnum, MismatchSpec.PELGROM);

		initEEnum(switchPlacementEEnum, SwitchPlacement.class, "SwitchPlacement");
		addEEnumLiteral(switchPlacementEEnum, SwitchPlacement.DRAIN_SIDE);
		addEEnumLiteral(switchPlacementEEnum, SwitchPlacement.SOURCE_SIDE);

		initEEnum(inlDefinitionEEnum, InlDefinition.class, "InlDefinition");
		addEEnumLiteral(inlDefinitionEEnum, InlDefinition.ENDPOINT);
		addEEnumLiteral(inlDefinitionEEnum, InlDefinition.BEST_FIT);
		addEEnumLiteral(inlDefinitionEEnum, InlDefinition.ABSOLUTE);

		initEEnum(productionSearchEEnum, ProductionSearch.class, "ProductionSearch");
		addEEnumLiteral(productionSearchEEnum, ProductionSearch.BINARY_SEARCH);
		addEEnumLiteral(productionSearchEEnum, ProductionSearch.LINEAR_SEARCH);

		initEEnum(steppingEEnum, Stepping.class, "Stepping");
		addEEnumLiteral(steppingEEnum, Stepping.DIRECT);
		addEEnumLiteral(steppingEEnum, Stepping.ONE_CODE_AT_ATIME);

		// Create resource
		createResource(eNS_URI);

		// Create annotations
		// http://www.eclipse.org/emf/2002/Ecore
		createEcoreAnnotations();
	}

	/**
	 * Initializes the annotations for <b>http://www.eclipse.org/emf/2002/Ecore</b>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void createEcoreAnnotations() {
		String source = "http://www.eclipse.org/emf/2002/Ecore";
		addAnnotation
		  (chipSpecEClass,
		   source,
		   new String[] {
			   "constraints", "uniqueBlockNames"
		   });
		addAnnotation
		  (blockEClass,
		   source,
		   new String[] {
			   "constraints", "uniqueRegisterNames uniqueRegisterAddresses"
		   });
		addAnnotation
		  (registerEClass,
		   source,
		   new String[] {
			   "constraints", "validWidth noOverlappingFields uniqueFieldNames"
		   });
		addAnnotation
		  (fieldEClass,
		   source,
		   new String[] {
			   "constraints", "bitsInsideRegister resetCodeInRange trimIsWritable analysable rangeCoversSpread stepMeetsAccuracy residualMeetsAccuracy monotonicRisk linearityYield selectCodesLegal glitchWithinLimit searchNeedsMonotonic codesInsideSafeLimits"
		   });
	}

} //TrimwrightPackageImpl
