/**
 * Copyright (c) 2026 Trimwright contributors. SPDX-License-Identifier: EPL-2.0
 */
package org.trimwright.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Mismatch Spec</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightPackage#getMismatchSpec()
 * @model
 * @generated
 */
public enum MismatchSpec implements Enumerator {
	/**
	 * The '<em><b>Relative Sigma</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RELATIVE_SIGMA_VALUE
	 * @generated
	 * @ordered
	 */
	RELATIVE_SIGMA(0, "relativeSigma", "relativeSigma"),

	/**
	 * The '<em><b>Pelgrom</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #PELGROM_VALUE
	 * @generated
	 * @ordered
	 */
	PELGROM(1, "pelgrom", "pelgrom");

	/**
	 * The '<em><b>Relative Sigma</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RELATIVE_SIGMA
	 * @model name="relativeSigma"
	 * @generated
	 * @ordered
	 */
	public static final int RELATIVE_SIGMA_VALUE = 0;

	/**
	 * The '<em><b>Pelgrom</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #PELGROM
	 * @model name="pelgrom"
	 * @generated
	 * @ordered
	 */
	public static final int PELGROM_VALUE = 1;

	/**
	 * An array of all the '<em><b>Mismatch Spec</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final MismatchSpec[] VALUES_ARRAY =
		new MismatchSpec[] {
			RELATIVE_SIGMA,
			PELGROM,
		};

	/**
	 * A public read-only list of all the '<em><b>Mismatch Spec</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<MismatchSpec> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Mismatch Spec</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MismatchSpec get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			MismatchSpec result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Mismatch Spec</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MismatchSpec getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			MismatchSpec result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Mismatch Spec</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static MismatchSpec get(int value) {
		switch (value) {
			case RELATIVE_SIGMA_VALUE: return RELATIVE_SIGMA;
			case PELGROM_VALUE: return PELGROM;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private MismatchSpec(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
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
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //MismatchSpec
