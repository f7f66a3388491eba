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
 * A representation of the literals of the enumeration '<em><b>Signed Format</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightPackage#getSignedFormat()
 * @model
 * @generated
 */
public enum SignedFormat implements Enumerator {
	/**
	 * The '<em><b>Unsigned</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #UNSIGNED_VALUE
	 * @generated
	 * @ordered
	 */
	UNSIGNED(0, "unsigned", "unsigned"),

	/**
	 * The '<em><b>Offset Binary</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #OFFSET_BINARY_VALUE
	 * @generated
	 * @ordered
	 */
	OFFSET_BINARY(1, "offsetBinary", "offsetBinary"),

	/**
	 * The '<em><b>Twos Complement</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #TWOS_COMPLEMENT_VALUE
	 * @generated
	 * @ordered
	 */
	TWOS_COMPLEMENT(2, "twosComplement", "twosComplement"),

	/**
	 * The '<em><b>Sign Magnitude</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SIGN_MAGNITUDE_VALUE
	 * @generated
	 * @ordered
	 */
	SIGN_MAGNITUDE(3, "signMagnitude", "signMagnitude");

	/**
	 * The '<em><b>Unsigned</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #UNSIGNED
	 * @model name="unsigned"
	 * @generated
	 * @ordered
	 */
	public static final int UNSIGNED_VALUE = 0;

	/**
	 * The '<em><b>Offset Binary</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #OFFSET_BINARY
	 * @model name="offsetBinary"
	 * @generated
	 * @ordered
	 */
	public static final int OFFSET_BINARY_VALUE = 1;

	/**
	 * The '<em><b>Twos Complement</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #TWOS_COMPLEMENT
	 * @model name="twosComplement"
	 * @generated
	 * @ordered
	 */
	public static final int TWOS_COMPLEMENT_VALUE = 2;

	/**
	 * The '<em><b>Sign Magnitude</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SIGN_MAGNITUDE
	 * @model name="signMagnitude"
	 * @generated
	 * @ordered
	 */
	public static final int SIGN_MAGNITUDE_VALUE = 3;

	/**
	 * An array of all the '<em><b>Signed Format</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SignedFormat[] VALUES_ARRAY =
		new SignedFormat[] {
			UNSIGNED,
			OFFSET_BINARY,
			TWOS_COMPLEMENT,
			SIGN_MAGNITUDE,
		};

	/**
	 * A public read-only list of all the '<em><b>Signed Format</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SignedFormat> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Signed Format</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SignedFormat get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SignedFormat result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Signed Format</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SignedFormat getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SignedFormat result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Signed Format</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SignedFormat get(int value) {
		switch (value) {
			case UNSIGNED_VALUE: return UNSIGNED;
			case OFFSET_BINARY_VALUE: return OFFSET_BINARY;
			case TWOS_COMPLEMENT_VALUE: return TWOS_COMPLEMENT;
			case SIGN_MAGNITUDE_VALUE: return SIGN_MAGNITUDE;
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
	private SignedFormat(int value, String name, String literal) {
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
	
} //SignedFormat
