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
 * A matroid on at most {@link Limits#ELEMENTS} elements given by its list of bases. Construction checks the basis
 * axioms (non-empty family, equal sizes, basis exchange) and fails with an
 * {@link InvalidMatroidException} that names a failing item. Bases are kept in the canonical
 * order of the certificate format: sorted tuples in lexicographic order.
 *
 * <p>Bases are held as {@link ElementSet}s. Rank queries cost O(|bases|·n/64); basis tests cost
 * one hash lookup. Immutable.
 */
public final class ExplicitMatroid implements Matroid {
    /** Largest ground set an explicit matroid holds: {@link Limits#ELEMENTS}. */
    public static final int MAX_ELEMENTS = Limits.ELEMENTS;

    private final List<String> labels;
    private final int rank;
    /** The bases in lexicographic order of their sorted element tuples. */
    private final ElementSet[] bases;
    private final Set<ElementSet> basisSet;

    private ExplicitMatroid(List<String> labels, int rank, ElementSet[] lexSortedBases) {
        this.labels = List.copyOf(labels);
        this.rank = rank;
        this.bases = lexSortedBases;
        this.basisSet = new HashSet<>(Arrays.asList(lexSortedBases));
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
        Set<ElementSet> seen = new HashSet<>();
        List<ElementSet> sets = new ArrayList<>();
        for (int[] b : bases) {
            ElementSet m = checkedSet(labels.size(), rank, b, "basis");
            if (seen.add(m)) {
                sets.add(m);
            }
        }
        if (sets.isEmpty()) {
            throw new InvalidMatroidException("The basis list is empty; a matroid has at least one basis.");
        }
        ExplicitMatroid m = new ExplicitMatroid(labels, rank, lexSorted(sets));
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
        Set<ElementSet> excluded = new HashSet<>();
        for (int[] b : nonBases) {
            excluded.add(checkedSet(labels.size(), rank, b, "non-basis"));
        }
        List<int[]> bases = new ArrayList<>();
        int[] comb = ElementSets.range(rank);
        if (rank <= labels.size()) {
            do {
                if (!excluded.contains(ElementSet.of(comb))) {
                    bases.add(comb.clone());
                }
            } while (ElementSets.nextCombination(comb, labels.size()));
        }
        return fromBases(labels, rank, bases);
    }

    /**
     * Materialises any matroid on at most {@link Limits#ELEMENTS} elements by testing every {@code rank}-subset.
     * Costs C(size, rank) rank queries; the result is not re-checked, as a rank oracle is a
     * matroid by contract.
     */
    public static ExplicitMatroid of(Matroid m) {
        if (m instanceof ExplicitMatroid e) {
            return e;
        }
        checkGround(m.labels(), m.rank());
        List<ElementSet> sets = new ArrayList<>();
        int[] comb = ElementSets.range(m.rank());
        do {
            if (m.isBasis(comb)) {
                sets.add(ElementSet.of(comb));
            }
        } while (ElementSets.nextCombination(comb, m.size()));
        return new ExplicitMatroid(m.labels(), m.rank(), sets.toArray(ElementSet[]::new));
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

    private static ElementSet checkedSet(int n, int rank, int[] set, String what) {
        if (set.length != rank) {
            throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set) + " has " + set.length
                    + " elements, but the rank is " + rank + ".");
        }
        for (int e : set) {
            if (e < 0 || e >= n) {
                throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set) + " names element " + e
                        + ", outside 0.." + (n - 1) + ".");
            }
        }
        ElementSet m = ElementSet.of(set);
        if (m.size() != set.length) {
            throw new InvalidMatroidException("The " + what + " " + Arrays.toString(set) + " repeats an element.");
        }
        return m;
    }

    private static ElementSet[] lexSorted(List<ElementSet> sets) {
        return sets.stream().sorted(ElementSet.LEXICOGRAPHIC).toArray(ElementSet[]::new);
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
        ElementSet all = ElementSet.range(labels.size());
        Set<ElementSet> seenI = new HashSet<>();
        Map<ElementSet, Exchange> exampleByF = new LinkedHashMap<>();
        for (ElementSet b1 : bases) {
            for (int x : b1.elements()) {
                ElementSet i = b1.without(x);
                if (!seenI.add(i)) {
                    continue;
                }
                int[] k = new int[labels.size()];
                int count = 0;
                for (int y = 0; y < labels.size(); y++) {
                    if (!i.contains(y) && basisSet.contains(i.with(y))) {
                        k[count++] = y;
                    }
                }
                exampleByF.putIfAbsent(all.minus(ElementSet.of(Arrays.copyOf(k, count))), new Exchange(b1, x));
            }
        }
        for (Map.Entry<ElementSet, Exchange> entry : exampleByF.entrySet()) {
            ElementSet inside = basisInside(entry.getKey());
            if (inside != null) {
                Exchange failing = entry.getValue();
                throw new InvalidMatroidException("Basis exchange fails: from basis " + failing.basis()
                        + " remove element " + failing.removed() + "; no element of basis " + inside
                        + " completes it to a basis.");
            }
        }
    }

    /** An exchange asked for: remove {@code removed} from {@code basis}. */
    private record Exchange(ElementSet basis, int removed) {
    }

    /** A basis contained in {@code f}, or null when there is none (rank ≥ 1). */
    private ElementSet basisInside(ElementSet f) {
        int[] elements = f.elements();
        if (ElementSets.binomial(elements.length, rank) < bases.length) {
            int[] comb = ElementSets.range(rank);
            if (rank > elements.length) {
                return null;
            }
            int[] picked = new int[rank];
            do {
                for (int c = 0; c < rank; c++) {
                    picked[c] = elements[comb[c]];
                }
                ElementSet m = ElementSet.of(picked);
                if (basisSet.contains(m)) {
                    return m;
                }
            } while (ElementSets.nextCombination(comb, elements.length));
            return null;
        }
        for (ElementSet b : bases) {
            if (b.isSubsetOf(f)) {
                return b;
            }
        }
        return null;
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
        ElementSet s = ElementSet.of(set);
        int best = 0;
        for (ElementSet b : bases) {
            best = Math.max(best, b.intersectionSize(s));
            if (best == set.length) {
                break;
            }
        }
        return best;
    }

    @Override
    public boolean isBasis(int[] set) {
        return set.length == rank && basisSet.contains(ElementSet.of(set));
    }

    /** Whether {@code set} is a basis. */
    public boolean isBasis(ElementSet set) {
        return basisSet.contains(set);
    }

    /** The number of bases. */
    public int basisCount() {
        return bases.length;
    }

    /** The bases as sorted tuples, in lexicographic order (the certificate's canonical order). */
    public List<int[]> bases() {
        List<int[]> out = new ArrayList<>(bases.length);
        for (ElementSet b : bases) {
            out.add(b.elements());
        }
        return out;
    }

    /** The bases as element sets, in the same lexicographic order as {@link #bases()}. */
    public List<ElementSet> basisSets() {
        return List.of(bases);
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
