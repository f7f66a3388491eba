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
 * A representation of the literals of the enumeration '<em><b>Switch Polarity</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightPackage#getSwitchPolarity()
 * @model
 * @generated
 */
public enum SwitchPolarity implements Enumerator {
	/**
	 * The '<em><b>Active High</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ACTIVE_HIGH_VALUE
	 * @generated
	 * @ordered
	 */
	ACTIVE_HIGH(0, "activeHigh", "activeHigh"),

	/**
	 * The '<em><b>Active Low</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ACTIVE_LOW_VALUE
	 * @generated
	 * @ordered
	 */
	ACTIVE_LOW(1, "activeLow", "activeLow");

	/**
	 * The '<em><b>Active High</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ACTIVE_HIGH
	 * @model name="activeHigh"
	 * @generated
	 * @ordered
	 */
	public static final int ACTIVE_HIGH_VALUE = 0;

	/**
	 * The '<em><b>Active Low</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ACTIVE_LOW
	 * @model name="activeLow"
	 * @generated
	 * @ordered
	 */
	public static final int ACTIVE_LOW_VALUE = 1;

	/**
	 * An array of all the '<em><b>Switch Polarity</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SwitchPolarity[] VALUES_ARRAY =
		new SwitchPolarity[] {
			ACTIVE_HIGH,
			ACTIVE_LOW,
		};

	/**
	 * A public read-only list of all the '<em><b>Switch Polarity</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SwitchPolarity> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Switch Polarity</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPolarity get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SwitchPolarity result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Switch Polarity</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPolarity getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SwitchPolarity result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Switch Polarity</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPolarity get(int value) {
		switch (value) {
			case ACTIVE_HIGH_VALUE: return ACTIVE_HIGH;
			case ACTIVE_LOW_VALUE: return ACTIVE_LOW;
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
	private SwitchPolarity(int value, String name, String literal) {
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
	
} //SwitchPolarity
