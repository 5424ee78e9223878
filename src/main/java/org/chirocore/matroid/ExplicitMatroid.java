package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A matroid on at most 64 elements given by its list of bases. Construction checks the basis
 * axioms (non-empty family, equal sizes, basis exchange) and fails with an
 * {@link InvalidMatroidException} that names a failing item. Bases are kept in the canonical
 * order of the certificate format: sorted tuples in lexicographic order.
 *
 * <p>Rank queries cost O(|bases|); basis tests cost O(1). Immutable.
 */
public final class ExplicitMatroid implements Matroid {
    /** Largest ground set an explicit matroid holds: {@link Limits#ELEMENTS} (bases are 64-bit masks). */
    public static final int MAX_ELEMENTS = Limits.ELEMENTS;

    private final List<String> labels;
    private final int rank;
    /** Bases as masks, in lexicographic order of their sorted element tuples. */
    private final long[] bases;
    private final Set<Long> basisSet;

    private ExplicitMatroid(List<String> labels, int rank, long[] lexSortedBases) {
        this.labels = List.copyOf(labels);
        this.rank = rank;
        this.bases = lexSortedBases;
        this.basisSet = new HashSet<>();
        for (long b : lexSortedBases) {
            basisSet.add(b);
        }
    }

    /**
     * The matroid with the given bases.
     *
     * @throws InvalidMatroidException when the family is empty, a basis has the wrong size, an
     *     index is out of range or repeated, or basis exchange fails (the message names the pair)
     * @throws TooLargeException when more than {@link Limits#EXPLICIT_SUBSETS} bases are given
     */
    public static ExplicitMatroid fromBases(List<String> labels, int rank, Collection<int[]> bases) {
        checkGround(labels, rank);
        if (bases.size() > Limits.EXPLICIT_SUBSETS) {
            throw new TooLargeException(bases.size() + " bases are given; a matroid given by its bases has at most "
                    + Limits.EXPLICIT_SUBSETS + ".");
        }
        Set<Long> seen = new HashSet<>();
        List<Long> masks = new ArrayList<>();
        for (int[] b : bases) {
            long m = checkedMask(labels.size(), rank, b, "basis");
            if (seen.add(m)) {
                masks.add(m);
            }
        }
        if (masks.isEmpty()) {
            throw new InvalidMatroidException("The basis list is empty; a matroid has at least one basis.");
        }
        ExplicitMatroid m = new ExplicitMatroid(labels, rank, lexSorted(masks));
        m.checkExchange();
        return m;
    }

    /**
     * The matroid whose bases are all {@code rank}-subsets except the listed non-bases.
     *
     * @throws InvalidMatroidException as {@link #fromBases}
     * @throws TooLargeException before enumerating, when C(size, rank) exceeds {@link Limits#EXPLICIT_SUBSETS}
     */
    public static ExplicitMatroid fromNonBases(List<String> labels, int rank, Collection<int[]> nonBases) {
        checkGround(labels, rank);
        Limits.requireExplicit(labels.size(), rank, "The matroid");
        Set<Long> excluded = new HashSet<>();
        for (int[] b : nonBases) {
            excluded.add(checkedMask(labels.size(), rank, b, "non-basis"));
        }
        List<int[]> bases = new ArrayList<>();
        int[] comb = ElementSets.range(rank);
        if (rank <= labels.size()) {
            do {
                if (!excluded.contains(ElementSets.mask(comb))) {
                    bases.add(comb.clone());
                }
            } while (ElementSets.nextCombination(comb, labels.size()));
        }
        return fromBases(labels, rank, bases);
    }

    /**
     * Materialises any matroid on at most 64 elements by testing every {@code rank}-subset.
     * Costs C(size, rank) rank queries; the result is not re-checked, as a rank oracle is a
     * matroid by contract.
     */
    public static ExplicitMatroid of(Matroid m) {
        if (m instanceof ExplicitMatroid e) {
            return e;
        }
        checkGround(m.labels(), m.rank());
        List<Long> masks = new ArrayList<>();
        int[] comb = ElementSets.range(m.rank());
        do {
            if (m.isBasis(comb)) {
                masks.add(ElementSets.mask(comb));
            }
        } while (ElementSets.nextCombination(comb, m.size()));
        return new ExplicitMatroid(m.labels(), m.rank(), lexSorted(masks));
    }

    private static void checkGround(List<String> labels, int rank) {
        if (labels.size() > MAX_ELEMENTS) {
            throw new InvalidMatroidException("An explicit matroid holds at most " + MAX_ELEMENTS
                    + " elements, but " + labels.size() + " were given.");
        }
        if (new HashSet<>(labels).size() != labels.size()) {
            throw new InvalidMatroidException("Element labels must be distinct: " + labels + ".");
        }
        if (rank < 0 || rank > labels.size()) {
            throw new InvalidMatroidException("Rank " + rank + " is not between 0 and the number of elements, "
                    + labels.size() + ".");
        }
    }

    private static long checkedMask(int n, int rank, int[] set, String what) {
        if (set.length != rank) {
            throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set) + " has " + set.length
                    + " elements, but the rank is " + rank + ".");
        }
        long m = 0;
        for (int e : set) {
            if (e < 0 || e >= n) {
                throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set) + " names element " + e
                        + ", outside 0.." + (n - 1) + ".");
            }
            if ((m & (1L << e)) != 0) {
                throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set)
                        + " repeats element " + e + ".");
            }
            m |= 1L << e;
        }
        return m;
    }

    private static long[] lexSorted(List<Long> masks) {
        return masks.stream()
                .sorted((a, b) -> Arrays.compare(ElementSets.elements(a), ElementSets.elements(b)))
                .mapToLong(Long::longValue)
                .toArray();
    }

    /**
     * Basis exchange: for bases B1, B2 and x in B1 − B2 some y in B2 − B1 makes B1 − x + y a basis.
     * With I = B1 − x and K(I) = {y ∉ I : I + y is a basis} (which contains x), the exchange fails
     * for (B1, x, B2) exactly when B2 misses K(I): for x ∉ B2 the candidates y are B2 − I, and for
     * x ∈ B2 nothing is asked. So it suffices that no basis lies inside F = E − K(I), one test per
     * distinct F (in a matroid F is the hyperplane spanned by I) instead of one per pair of bases.
     * Costs O(|bases|·r·n) lookups plus, per distinct F, the smaller of C(|F|, r) lookups and a scan.
     */
    private void checkExchange() {
        long all = ElementSets.allMask(labels.size());
        Set<Long> seenI = new HashSet<>();
        Map<Long, long[]> exampleByF = new LinkedHashMap<>();
        for (long b1 : bases) {
            for (long xs = b1; xs != 0; xs &= xs - 1) {
                long x = Long.lowestOneBit(xs);
                long i = b1 & ~x;
                if (!seenI.add(i)) {
                    continue;
                }
                long k = 0;
                for (long ys = all & ~i; ys != 0; ys &= ys - 1) {
                    long y = Long.lowestOneBit(ys);
                    if (basisSet.contains(i | y)) {
                        k |= y;
                    }
                }
                exampleByF.putIfAbsent(all & ~k, new long[] {b1, x});
            }
        }
        for (Map.Entry<Long, long[]> entry : exampleByF.entrySet()) {
            long inside = basisInside(entry.getKey());
            if (inside != 0) {
                long b1 = entry.getValue()[0];
                long x = entry.getValue()[1];
                throw new InvalidMatroidException("Basis exchange fails: from basis "
                        + Arrays.toString(ElementSets.elements(b1)) + " remove element "
                        + Long.numberOfTrailingZeros(x) + "; no element of basis "
                        + Arrays.toString(ElementSets.elements(inside)) + " completes it to a basis.");
            }
        }
    }

    /** A basis contained in {@code f}, or 0 when there is none (rank ≥ 1). */
    private long basisInside(long f) {
        int[] elements = ElementSets.elements(f);
        if (ElementSets.binomial(elements.length, rank) < bases.length) {
            int[] comb = ElementSets.range(rank);
            if (rank > elements.length) {
                return 0;
            }
            do {
                long m = 0;
                for (int c : comb) {
                    m |= 1L << elements[c];
                }
                if (basisSet.contains(m)) {
                    return m;
                }
            } while (ElementSets.nextCombination(comb, elements.length));
            return 0;
        }
        for (long b : bases) {
            if ((b & ~f) == 0) {
                return b;
            }
        }
        return 0;
    }

    @Override
    public List<String> labels() {
        return labels;
    }

    @Override
    public int rank() {
        return rank;
    }

    @Override
    public int rank(int[] set) {
        long s = ElementSets.mask(set);
        int best = 0;
        for (long b : bases) {
            best = Math.max(best, Long.bitCount(b & s));
            if (best == set.length) {
                break;
            }
        }
        return best;
    }

    @Override
    public boolean isBasis(int[] set) {
        return set.length == rank && basisSet.contains(ElementSets.mask(set));
    }

    /** Whether the set given as a mask is a basis. */
    public boolean isBasisMask(long set) {
        return basisSet.contains(set);
    }

    /** The number of bases. */
    public int basisCount() {
        return bases.length;
    }

    /** The bases as sorted tuples, in lexicographic order (the certificate's canonical order). */
    public List<int[]> bases() {
        List<int[]> out = new ArrayList<>(bases.length);
        for (long b : bases) {
            out.add(ElementSets.elements(b));
        }
        return out;
    }

    /** The bases as masks, in the same lexicographic order as {@link #bases()}. */
    public long[] basisMasks() {
        return bases.clone();
    }

    /** The same matroid with other labels (same count, distinct). */
    public ExplicitMatroid relabel(List<String> newLabels) {
        if (newLabels.size() != labels.size()) {
            throw new IllegalArgumentException("Relabelling needs " + labels.size() + " labels, got "
                    + newLabels.size() + ".");
        }
        checkGround(newLabels, rank);
        return new ExplicitMatroid(newLabels, rank, bases);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ExplicitMatroid other && other.rank == rank && other.labels.equals(labels)
                && Arrays.equals(other.bases, bases);
    }

    @Override
    public int hashCode() {
        return 31 * labels.hashCode() + Arrays.hashCode(bases);
    }

    @Override
    public String toString() {
        return "ExplicitMatroid[rank " + rank + " on " + labels.size() + " elements, " + bases.length + " bases]";
    }
}
