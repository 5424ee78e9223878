package org.chirocore.matroid;

import java.util.Arrays;
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

    /**
     * The elements of {@code candidates} that lie in the closure of {@code set}, i.e. the e with
     * rank(set ∪ {e}) = rank(set) ([Ox, §1.4]), in the order of {@code candidates}. By default one
     * rank query per candidate; a represented matroid answers with one dot product per candidate
     * ({@link MatrixMatroid#inClosure}).
     *
     * @param set strictly increasing element indices
     * @param candidates element indices, in any order
     */
    default int[] inClosure(int[] set, int[] candidates) {
        int r = rank(set);
        return Arrays.stream(candidates).filter(e -> rank(ElementSets.with(set, e)) == r).toArray();
    }

    /** Whether {@code set} (strictly increasing) is independent. */
    default boolean isIndependent(int[] set) {
        return rank(set) == set.length;
    }
}
