package org.trimwright.engine.mismatch.sizing;

/**
 * Trim sizing figures (physical values in the request's unit).
 *
 * @param unit                 unit of the values
 * @param range                range the trim must span: spreadHigh - spreadLow
 * @param maxStep              largest step meeting the accuracy: 2 accuracy / (1 + max|DNL|)
 * @param bitsNeeded           smallest width whose step range / (2^n - 1) is at most maxStep
 * @param bits                 the width the figures below are for (the field's if fixed, else bitsNeeded)
 * @param step                 range / (2^bits - 1)
 * @param residualWorst        step (1 + max|DNL|) / 2: half the widest gap between adjacent levels
 * @param residualRms          step / sqrt(12) * sqrt(1 + 3 sigma_DNL^2) (uniform target over gaps of random width)
 * @param meetsAccuracy        residualWorst &lt;= accuracy
 * @param search               "binary" or "linear"
 * @param measurements         measurements of the chosen search: bits (binary) or 2^bits - 1 (linear)
 * @param linearMeasurements   2^bits - 1
 * @param binarySearchRisk     probability that the transfer has a negative step, which can mislead a binary search
 *                             (0 when monotonic by construction)
 * @param note                 the reasoning in words
 */
public record SizingResult(String unit, double range, double maxStep, int bitsNeeded, int bits, double step,
        double residualWorst, double residualRms, boolean meetsAccuracy, String search, long measurements,
        long linearMeasurements, double binarySearchRisk, String note) {
}
