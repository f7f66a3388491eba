package org.trimwright.engine.mismatch;

/**
 * What a Pelgrom mismatch coefficient describes.
 * <ul>
 * <li>{@link #PAIR}: A is the sigma of the relative difference of two identical devices, sigma(dX/X) = A / sqrt(WL);
 * one device then has A / sqrt(2) (the difference of two independent devices has twice the variance).</li>
 * <li>{@link #SINGLE_DEVICE}: A is already the relative sigma of one device, sigma(X)/X = A / sqrt(WL).</li>
 * </ul>
 */
public enum CoefficientBasis {
    PAIR,
    SINGLE_DEVICE
}
