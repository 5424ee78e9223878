package org.chirocore.family;

import org.chirocore.check.Verdict;

/** The independent verifier's verdict on a family member's certificate, as the family table states it. */
public enum Verification {
    /** Every check passed. */
    VERIFIED("verified"),
    /** Some check failed. */
    FAILED("failed");

    private final String text;

    Verification(String text) {
        this.text = text;
    }

    /** How the family table states it. */
    public String text() {
        return text;
    }

    /** The verdict of {@code report}. */
    public static Verification of(Verdict report) {
        return report.passed() ? VERIFIED : FAILED;
    }
}
