package org.trimwright.engine.mismatch.sizing;

/**
 * One split of an n-bit field into M unary and B = n - M binary bits.
 *
 * @param unaryBits        M
 * @param binaryBits       B
 * @param unaryElements    2^M - 1
 * @param switches         switched elements: 2^M - 1 + B
 * @param decoderNand2Eq   decoder NAND2 equivalents (from the coding engine)
 * @param cost             decoderNand2Eq + switches * switch NAND2 equivalents
 * @param sigmaDnlWorst    worst exact DNL sigma (LSB)
 * @param monotonicGuaranteed true for M = n (thermometer)
 * @param pNonMonotonicBound union bound over distinct steps
 * @param pNonMonotonicMc  Monte Carlo estimate
 * @param pNonMonotonicMcHigh upper end of its 95 % Wilson interval
 * @param dnlYield         Monte Carlo P(max|DNL| &lt; limit)
 * @param inlYieldEndpoint Monte Carlo P(max|INL| &lt; limit), endpoint
 * @param inlYieldBestFit  same, best fit
 * @param inlYieldAbsolute same, absolute
 * @param passYield        Monte Carlo fraction meeting monotonicity, DNL and INL (limit's definition) at once
 * @param trials           trials used for this row
 * @param meetsLimits      P(non-monotonic) proven within its limit (union bound or Monte Carlo upper end) and
 *                         passYield at least the target yield
 */
public record SegmentationRow(int unaryBits, int binaryBits, int unaryElements, int switches, double decoderNand2Eq,
        double cost, double sigmaDnlWorst, boolean monotonicGuaranteed, double pNonMonotonicBound,
        double pNonMonotonicMc, double pNonMonotonicMcHigh, double dnlYield, double inlYieldEndpoint,
        double inlYieldBestFit, double inlYieldAbsolute, double passYield, long trials, boolean meetsLimits) {
}
