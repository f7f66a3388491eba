package org.trimwright.engine.mismatch.sizing;

import java.util.List;

/**
 * Segmentation advice for an n-bit field.
 *
 * @param bits            field width
 * @param rows            one row per split M = 0..n
 * @param cheapestMeeting M of the cheapest split that meets the limits, or -1 if none does
 * @param method          how the figures were obtained
 */
public record SegmentationAdvice(int bits, List<SegmentationRow> rows, int cheapestMeeting, String method) {

    public SegmentationAdvice {
        rows = List.copyOf(rows);
    }
}
