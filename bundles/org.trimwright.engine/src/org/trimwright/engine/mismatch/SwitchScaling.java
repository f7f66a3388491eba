package org.trimwright.engine.mismatch;

/**
 * How the switch of an element of k units contributes to its absolute variance, given the switch share s_sw
 * (a relative sigma).
 * <ul>
 * <li>{@link #PER_ELEMENT}: one switch per element whose relative error does not shrink with the element:
 * variance (k s_sw)^2 units^2.</li>
 * <li>{@link #SCALED_WITH_ELEMENT}: the switch is built of k unit switches in parallel, each with relative sigma
 * s_sw: variance k s_sw^2 units^2 (behaves like a larger unit sigma).</li>
 * </ul>
 */
public enum SwitchScaling {
    PER_ELEMENT,
    SCALED_WITH_ELEMENT
}
