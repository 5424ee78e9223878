package org.chirocore.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Flats;

/**
 * What a report prints about a core, read off the matroid package's {@link ExplicitMatroid}:
 * its non-bases and, in rank 3, its lines; and how sets of labels are written.
 */
final class Cores {
    /** Largest number of r-subsets enumerated to list the non-bases. */
    static final long MAX_SUBSETS = 1_000_000;

    /**
     * Labels in reading order: numbers by value, other labels (such as cube coordinates)
     * alphabetically.
     */
    static final Comparator<String> LABEL_ORDER = (a, b) -> a.matches("\\d{1,18}") && b.matches("\\d{1,18}")
            ? Long.compare(Long.parseLong(a), Long.parseLong(b)) : a.compareTo(b);

    private Cores() {
    }

    /** C(k, r), the number of r-subsets of the k elements. */
    static long subsetCount(ExplicitMatroid core) {
        return ElementSets.binomial(core.size(), core.rank());
    }

    /**
     * The non-bases in lexicographic order, or empty when there are more than {@code limit}
     * r-subsets to enumerate. Cost: O(C(k, r)).
     */
    static Optional<List<int[]>> nonBases(ExplicitMatroid core, long limit) {
        if (subsetCount(core) > limit) {
            return Optional.empty();
        }
        List<int[]> out = new ArrayList<>();
        int[] comb = ElementSets.range(core.rank());
        do {
            if (!core.isBasis(comb)) {
                out.add(comb.clone());
            }
        } while (ElementSets.nextCombination(comb, core.size()));
        return Optional.of(out);
    }

    /**
     * The lines of a rank-3 core: its hyperplanes (rank-2 flats) with at least 3 elements, the
     * maximal sets of at least 3 collinear points. Cost: O(k²) closures.
     *
     * @throws IllegalStateException when the rank is not 3
     */
    static List<int[]> lines(ExplicitMatroid core) {
        if (core.rank() != 3) {
            throw new IllegalStateException("Lines are defined here for rank 3 only, but the rank is " + core.rank() + ".");
        }
        return Flats.hyperplanes(core).stream().filter(h -> h.length >= 3).toList();
    }

    /** The labels of {@code set}, sorted by {@link #LABEL_ORDER}. */
    static List<String> sorted(List<String> labels, int[] set) {
        return Arrays.stream(set).mapToObj(labels::get).sorted(LABEL_ORDER).toList();
    }

    /** The set written {a, b, c}, its labels sorted. */
    static String setText(List<String> labels, int[] set) {
        return "{" + String.join(", ", sorted(labels, set)) + "}";
    }
}
