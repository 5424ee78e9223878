package org.chirocore.orient;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;

/**
 * The bases of a matroid numbered as SAT variables: variable k (1-based) is the k-th basis in
 * lexicographic order of sorted tuples (the numbering fixed by the certificate format). Lookup
 * of a subset's variable costs O(rank) through the colexicographic rank of the subset, which
 * indexes a table of C(size, rank) ints; building the index costs C(size, rank) basis tests.
 *
 * <p>Holds at most 64 elements and {@value #MAX_SUBSETS} candidate subsets. Immutable.
 */
public final class BasisIndex {
    /** Largest C(size, rank) for which the subset table is built: {@link Limits#INDEXED_SUBSETS}. */
    public static final long MAX_SUBSETS = Limits.INDEXED_SUBSETS;

    private final List<String> labels;
    private final int size;
    private final int rank;
    private final long[] bases;
    private final int[] variableByColex;
    /** binomial[i][k] = C(i, k) for 0 ≤ i ≤ size, 0 ≤ k ≤ rank. */
    private final long[][] binomial;

    private BasisIndex(Matroid m) {
        this.labels = m.labels();
        this.size = m.size();
        this.rank = m.rank();
        long subsets = ElementSets.binomial(size, rank);
        if (size > Limits.ELEMENTS || subsets > MAX_SUBSETS) {
            throw new EnumerationLimitException("A matroid of rank " + rank + " on " + size + " elements has "
                    + (subsets == Long.MAX_VALUE ? "too many" : Long.toString(subsets)) + " candidate bases; at most "
                    + MAX_SUBSETS + " on at most 64 elements are enumerated. Reduce it to a smaller minor first.");
        }
        this.binomial = new long[size + 1][rank + 1];
        for (int i = 0; i <= size; i++) {
            binomial[i][0] = 1;
            for (int k = 1; k <= Math.min(i, rank); k++) {
                binomial[i][k] = binomial[i - 1][k - 1] + (k <= i - 1 ? binomial[i - 1][k] : 0);
            }
        }
        this.variableByColex = new int[(int) subsets];
        List<Long> found = new ArrayList<>();
        int[] comb = ElementSets.range(rank);
        do {
            if (m.isBasis(comb)) {
                found.add(ElementSets.mask(comb));
                variableByColex[colex(comb)] = found.size();
            }
        } while (ElementSets.nextCombination(comb, size));
        this.bases = found.stream().mapToLong(Long::longValue).toArray();
    }

    /**
     * Enumerates the bases of {@code m}.
     *
     * @throws EnumerationLimitException when {@code m} has more than 64 elements or more than
     *     {@link #MAX_SUBSETS} candidate subsets
     */
    public static BasisIndex of(Matroid m) {
        return new BasisIndex(m);
    }

    private int colex(int[] sorted) {
        long r = 0;
        for (int i = 0; i < sorted.length; i++) {
            r += binomial[sorted[i]][i + 1];
        }
        return (int) r;
    }

    /** The variable (1-based) of the basis with this mask, or 0 when the set is not a basis. */
    public int variable(long mask) {
        if (Long.bitCount(mask) != rank) {
            return 0;
        }
        long r = 0;
        int i = 1;
        for (long m = mask; m != 0; m &= m - 1) {
            r += binomial[Long.numberOfTrailingZeros(m)][i++];
        }
        return variableByColex[(int) r];
    }

    public List<String> labels() {
        return labels;
    }

    public int size() {
        return size;
    }

    public int rank() {
        return rank;
    }

    /** The number of bases, which is also the number of variables. */
    public int basisCount() {
        return bases.length;
    }

    /** The basis of variable {@code v} (1-based), as a mask. */
    public long basis(int v) {
        return bases[v - 1];
    }

    /** All bases as masks, in lexicographic (variable) order. */
    public long[] bases() {
        return bases.clone();
    }

    /**
     * The chirotope of the restriction to {@code active}, read from a sign per variable: the bases
     * inside {@code active}, renumbered to 0..|active|−1 in increasing order (which keeps the
     * lexicographic order), with their signs.
     *
     * @param signs one sign (+1 / −1) per variable, index v − 1
     * @param active the mask of the restriction's elements; must have full rank
     */
    public Chirotope chirotope(byte[] signs, long active) {
        int[] kept = ElementSets.elements(active);
        int[] newIndex = new int[size];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < kept.length; i++) {
            newIndex[kept[i]] = i;
            names.add(labels.get(kept[i]));
        }
        List<Long> outBases = new ArrayList<>();
        List<Byte> outSigns = new ArrayList<>();
        for (int v = 1; v <= bases.length; v++) {
            long b = bases[v - 1];
            if ((b & ~active) == 0) {
                long renumbered = 0;
                for (long m = b; m != 0; m &= m - 1) {
                    renumbered |= 1L << newIndex[Long.numberOfTrailingZeros(m)];
                }
                outBases.add(renumbered);
                outSigns.add(signs[v - 1]);
            }
        }
        byte[] s = new byte[outSigns.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = outSigns.get(i);
        }
        return new Chirotope(names, rank, outBases.stream().mapToLong(Long::longValue).toArray(), s);
    }
}
