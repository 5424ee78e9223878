package org.chirocore.search;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Set;

import org.chirocore.matroid.Matroid;

/**
 * What a wanted core must satisfy: its rank, elements it must contain and elements it must not.
 * A core of rank R of a matroid of rank r is M/C\D with C independent of size r − R, so the rank
 * fixes how many elements are contracted; kept elements are neither contracted nor deleted,
 * avoided ones are deleted.
 *
 * @param rank the core's rank, if fixed
 * @param keep labels of elements the core must contain
 * @param avoid labels of elements that must be deleted
 */
public record CoreConstraints(OptionalInt rank, List<String> keep, List<String> avoid) {
    /** Every matroid of rank at most 2 is orientable (it is representable over the reals), so no core has such a rank. */
    public static final int SMALLEST_CORE_RANK = 3;

    public CoreConstraints {
        if (rank == null) {
            throw new IllegalArgumentException("Core constraints need a rank or OptionalInt.empty().");
        }
        keep = List.copyOf(keep);
        avoid = List.copyOf(avoid);
        Set<String> both = new HashSet<>(keep);
        both.retainAll(avoid);
        if (!both.isEmpty()) {
            throw new IllegalArgumentException("The elements " + String.join(", ", new ArrayList<>(both))
                    + " are both to be kept and to be avoided.");
        }
    }

    /** No constraint at all. */
    public static CoreConstraints none() {
        return new CoreConstraints(OptionalInt.empty(), List.of(), List.of());
    }

    /** Whether any constraint is set. */
    public boolean any() {
        return rank.isPresent() || !keep.isEmpty() || !avoid.isEmpty();
    }

    /**
     * Checks that the constraints make sense for {@code m}.
     *
     * @throws IllegalArgumentException naming the label that is no element of m, or the rank that
     *     is out of range
     */
    public void validate(Matroid m) {
        for (List<String> labels : List.of(keep, avoid)) {
            for (String label : labels) {
                if (!m.labels().contains(label)) {
                    throw new IllegalArgumentException("\"" + label + "\" (in --" + (labels == keep ? "keep" : "avoid")
                            + ") is not an element of the matroid.");
                }
            }
        }
        if (rank.isPresent() && (rank.getAsInt() < SMALLEST_CORE_RANK || rank.getAsInt() > m.rank())) {
            throw new IllegalArgumentException("The core rank " + rank.getAsInt() + " is outside "
                    + SMALLEST_CORE_RANK + ".." + m.rank() + ": the matroid has rank " + m.rank()
                    + ", and every matroid of rank at most 2 is orientable.");
        }
    }

    /** The ranks a core may have in a matroid of rank {@code r}: the fixed one, else 3..r from the highest down. */
    public List<Integer> ranks(int r) {
        if (rank.isPresent()) {
            return List.of(rank.getAsInt());
        }
        List<Integer> out = new ArrayList<>();
        for (int k = r; k >= SMALLEST_CORE_RANK; k--) {
            out.add(k);
        }
        return out;
    }
}
