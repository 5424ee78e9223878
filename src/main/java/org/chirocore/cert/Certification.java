package org.chirocore.cert;

import org.chirocore.orient.Budget;
import org.chirocore.orient.RefutationSearch;
import org.chirocore.search.MinimalCore;

/**
 * The certificate of a minimal core, or why there is none: re-solves the core's own clauses
 * with proof logging ({@link RefutationSearch}) and assembles the {@link Certificate}, which
 * re-checks every witness. Costs one orientability decision of the core plus one relation scan
 * per witness, and for an LRAT proof one forward pass over the DRAT proof.
 */
public sealed interface Certification {

    /** The certificate. */
    record Certified(Certificate certificate) implements Certification {
    }

    /** The refutation's budget ran out; no certificate, nothing claimed. */
    record OutOfBudget(String reason) implements Certification {
    }

    /**
     * Certifies {@code found}, which a search reduced from {@code source}, spending at most
     * {@code budget} on the refutation; as {@link #of(CoreFinding, Budget)}.
     */
    static Certification of(MinimalCore found, Source source, Budget budget) {
        return of(CoreFinding.searched(found, source), budget);
    }

    /**
     * Certifies {@code found}, spending at most {@code budget} on the refutation.
     *
     * @throws IllegalStateException when the core turns out orientable or a witness fails its
     *     re-check: either is a bug of whoever found the core, and no certificate must be written then
     */
    static Certification of(CoreFinding found, Budget budget) {
        return of(found, budget, CertificateForms.DEFAULT);
    }

    /**
     * Certifies {@code found} as {@link #of(CoreFinding, Budget)}, its minimality witnesses and its
     * refutation in {@code forms}.
     *
     * @throws IllegalStateException as for {@link #of(CoreFinding, Budget)}
     */
    static Certification of(CoreFinding found, Budget budget, CertificateForms forms) {
        RefutationSearch.Outcome outcome = new RefutationSearch(budget, forms.trimRelations()).refute(found.core());
        if (outcome instanceof RefutationSearch.Refuted r) {
            Certificate c = Certificate.of(found, r.refutation(), forms.witnesses());
            return new Certified(forms.lratProof() ? c.withLrat() : c);
        }
        if (outcome instanceof RefutationSearch.OutOfBudget o) {
            return new OutOfBudget(o.reason());
        }
        throw new IllegalStateException("The search reported a non-orientable core, but re-solving it found an "
                + "orientation: the search has a bug, and no certificate was written.");
    }
}
