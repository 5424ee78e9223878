package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A cheap isomorphism invariant of a matroid: its size, rank, number of bases and how many
 * hyperplanes it has of each size. Isomorphic matroids have equal shapes; the converse fails
 * (so a shape groups candidates, it never proves isomorphism). Immutable; a record, so equal
 * shapes are {@code equals} and may key a map that groups cores.
 *
 * @param elements the size of the ground set
 * @param rank the rank of the ground set
 * @param bases the number of bases
 * @param hyperplaneSizes entry k is the number of hyperplanes with exactly k elements, for
 *     k = 0, …, elements
 */
public record MatroidShape(int elements, int rank, int bases, List<Integer> hyperplaneSizes) {
    public MatroidShape {
        hyperplaneSizes = List.copyOf(hyperplaneSizes);
        if (hyperplaneSizes.size() != elements + 1) {
            throw new IllegalArgumentException("A hyperplane-size histogram on " + elements + " elements has "
                    + (elements + 1) + " entries, not " + hyperplaneSizes.size() + ".");
        }
    }

    /**
     * The shape of {@code m}. Costs C(n, r) rank queries to count bases plus the hyperplane
     * enumeration of {@link Flats#hyperplanes} (about C(n, r − 1) rank queries).
     *
     * @throws InvalidMatroidException when {@code m} has more than {@link Limits#ELEMENTS} elements
     */
    public static MatroidShape of(Matroid m) {
        return of(ExplicitMatroid.of(m), hyperplanes(m));
    }

    /** The shape from an already materialised matroid and its hyperplanes. */
    static MatroidShape of(ExplicitMatroid m, List<int[]> hyperplanes) {
        List<Integer> histogram = new ArrayList<>(Collections.nCopies(m.size() + 1, 0));
        for (int[] h : hyperplanes) {
            histogram.set(h.length, histogram.get(h.length) + 1);
        }
        return new MatroidShape(m.size(), m.rank(), m.basisCount(), histogram);
    }

    /** The hyperplanes of {@code m}; a rank-0 matroid has none (there are no flats of rank −1). */
    static List<int[]> hyperplanes(Matroid m) {
        return m.rank() == 0 ? List.of() : Flats.hyperplanes(m);
    }
}
