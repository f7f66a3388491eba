package org.trimwright.engine.mismatch.sequence;

/**
 * Orders in which the unary elements of a field take their slots on a 1-D array (element i, the i-th to switch on,
 * sits in slot {@code sequence[i]}).
 * <ul>
 * <li>{@link #SEQUENTIAL}: slot i, left to right.</li>
 * <li>{@link #CENTRE_OUT}: the centre slot first, then alternately one step left and one step right.</li>
 * <li>{@link #MIRRORED_TREE}: our hierarchical order: the centre slot, then pairs of slots mirrored about the centre
 * (the two of a pair switch one after the other, which cancels a linear gradient after each pair); the pairs are
 * taken in bit-reversed order of their distance from the centre, so each run of pairs is spread over the whole
 * array like the levels of a binary tree, which averages a quadratic gradient early.</li>
 * <li>{@link #OPTIMISED}: found by our own search: a greedy build that each time takes the free slot keeping the
 * running INL smallest, then pairwise swaps while they lower the objective (see {@link SwitchingSequences}).</li>
 * </ul>
 */
public enum SequenceKind {
    SEQUENTIAL("sequential"),
    CENTRE_OUT("centre-out"),
    MIRRORED_TREE("mirrored-tree"),
    OPTIMISED("optimised");

    private final String key;

    SequenceKind(String key) {
        this.key = key;
    }

    /** Name used in JSON and on the command line. */
    public String key() {
        return key;
    }
}
