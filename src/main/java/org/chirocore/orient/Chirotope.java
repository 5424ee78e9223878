package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSets;

/**
 * A sign assignment on the bases of a matroid: one sign (+1 or −1) for every basis, listed in
 * the canonical order (sorted tuples, lexicographic). It is a chirotope, and so an orientation
 * witness, once its support is exactly the bases and every 3-term Grassmann–Plücker relation
 * holds ([BLSWZ, Thm. 3.6.2]); {@link WitnessCheck} decides that. Immutable.
 */
public final class Chirotope {
    private final List<String> labels;
    private final int rank;
    private final long[] bases;
    private final byte[] signs;

    /**
     * @param bases the bases as masks in canonical order
     * @param signs one sign (+1 or −1) per basis, in the same order
     */
    public Chirotope(List<String> labels, int rank, long[] bases, byte[] signs) {
        if (bases.length != signs.length) {
            throw new IllegalArgumentException("A chirotope needs one sign per basis: " + bases.length + " bases, "
                    + signs.length + " signs.");
        }
        for (byte s : signs) {
            if (s != 1 && s != -1) {
                throw new IllegalArgumentException("Basis signs must be +1 or -1, not " + s + ".");
            }
        }
        this.labels = List.copyOf(labels);
        this.rank = rank;
        this.bases = bases.clone();
        this.signs = signs.clone();
    }

    public List<String> labels() {
        return labels;
    }

    public int rank() {
        return rank;
    }

    /** The number of bases (and signs). */
    public int size() {
        return bases.length;
    }

    /** Basis {@code i} in canonical order, as a mask. */
    public long basis(int i) {
        return bases[i];
    }

    /** The sign of basis {@code i}. */
    public int sign(int i) {
        return signs[i];
    }

    /** The bases in canonical order, as sorted tuples. */
    public List<int[]> bases() {
        List<int[]> out = new ArrayList<>(bases.length);
        for (long b : bases) {
            out.add(ElementSets.elements(b));
        }
        return out;
    }

    /** A copy of the signs in canonical order. */
    public byte[] signs() {
        return signs.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Chirotope c && c.rank == rank && c.labels.equals(labels) && Arrays.equals(c.bases, bases)
                && Arrays.equals(c.signs, signs);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(signs) * 31 + Arrays.hashCode(bases);
    }
}
