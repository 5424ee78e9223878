package org.chirocore.matroid;

import java.util.List;

/**
 * A matroid on the ground set {0, …, size()-1}, known only through its rank function (a rank
 * oracle). Large matroids such as the pulled cubes are never materialised as basis lists; every
 * algorithm asks for ranks of the subsets it actually needs.
 *
 * <p>Subsets are passed as strictly increasing arrays of element indices. Implementations must
 * be immutable and safe to query from several threads.
 */
public interface Matroid {

    /** The element labels; element {@code i} carries {@code labels().get(i)}. Labels are distinct. */
    List<String> labels();

    /** The number of elements of the ground set. */
    default int size() {
        return labels().size();
    }

    /** The rank of the whole ground set. */
    int rank();

    /**
     * The rank of a subset.
     *
     * @param set strictly increasing element indices, each in {@code [0, size())}
     */
    int rank(int[] set);

    /** Whether {@code set} (strictly increasing) is a basis: it has {@code rank()} elements and full rank. */
    default boolean isBasis(int[] set) {
        return set.length == rank() && rank(set) == set.length;
    }

    /** Whether {@code set} (strictly increasing) is independent. */
    default boolean isIndependent(int[] set) {
        return rank(set) == set.length;
    }
}
