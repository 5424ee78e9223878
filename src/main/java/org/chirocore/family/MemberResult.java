package org.chirocore.family;

/** What a family run found at one cube dimension n: a certified core, or no core. */
public sealed interface MemberResult {

    /** The cube dimension. */
    int n();

    /** The number of elements of the pulled (and possibly contracted) matroid. */
    int elements();

    /** Its rank. */
    int rank();

    /**
     * A minimal non-orientable core with its certificate in the run's directory.
     *
     * @param certificate the certificate's file name in the directory
     * @param verification the independent verifier's verdict (never {@link Verification#FAILED})
     * @param reused whether the certificate was found from an earlier run and not recomputed
     * @param facts what the certificate states, read back from the file
     * @param verifyMillis the verifier's time in this run
     */
    record Certified(int n, int elements, int rank, String certificate, Verification verification, boolean reused,
            CertificateFacts facts, long verifyMillis) implements MemberResult {
    }

    /**
     * No core: the member is orientable, or a budget ran out.
     *
     * @param reason "orientable", or "unknown: " and why
     */
    record NoCore(int n, int elements, int rank, String reason) implements MemberResult {
    }
}
