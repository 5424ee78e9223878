package org.chirocore.cert;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.chirocore.io.ResultJson;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Chirotope;
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

    /**
     * The certificate of {@code found}, refuted by {@code refutation}.
     * Re-checks every witness against the minor rebuilt here (one full relation scan each) and
     * that the refutation's normalisation is the one of the core, so nothing unchecked is written.
     *
     * @throws IllegalStateException when a witness fails its re-check, or the refutation was made
     *     for another matroid
     */
    public static Certificate of(CoreFinding found, Refutation refutation) {
        return of(found, refutation, WitnessForm.EXPLICIT);
    }

    /**
     * As {@link #of(CoreFinding, Refutation)}, with the witnesses stated in {@code form}. With
     * {@link WitnessForm#ORBITS}, an element outside its orbit's representative gets the
     * representative's witnesses transported by a listed automorphism ({@link ElementOrbits}),
     * re-checked like the others; when the core has too many automorphisms to list, every witness
     * is stated by its signs.
     *
     * @throws IllegalStateException as for {@link #of(CoreFinding, Refutation)}
     */
    public static Certificate of(CoreFinding found, Refutation refutation, WitnessForm form) {
        ExplicitMatroid core = found.core();
        BasisIndex index = BasisIndex.of(core);
        List<Integer> normalisation = Arrays.stream(Normalisation.fixedVariables(index)).boxed().toList();
        if (!normalisation.equals(refutation.normalised())) {
            throw new IllegalStateException("The refutation fixes variables " + refutation.normalised()
                    + ", but the core's normalisation is " + normalisation + ": it was made for another matroid.");
        }
        Optional<ElementOrbits> orbits = form == WitnessForm.ORBITS ? ElementOrbits.of(core) : Optional.empty();
        List<MinimalityWitness> entries = new ArrayList<>();
        for (int e = 0; e < core.size(); e++) {
            int element = e;
            // a representative states the search's own witnesses; every other element transports its representative's
            Optional<ElementOrbits> transporting = orbits.filter(o -> o.representative()[element] != element);
            entries.add(new MinimalityWitness(core.labels().get(e), checkedSigns(found, core, e, Operation.DELETION, transporting),
                    checkedSigns(found, core, e, Operation.CONTRACTION, transporting),
                    transporting.map(o -> o.transport(core.labels(), element))));
        }
        return new Certificate(core, found.provenance(), refutation, entries, found.discovery());
    }

    /**
     * The re-checked signs of the minor at e: the search's own witness, or, given {@code orbits},
     * the witness at e's representative transported to e by its carrier.
     */
    private static String checkedSigns(CoreFinding found, ExplicitMatroid core, int e, Operation operation,
            Optional<ElementOrbits> orbits) {
        int from = orbits.map(o -> o.representative()[e]).orElse(e);
        String label = core.labels().get(from);
        MinorWitness w = found.witnesses().stream()
                .filter(x -> x.element().equals(label) && x.operation() == operation)
                .findFirst()
                .orElseThrow(() -> new IllegalStateException("The core has no " + operation + " witness for element "
                        + label + "."));
        Matroid minor = minor(core, e, operation);
        Chirotope witness = orbits.isEmpty() ? w.witness() : orbits.get().transport(w.witness(), e, minor.labels());
        return ResultJson.signString(WitnessCheck.checked(minor, witness));
    }

    /** core\e or core/e; for a loop or coloop e, M\e = M/e, and Minor builds exactly that matroid either way. */
    private static Matroid minor(ExplicitMatroid core, int e, Operation operation) {
        int[] single = {e};
        return operation == Operation.DELETION ? new Minor(core, new int[0], single) : new Minor(core, single, new int[0]);
    }

    /** The number of entries whose witnesses are transported rather than stated by their signs. */
    public int transportedEntries() {
        return (int) minimality.stream().filter(w -> w.transport().isPresent()).count();
    }
}
