package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;

/**
 * A sign assignment on the bases of a matroid: one sign (+1 or −1) for every basis, listed in
 * the canonical order (sorted tuples, lexicographic). It is a chirotope, and so an orientation
 * witness, once its support is exactly the bases and every 3-term Grassmann–Plücker relation
 * holds ([BLSWZ, Thm. 3.6.2]); {@link WitnessCheck} decides that. Immutable.
 */
public final class Chirotope {
    private final List<String> labels;
    private final int rank;
    private final List<ElementSet> bases;
    private final byte[] signs;

    /**
     * @param bases the bases in canonical order
     * @param signs one sign (+1 or −1) per basis, in the same order
     */
    public Chirotope(List<String> labels, int rank, List<ElementSet> bases, byte[] signs) {
        if (bases.size() != signs.length) {
            throw new IllegalArgumentException("A chirotope needs one sign per basis: " + bases.size() + " bases, "
                    + signs.length + " signs.");
        }
        for (byte s : signs) {
            if (s != 1 && s != -1) {
                throw new IllegalArgumentException("Basis signs must be +1 or -1, not " + s + ".");
            }
        }
        this.labels = List.copyOf(labels);
        this.rank = rank;
        this.bases = List.copyOf(bases);
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
        return bases.size();
    }

    /** Basis {@code i} in canonical order. */
    public ElementSet basis(int i) {
        return bases.get(i);
    }

    /** The sign of basis {@code i}. */
    public int sign(int i) {
        return signs[i];
    }

    /** The bases in canonical order, as sorted tuples. */
    public List<int[]> bases() {
        List<int[]> out = new ArrayList<>(bases.size());
        for (ElementSet b : bases) {
            out.add(b.elements());
        }
        return out;
    }

    /** A copy of the signs in canonical order. */
    public byte[] signs() {
        return signs.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Chirotope c && c.rank == rank && c.labels.equals(labels) && c.bases.equals(bases)
                && Arrays.equals(c.signs, signs);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(signs) * 31 + bases.hashCode();
    }
}
