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
 * A representation of the literals of the enumeration '<em><b>Switch Placement</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.trimwright.model.TrimwrightPackage#getSwitchPlacement()
 * @model
 * @generated
 */
public enum SwitchPlacement implements Enumerator {
	/**
	 * The '<em><b>Drain Side</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #DRAIN_SIDE_VALUE
	 * @generated
	 * @ordered
	 */
	DRAIN_SIDE(0, "drainSide", "drainSide"),

	/**
	 * The '<em><b>Source Side</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SOURCE_SIDE_VALUE
	 * @generated
	 * @ordered
	 */
	SOURCE_SIDE(1, "sourceSide", "sourceSide");

	/**
	 * The '<em><b>Drain Side</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #DRAIN_SIDE
	 * @model name="drainSide"
	 * @generated
	 * @ordered
	 */
	public static final int DRAIN_SIDE_VALUE = 0;

	/**
	 * The '<em><b>Source Side</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SOURCE_SIDE
	 * @model name="sourceSide"
	 * @generated
	 * @ordered
	 */
	public static final int SOURCE_SIDE_VALUE = 1;

	/**
	 * An array of all the '<em><b>Switch Placement</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final SwitchPlacement[] VALUES_ARRAY =
		new SwitchPlacement[] {
			DRAIN_SIDE,
			SOURCE_SIDE,
		};

	/**
	 * A public read-only list of all the '<em><b>Switch Placement</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<SwitchPlacement> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Switch Placement</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPlacement get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SwitchPlacement result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Switch Placement</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPlacement getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			SwitchPlacement result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Switch Placement</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static SwitchPlacement get(int value) {
		switch (value) {
			case DRAIN_SIDE_VALUE: return DRAIN_SIDE;
			case SOURCE_SIDE_VALUE: return SOURCE_SIDE;
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
	private SwitchPlacement(int value, String name, String literal) {
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
	
} //SwitchPlacement
