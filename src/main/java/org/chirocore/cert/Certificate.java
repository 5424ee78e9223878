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
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.Normalisation;
import org.chirocore.orient.Refutation;
import org.chirocore.orient.WitnessCheck;
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
 * @param lrat the refutation's proof as LRAT ({@link LratConversion}), written instead of its DRAT
 *     when present
 */
public record Certificate(ExplicitMatroid core, Provenance provenance, Refutation refutation,
        List<MinimalityWitness> minimality, Discovery discovery, Optional<String> lrat) {
    public Certificate {
        minimality = List.copyOf(minimality);
        if (minimality.size() != core.size()) {
            throw new IllegalArgumentException("A certificate needs one minimality entry per core element: "
                    + core.size() + " elements, " + minimality.size() + " entries.");
        }
    }

    /**
     * The certificate of {@code found}, refuted by {@code refutation}, with sign witnesses.
     * Re-checks every witness against the minor rebuilt here (one full relation scan each) and
     * that the refutation's normalisation is the one of the core, so nothing unchecked is written.
     *
     * @throws IllegalStateException when a witness fails its re-check, or the refutation was made
     *     for another matroid
     */
    public static Certificate of(CoreFinding found, Refutation refutation) {
        return of(found, refutation, WitnessForms.SIGNS);
    }

    /**
     * As {@link #of(CoreFinding, Refutation)}, with the witnesses in {@code forms}. With
     * {@link WitnessForms#ORBITS}, an element other than its orbit's representative gets the
     * representative's witnesses transported by a listed automorphism ({@link ElementOrbits}); the
     * transported signs are re-checked like the others. When the core has too many automorphisms
     * to list, every witness is given by its signs. With {@link WitnessForms#MATRICES}, a minor
     * that a real configuration of the core's construction realises gets that matrix (checked on
     * all its maximal minors), the others their signs.
     *
     * @throws IllegalStateException as for {@link #of(CoreFinding, Refutation)}
     */
    public static Certificate of(CoreFinding found, Refutation refutation, WitnessForms forms) {
        ExplicitMatroid core = found.core();
        BasisIndex index = BasisIndex.of(core);
        List<Integer> normalisation = Arrays.stream(Normalisation.fixedVariables(index)).boxed().toList();
        if (!normalisation.equals(refutation.normalised())) {
            throw new IllegalStateException("The refutation fixes variables " + refutation.normalised()
                    + ", but the core's normalisation is " + normalisation + ": it was made for another matroid.");
        }
        Optional<ElementOrbits> orbits = forms == WitnessForms.ORBITS ? ElementOrbits.of(core) : Optional.empty();
        MatrixWitnesses matrices = forms == WitnessForms.MATRICES ? MatrixWitnesses.of(found) : MatrixWitnesses.NONE;
        List<MinimalityWitness> entries = new ArrayList<>();
        for (int e = 0; e < core.size(); e++) {
            entries.add(new MinimalityWitness(core.labels().get(e), witness(found, core, e, Operation.DELETION, orbits, matrices),
                    witness(found, core, e, Operation.CONTRACTION, orbits, matrices)));
        }
        return new Certificate(core, found.provenance(), refutation, entries, found.discovery(), Optional.empty());
    }

    /**
     * This certificate with its proof as LRAT: the DRAT proof converted against the CNF of the
     * refutation's normalisation and relations, in the certificate format's encoding.
     *
     * @throws IllegalStateException when the DRAT proof does not refute that CNF (a bug of the prover)
     */
    public Certificate withLrat() {
        BasisIndex index = BasisIndex.of(core);
        try {
            return new Certificate(core, provenance, refutation, minimality, discovery,
                    Optional.of(LratConversion.convert(index.basisCount(), refutation.cnf(index), refutation.drat())));
        } catch (IllegalArgumentException e) {
            throw new IllegalStateException("The refutation's DRAT proof does not convert to LRAT: " + e.getMessage(), e);
        }
    }

    /** The proof text the certificate states: its LRAT when it has one, else the refutation's DRAT. */
    public String proofText() {
        return lrat.orElse(refutation.drat());
    }

    /** The number of witnesses of the given kind ("signs", "transported" or "matrix"). */
    public int witnessCount(String kind) {
        return minimality.stream().mapToInt(w -> w.count(kind)).sum();
    }

    /**
     * The witness of the minor at e: given {@code orbits} and e not its orbit's representative f,
     * f's transported to e, whose signs are re-checked here; else a matrix {@code matrices} finds;
     * else the search's own, by its signs.
     */
    private static MinimalityWitness.Form witness(CoreFinding found, ExplicitMatroid core, int e, Operation operation,
            Optional<ElementOrbits> orbits, MatrixWitnesses matrices) {
        // For a loop or coloop e, M\e = M/e, and Minor builds exactly that matroid either way.
        int[] single = {e};
        Matroid minor = operation == Operation.DELETION ? new Minor(core, new int[0], single)
                : new Minor(core, single, new int[0]);
        if (orbits.isPresent() && orbits.get().representative()[e] != e) {
            ElementOrbits o = orbits.get();
            WitnessCheck.checked(minor, o.relabelled(searched(found, core, o.representative()[e], operation), e, minor.labels()));
            return o.transported(core.labels(), e);
        }
        Optional<Realisation> m = matrices.find(e, operation == Operation.CONTRACTION, minor);
        if (m.isPresent()) {
            return new MinimalityWitness.Matrix(m.get());
        }
        return new MinimalityWitness.Signs(ResultJson.signString(WitnessCheck.checked(minor, searched(found, core, e, operation))));
    }

    /** The search's witness of the minor at e. */
    private static Chirotope searched(CoreFinding found, ExplicitMatroid core, int e, Operation operation) {
        String label = core.labels().get(e);
        return found.witnesses().stream()
                .filter(x -> x.element().equals(label) && x.operation() == operation)
                .findFirst()
                .orElseThrow(() -> new IllegalStateException("The core has no " + operation + " witness for element "
                        + label + "."))
                .witness();
    }
}
