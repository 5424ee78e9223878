package org.chirocore.report;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * A certificate's core as a matroid given by its bases, with the derived facts a report prints:
 * its non-bases and, in rank 3, its lines. Sets of elements are bit masks (a core has at most 64
 * elements). Immutable.
 */
public final class Core {
    /** Largest number of r-subsets enumerated to list the non-bases. */
    static final long MAX_SUBSETS = 1_000_000;

    private final int rank;
    private final List<String> labels;
    private final Set<Long> bases;

    /**
     * The matroid of rank {@code rank} on the elements {@code labels} with the given bases.
     *
     * @param bases the bases as bit masks over the elements
     * @throws IllegalArgumentException when there are more than 64 elements or a basis names an
     *     element beyond them
     */
    public Core(int rank, List<String> labels, long[] bases) {
        if (labels.size() > 64) {
            throw new IllegalArgumentException("A core has at most 64 elements, found " + labels.size() + ".");
        }
        for (long b : bases) {
            if (labels.size() < 64 && b >>> labels.size() != 0) {
                throw new IllegalArgumentException("A basis names an element beyond the " + labels.size() + " elements.");
            }
        }
        this.rank = rank;
        this.labels = List.copyOf(labels);
        Set<Long> set = new HashSet<>();
        for (long b : bases) {
            set.add(b);
        }
        this.bases = Set.copyOf(set);
    }

    /** The rank r. */
    public int rank() {
        return rank;
    }

    /** The element labels, in element order. */
    public List<String> labels() {
        return labels;
    }

    /** The number of bases. */
    public int basisCount() {
        return bases.size();
    }

    /** C(k, r), the number of r-subsets of the k elements, saturated at {@code Long.MAX_VALUE}. */
    public long subsetCount() {
        long c = 1;
        for (int i = 0; i < rank; i++) {
            if (c > Long.MAX_VALUE / labels.size()) {
                return Long.MAX_VALUE;
            }
            c = c * (labels.size() - i) / (i + 1);
        }
        return c;
    }

    /** The number of non-bases, C(k, r) minus the bases (saturated as {@link #subsetCount}). */
    public long nonBasisCount() {
        long all = subsetCount();
        return all == Long.MAX_VALUE ? all : all - bases.size();
    }

    /**
     * The non-bases (r-subsets that are not bases) in lexicographic order, or empty when there are
     * more than {@code limit} r-subsets to enumerate. Cost: O(C(k, r)).
     */
    Optional<List<Long>> nonBases(long limit) {
        if (subsetCount() > limit) {
            return Optional.empty();
        }
        List<Long> out = new ArrayList<>();
        subsets(0, rank, 0L, out);
        return Optional.of(out);
    }

    /** {@link #nonBases(long)} with the limit {@value #MAX_SUBSETS}. */
    public Optional<List<Long>> nonBases() {
        return nonBases(MAX_SUBSETS);
    }

    private void subsets(int from, int left, long set, List<Long> out) {
        if (left == 0) {
            if (!bases.contains(set)) {
                out.add(set);
            }
            return;
        }
        for (int e = from; e <= labels.size() - left; e++) {
            subsets(e + 1, left - 1, set | 1L << e, out);
        }
    }

    /**
     * For rank 3: the lines, i.e. the maximal sets of at least 3 collinear elements. The closure
     * of an independent pair {a, b} is {a, b} plus every c with {a, b, c} a non-basis; the lines
     * are the distinct such closures with at least 3 elements, ordered by their smallest elements.
     * Cost: O(k³).
     *
     * @throws IllegalStateException when the rank is not 3
     */
    public List<Long> lines() {
        if (rank != 3) {
            throw new IllegalStateException("Lines are defined here for rank 3 only, but the rank is " + rank + ".");
        }
        int k = labels.size();
        Set<Long> lines = new LinkedHashSet<>();
        for (int a = 0; a < k; a++) {
            for (int b = a + 1; b < k; b++) {
                long pair = 1L << a | 1L << b;
                long closure = pair;
                boolean independent = false;
                for (int c = 0; c < k; c++) {
                    if (c != a && c != b) {
                        if (bases.contains(pair | 1L << c)) {
                            independent = true;
                        } else {
                            closure |= 1L << c;
                        }
                    }
                }
                if (independent && Long.bitCount(closure) >= 3) {
                    lines.add(closure);
                }
            }
        }
        return List.copyOf(lines);
    }

    /** The labels of the elements of {@code mask}, in element order. */
    public List<String> labelsOf(long mask) {
        List<String> out = new ArrayList<>();
        for (int e = 0; e < labels.size(); e++) {
            if ((mask >>> e & 1) != 0) {
                out.add(labels.get(e));
            }
        }
        return out;
    }

    /** The set {@code mask} written {a, b, c}. */
    public String setText(long mask) {
        return "{" + String.join(", ", labelsOf(mask)) + "}";
    }
}
