package org.chirocore.orient;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;

/**
 * The bases of a matroid numbered as SAT variables: variable k (1-based) is the k-th basis in
 * lexicographic order of sorted tuples (the numbering fixed by the certificate format). Lookup
 * of a subset's variable costs O(rank) through the colexicographic rank of the subset, which
 * indexes a table of C(size, rank) ints; building the index costs C(size, rank) basis tests.
 *
 * <p>Holds at most {@link Limits#ELEMENTS} elements and {@value #MAX_SUBSETS} candidate subsets. Immutable.
 */
public final class BasisIndex {
    /** Largest C(size, rank) for which the subset table is built: {@link Limits#INDEXED_SUBSETS}. */
    public static final long MAX_SUBSETS = Limits.INDEXED_SUBSETS;

    private final List<String> labels;
    private final int size;
    private final int rank;
    private final ElementSet[] bases;
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
                    + MAX_SUBSETS + " on at most " + Limits.ELEMENTS + " elements are enumerated. Reduce it to a smaller minor first.");
        }
        this.binomial = new long[size + 1][rank + 1];
        for (int i = 0; i <= size; i++) {
            binomial[i][0] = 1;
            for (int k = 1; k <= Math.min(i, rank); k++) {
                binomial[i][k] = binomial[i - 1][k - 1] + (k <= i - 1 ? binomial[i - 1][k] : 0);
            }
        }
        this.variableByColex = new int[(int) subsets];
        List<ElementSet> found = new ArrayList<>();
        int[] comb = ElementSets.range(rank);
        do {
            if (m.isBasis(comb)) {
                found.add(ElementSet.of(comb));
                variableByColex[colex(comb)] = found.size();
            }
        } while (ElementSets.nextCombination(comb, size));
        this.bases = found.toArray(ElementSet[]::new);
    }

    /**
     * Enumerates the bases of {@code m}.
     *
     * @throws EnumerationLimitException when {@code m} has more than {@link Limits#ELEMENTS} elements or more than
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

    /** The variable (1-based) of {@code set}, or 0 when it is not a basis. */
    public int variable(ElementSet set) {
        return variable(set.elements());
    }

    /**
     * The variable (1-based) of the set with these elements in increasing order (all below
     * {@link #size}), or 0 when it is not a basis.
     */
    public int variable(int[] sorted) {
        boolean inside = sorted.length == 0 || (sorted[0] >= 0 && sorted[sorted.length - 1] < size);
        return sorted.length == rank && inside ? variableByColex[colex(sorted)] : 0;
    }

    /**
     * The variable of X ∪ {p, q} without building the set, for the relation scan's inner loop:
     * {@code x} sorted, p < q outside X, |X| = rank − 2. The colexicographic rank adds C(e, i + 1)
     * for the element e at position i; an element of X moves up one position per element of
     * {p, q} below it.
     */
    int variable(int[] x, int p, int q) {
        long r = 0;
        int below = 0;
        for (int i = 0; i < x.length; i++) {
            int e = x[i];
            while (below < 2 && (below == 0 ? p : q) < e) {
                r += binomial[below == 0 ? p : q][i + below + 1];
                below++;
            }
            r += binomial[e][i + below + 1];
        }
        for (; below < 2; below++) {
            r += binomial[below == 0 ? p : q][x.length + below + 1];
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

    /** The basis of variable {@code v} (1-based). */
    public ElementSet basis(int v) {
        return bases[v - 1];
    }

    /** All bases in lexicographic (variable) order. */
    public List<ElementSet> bases() {
        return List.of(bases);
    }

    /**
     * The chirotope of the restriction to {@code active}, read from a sign per variable: the bases
     * inside {@code active}, renumbered to 0..|active|−1 in increasing order (which keeps the
     * lexicographic order), with their signs.
     *
     * @param signs one sign (+1 / −1) per variable, index v − 1
     * @param active the restriction's elements; must have full rank
     */
    public Chirotope chirotope(byte[] signs, ElementSet active) {
        int[] kept = active.elements();
        int[] newIndex = new int[size];
        List<String> names = new ArrayList<>();
        for (int i = 0; i < kept.length; i++) {
            newIndex[kept[i]] = i;
            names.add(labels.get(kept[i]));
        }
        List<ElementSet> outBases = new ArrayList<>();
        List<Byte> outSigns = new ArrayList<>();
        for (int v = 1; v <= bases.length; v++) {
            ElementSet b = bases[v - 1];
            if (b.isSubsetOf(active)) {
                int[] renumbered = b.elements();
                for (int i = 0; i < renumbered.length; i++) {
                    renumbered[i] = newIndex[renumbered[i]];
                }
                outBases.add(ElementSet.of(renumbered));
                outSigns.add(signs[v - 1]);
            }
        }
        byte[] s = new byte[outSigns.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = outSigns.get(i);
        }
        return new Chirotope(names, rank, outBases, s);
    }
}
