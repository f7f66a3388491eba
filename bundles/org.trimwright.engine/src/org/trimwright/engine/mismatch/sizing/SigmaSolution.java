package org.trimwright.engine.mismatch.sizing;

/**
 * Answer to "how large may the unit sigma be".
 *
 * @param unitSigma        largest unit relative sigma (fraction) whose Monte Carlo joint yield meets the target
 * @param achievedYield    the joint yield at that sigma
 * @param targetYield      the target
 * @param minimumAreaUm2   smallest unit area from the Pelgrom coefficient (NaN if none given)
 * @param iterations       bisection steps
 * @param trials           trials per evaluation
 * @param method           the method in words
 */
public record SigmaSolution(double unitSigma, double achievedYield, double targetYield, double minimumAreaUm2,
        int iterations, long trials, String method) {
}
