package org.chirocore.cert;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.chirocore.io.ResultJson;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.Realisation;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Normalisation;
import org.chirocore.orient.Refutation;
import org.chirocore.orient.WitnessCheck;
import org.chirocore.search.MinorWitness;
import org.chirocore.search.Operation;

/**
 * Everything a certificate of minor-minimal non-orientability states: the core, its provenance,
 * a refutation of its orientability constraints and a witness pair per element; plus how it was
 * found, which goes to the unhashed {@code run} member. Immutable.
 *
 * @param core the core
 * @param provenance where it came from
 * @param refutation the proof that it has no chirotope
 * @param minimality one entry per core element, in element order
 * @param discovery how the core was found (informative)
 */
public record Certificate(ExplicitMatroid core, Provenance provenance, Refutation refutation,
        List<MinimalityWitness> minimality, Discovery discovery) {
    public Certificate {
        minimality = List.copyOf(minimality);
        if (minimality.size() != core.size()) {
            throw new IllegalArgumentException("A certificate needs one minimality entry per core element: "
                    + core.size() + " elements, " + minimality.size() + " entries.");
        }
    }

    /** The certificate of {@code found} with sign witnesses only; as {@link #of(CoreFinding, Refutation, WitnessForms)}. */
    public static Certificate of(CoreFinding found, Refutation refutation) {
        return of(found, refutation, WitnessForms.SIGNS);
    }

    /**
     * The certificate of {@code found}, refuted by {@code refutation}, its witnesses in
     * {@code forms}. Re-checks every witness against the minor rebuilt here (a sign witness by
     * one full relation scan, a matrix by all its maximal minors) and that the refutation's
     * normalisation is the one of the core, so nothing unchecked is written.
     *
     * @throws IllegalStateException when a witness fails its re-check, or the refutation was made
     *     for another matroid
     */
    public static Certificate of(CoreFinding found, Refutation refutation, WitnessForms forms) {
        ExplicitMatroid core = found.core();
        BasisIndex index = BasisIndex.of(core);
        List<Integer> normalisation = Arrays.stream(Normalisation.fixedVariables(index)).boxed().toList();
        if (!normalisation.equals(refutation.normalised())) {
            throw new IllegalStateException("The refutation fixes variables " + refutation.normalised()
                    + ", but the core's normalisation is " + normalisation + ": it was made for another matroid.");
        }
        MatrixWitnesses matrices = forms == WitnessForms.MATRICES ? MatrixWitnesses.of(found) : MatrixWitnesses.NONE;
        List<MinimalityWitness> entries = new ArrayList<>();
        for (int e = 0; e < core.size(); e++) {
            String label = core.labels().get(e);
            entries.add(new MinimalityWitness(label, witness(found, core, e, Operation.DELETION, matrices),
                    witness(found, core, e, Operation.CONTRACTION, matrices)));
        }
        return new Certificate(core, found.provenance(), refutation, entries, found.discovery());
    }

    /** The number of witnesses of the given kind ("signs" or "matrix"). */
    public int witnessCount(String kind) {
        return minimality.stream().mapToInt(w -> w.count(kind)).sum();
    }

    private static MinimalityWitness.Form witness(CoreFinding found, ExplicitMatroid core, int e, Operation operation,
            MatrixWitnesses matrices) {
        // For a loop or coloop e, M\e = M/e, and Minor builds exactly that matroid either way.
        int[] single = {e};
        Matroid minor = operation == Operation.DELETION ? new Minor(core, new int[0], single)
                : new Minor(core, single, new int[0]);
        Optional<Realisation> m = matrices.find(e, operation == Operation.CONTRACTION, minor);
        if (m.isPresent()) {
            return new MinimalityWitness.Matrix(m.get());
        }
        String label = core.labels().get(e);
        MinorWitness w = found.witnesses().stream()
                .filter(x -> x.element().equals(label) && x.operation() == operation)
                .findFirst()
                .orElseThrow(() -> new IllegalStateException("The core has no " + operation + " witness for element "
                        + label + "."));
        return new MinimalityWitness.Signs(ResultJson.signString(WitnessCheck.checked(minor, w.witness())));
    }
}
