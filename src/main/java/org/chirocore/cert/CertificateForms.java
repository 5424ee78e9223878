package org.chirocore.cert;

/**
 * How a certificate states its two proofs: the forms of the minimality witnesses, and whether
 * the non-orientability proof lists only an unsatisfiable core of the 3-term relations the lazy
 * loop added (see docs/certificate-format.md) or every relation the loop added.
 *
 * @param witnesses the forms of the minimality witnesses
 * @param trimRelations whether the refutation's relations are cut down to a core first
 */
public record CertificateForms(WitnessForms witnesses, boolean trimRelations) {
    /** Signs for every witness and every relation the loop added: what the stored certificates have. */
    public static final CertificateForms DEFAULT = new CertificateForms(WitnessForms.SIGNS, false);

    public CertificateForms {
        if (witnesses == null) {
            throw new IllegalArgumentException("The witness forms must be given.");
        }
    }

    /** These forms with witnesses in {@code forms}. */
    public static CertificateForms of(WitnessForms forms) {
        return new CertificateForms(forms, false);
    }
}
