package org.chirocore.cert;

/**
 * How a certificate states its two proofs: the forms of the minimality witnesses; whether the
 * non-orientability proof lists only an unsatisfiable core of the 3-term relations the lazy loop
 * added (see docs/certificate-format.md) or every relation the loop added; and whether its clausal
 * proof is the solver's DRAT or LRAT, the DRAT with the unit-propagation hints of every step and
 * only the steps the empty clause needs ({@link LratConversion}), which the verifier checks in time
 * linear in the proof instead of by propagation.
 *
 * @param witnesses the forms of the minimality witnesses
 * @param trimRelations whether the refutation's relations are cut down to a core first
 * @param lratProof whether the clausal proof is written as LRAT
 */
public record CertificateForms(WitnessForms witnesses, boolean trimRelations, boolean lratProof) {
    /** Signs for every witness, every relation the loop added, DRAT: what most stored certificates have. */
    public static final CertificateForms DEFAULT = new CertificateForms(WitnessForms.SIGNS, false, false);

    public CertificateForms {
        if (witnesses == null) {
            throw new IllegalArgumentException("The witness forms must be given.");
        }
    }

    /** Witnesses in {@code witnesses}, relations trimmed or not, the proof as DRAT. */
    public CertificateForms(WitnessForms witnesses, boolean trimRelations) {
        this(witnesses, trimRelations, false);
    }

    /** These forms with witnesses in {@code forms}. */
    public static CertificateForms of(WitnessForms forms) {
        return new CertificateForms(forms, false);
    }
}
