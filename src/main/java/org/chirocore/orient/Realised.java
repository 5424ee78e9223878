package org.chirocore.orient;

import java.util.Optional;

import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Realisation;

/**
 * Orientable because realisable over Q: a matroid given by a matrix over the rationals is
 * orientable, the signs of the maximal minors being a chirotope (Björner, Las Vergnas,
 * Sturmfels, White, Ziegler, <i>Oriented Matroids</i>, 2nd ed., §3.5, from memory). The witness
 * is the matrix itself (its rows cut to a maximal independent set), checked by
 * {@link RealisationCheck} before it is returned. No search is involved.
 *
 * @param witness the checked realisation
 * @param bases the number of bases of the matroid
 * @param millis wall-clock time of building and checking the witness
 */
public record Realised(Realisation witness, long bases, long millis) {

    /**
     * Decides orientability from a realisation when {@code m} is a matrix over Q; empty for every
     * other matroid (including matrices over GF(p), whose determinant signs mean nothing).
     *
     * @throws EnumerationLimitException when the check would enumerate more than
     *     {@link RealisationCheck#MAX_SUBSETS} subsets
     */
    public static Optional<Realised> decide(Matroid m) {
        if (!(m instanceof MatrixMatroid matrix)) {
            return Optional.empty();
        }
        long start = System.nanoTime();
        return Realisation.of(matrix).map(w -> new Realised(w, RealisationCheck.checkedBasisCount(m, w),
                (System.nanoTime() - start) / 1_000_000));
    }
}
