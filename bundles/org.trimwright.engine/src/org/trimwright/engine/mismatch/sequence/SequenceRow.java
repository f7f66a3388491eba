package org.trimwright.engine.mismatch.sequence;

/**
 * Systematic INL that a gradient leaves with one switching sequence, as max|INL| over all levels of the field
 * (mean element values, no random mismatch), in LSB.
 *
 * @param sequence        sequence key
 * @param linearEndpoint  endpoint INL from the linear part of the gradient alone
 * @param quadraticEndpoint endpoint INL from the quadratic part alone
 * @param endpoint        endpoint INL from both parts
 * @param bestFit         best-fit INL from both parts
 * @param absolute        absolute INL from both parts
 * @param improvement     sequential's combined endpoint INL divided by this one's (1 for sequential; infinite if 0)
 * @param slots           slot of the i-th switched unary element
 */
public record SequenceRow(String sequence, double linearEndpoint, double quadraticEndpoint, double endpoint,
        double bestFit, double absolute, double improvement, int[] slots) {

    public SequenceRow {
        slots = slots.clone();
    }

    @Override
    public int[] slots() {
        return slots.clone();
    }
}
