package org.chirocore.family;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Report;

/**
 * The independent verifier's verdict on a family member's certificate, with one case the
 * verifier cannot settle yet: it rebuilds a provenance only for cubes up to a fixed dimension,
 * so a certificate of a larger cube that passes every other check is "verification pending".
 */
public enum Verification {
    /** Every check passed. */
    VERIFIED("verified"),
    /** Every check passed except the provenance, which the verifier does not yet rebuild for a cube this large. */
    PENDING("certificate written, verification pending"),
    /** Some check failed. */
    FAILED("failed");

    private static final String CUBE_LIMIT = "construction.cube must be between 1 and";

    private final String text;

    Verification(String text) {
        this.text = text;
    }

    /** How the family table states it. */
    public String text() {
        return text;
    }

    /** The verdict of {@code report}. */
    public static Verification of(Report report) {
        if (report.passed()) {
            return VERIFIED;
        }
        boolean othersPass = report.checks().stream().filter(c -> !c.name().equals(CertificateVerifier.PROVENANCE))
                .allMatch(c -> c.status() == Report.Status.PASS);
        Report.Check provenance = report.check(CertificateVerifier.PROVENANCE);
        return othersPass && provenance.detail().contains(CUBE_LIMIT) ? PENDING : FAILED;
    }
}
