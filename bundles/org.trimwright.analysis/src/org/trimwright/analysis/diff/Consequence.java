package org.trimwright.analysis.diff;

import java.util.List;

/**
 * What a change does, read from the old and the new field reports.
 *
 * @param oldCodes          codes of the old field (2^n)
 * @param newCodes          codes of the new field
 * @param changedCodes      codes present in both whose nominal value (step table) differs
 * @param pNonMonotonicOld  old P(non-monotonic) (exact where the engine has it, else union bound), NaN if none
 * @param pNonMonotonicNew  new P(non-monotonic)
 * @param riskMethod        which figure the P values are (new version's)
 * @param dnlYieldOld       old P(max|DNL| &lt; limit), NaN if none
 * @param dnlYieldNew       new one
 * @param inlYieldOld       old P(max|INL| &lt; limit) under the field's INL definition, NaN if none
 * @param inlYieldNew       new one
 * @param inlDefinition     the new version's INL definition key
 */
public record Consequence(int oldCodes, int newCodes, List<Integer> changedCodes, double pNonMonotonicOld,
        double pNonMonotonicNew, String riskMethod, double dnlYieldOld, double dnlYieldNew, double inlYieldOld,
        double inlYieldNew, String inlDefinition) {

    public Consequence {
        changedCodes = List.copyOf(changedCodes);
    }

    /** "up", "down" or "same" for P(non-monotonic); "unknown" when either figure is missing. */
    public String riskDirection() {
        return direction(pNonMonotonicOld, pNonMonotonicNew);
    }

    /** "up", "down", "same" or "unknown" for a pair of figures. */
    public static String direction(double oldValue, double newValue) {
        if (Double.isNaN(oldValue) || Double.isNaN(newValue)) {
            return "unknown";
        }
        return newValue > oldValue ? "up" : newValue < oldValue ? "down" : "same";
    }

    /** The changed codes as ranges, e.g. "0..31, 40". */
    public String changedCodesText() {
        StringBuilder sb = new StringBuilder();
        int i = 0;
        while (i < changedCodes.size()) {
            int j = i;
            while (j + 1 < changedCodes.size() && changedCodes.get(j + 1) == changedCodes.get(j) + 1) {
                j++;
            }
            sb.append(sb.length() == 0 ? "" : ", ").append(changedCodes.get(i));
            if (j > i) {
                sb.append("..").append(changedCodes.get(j));
            }
            i = j + 1;
        }
        return sb.toString();
    }
}
