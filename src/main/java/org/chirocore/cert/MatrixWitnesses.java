package org.chirocore.cert;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.PulledRealisations;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.RealisationCheck;

/**
 * Finds matrix witnesses for the single-element minors of a core that came from a cube
 * construction over Q: the candidate realisations of the core ({@link PulledRealisations}: the
 * real cube with O pulled onto span(H) at several points, or unmoved, taken through the path) are
 * cut to core\e (drop e's column) or core/e (exact quotient by e's vector), and the first whose
 * non-zero maximal minors are exactly the minor's bases ({@link RealisationCheck}, against the
 * minor's own rank oracle) is the witness. A core of a given matroid, or over GF(p), has no
 * candidates. Deterministic: candidates are tried in a fixed order. The determinant work of all
 * matrices kept stays within {@link Limits#MATRIX_WITNESS_STEPS}, so the verifier accepts it.
 *
 * <p>Cost: per minor and candidate, one quotient (an elimination of n + 1 rows) and C(m, r)
 * determinant signs and basis tests, for a minor of rank r on m elements.
 */
final class MatrixWitnesses {
    /** No candidates: every minor keeps its sign witness. */
    static final MatrixWitnesses NONE = new MatrixWitnesses(List.of(), List.of());

    private final List<String> labels;
    private final List<Realisation> candidates;
    /** The determinant work of the matrices found so far, as the verifier counts it. */
    private long steps;
    /** The r-subsets charged to the candidates tried so far. */
    private long walked;

    private MatrixWitnesses(List<String> labels, List<Realisation> candidates) {
        this.labels = labels;
        this.candidates = candidates;
    }

    /** The candidates for the core of {@code found}: none unless it was reduced from a cube construction. */
    static MatrixWitnesses of(CoreFinding found) {
        List<String> labels = found.core().labels();
        if (found.provenance().source() instanceof Source.Constructed k && k.construction() instanceof CubeConstruction cube) {
            return new MatrixWitnesses(labels, PulledRealisations.candidates(cube, labels, found.provenance().contracted(),
                    found.core().rank()));
        }
        return NONE;
    }

    /**
     * A checked realisation of {@code minor}, the deletion or contraction of core element {@code e},
     * or empty when no candidate realises it or a work limit would be passed
     * ({@link Limits#MATRIX_WITNESS_STEPS} for the matrices kept, {@link Limits#MATRIX_SEARCH_SUBSETS}
     * for the candidates tried).
     */
    Optional<Realisation> find(int e, boolean contraction, Matroid minor) {
        long cost = steps(minor.size(), minor.rank());
        if (candidates.isEmpty() || cost > Limits.MATRIX_WITNESS_STEPS - steps) {
            return Optional.empty();
        }
        long subsets = ElementSets.binomial(minor.size(), minor.rank());
        int[] rest = IntStream.range(0, labels.size()).filter(i -> i != e).toArray();
        for (Realisation r : candidates) {
            if (subsets > Limits.MATRIX_SEARCH_SUBSETS - walked) {
                return Optional.empty();
            }
            walked += subsets;
            List<long[]> columns = r.columns();
            List<long[]> keep = Arrays.stream(rest).mapToObj(columns::get).toList();
            List<long[]> contract = contraction ? List.of(columns.get(e)) : List.of();
            Optional<Realisation> w = PulledRealisations.minor(contract, keep, minor.labels());
            if (w.isPresent() && w.get().rank() == minor.rank() && RealisationCheck.defect(minor, w.get()).isEmpty()) {
                steps += cost;
                return w;
            }
        }
        return Optional.empty();
    }

    /** C(m, r) · r³: the verifier's count of a matrix witness's work. */
    private static long steps(int m, int r) {
        long subsets = ElementSets.binomial(m, r);
        long cube = Math.max(1L, (long) r * r * r);
        return subsets > Long.MAX_VALUE / cube ? Long.MAX_VALUE : subsets * cube;
    }
}
