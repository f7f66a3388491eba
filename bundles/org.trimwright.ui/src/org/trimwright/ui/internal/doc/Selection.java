package org.trimwright.ui.internal.doc;

import org.eclipse.emf.ecore.EObject;

/**
 * An element of an open spec: what a spec editor has selected, or what another part asks it to reveal.
 *
 * @param document the open spec
 * @param element  a chip spec, block, register or field of that spec (or null for none)
 */
public record Selection(SpecDocument document, EObject element) {
}
