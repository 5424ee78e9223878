package org.chirocore.family;

/**
 * What a family run found at one cube dimension n: a certified core, a proof that the member is
 * orientable, or no answer.
 */
public sealed interface MemberResult {

    /** The cube dimension. */
    int n();

    /** The number of elements of the pulled (and possibly contracted) matroid. */
    int elements();

    /** Its rank. */
    int rank();

    /** The status as the family table states it: "verified", "orientable" or "unknown: " and why. */
    String status();

    /**
     * A minimal non-orientable core whose certificate in the run's directory the independent
     * verifier accepted.
     *
     * @param certificate the certificate's file name in the directory
     * @param reused whether the certificate was found from an earlier run and not recomputed
     * @param facts what the certificate states, read back from the file
     * @param verifyMillis the verifier's time in this run
     */
    record Certified(int n, int elements, int rank, String certificate, boolean reused, CertificateFacts facts,
            long verifyMillis) implements MemberResult {
        @Override
        public String status() {
            return "verified";
        }
    }

    /** The member is orientable (the search checked a chirotope); it has no core. */
    record Orientable(int n, int elements, int rank) implements MemberResult {
        @Override
        public String status() {
            return "orientable";
        }
    }

    /**
     * A budget ran out; nothing is claimed.
     *
     * @param reason why, in words
     */
    record Unknown(int n, int elements, int rank, String reason) implements MemberResult {
        @Override
        public String status() {
            return "unknown: " + reason;
        }
    }

    /**
     * The member without a core whose status a family table states as {@code status}.
     *
     * @throws IllegalArgumentException when the status is neither "orientable" nor "unknown: …"
     */
    static MemberResult withoutCore(int n, int elements, int rank, String status) {
        if (status.equals("orientable")) {
            return new Orientable(n, elements, rank);
        }
        if (status.startsWith("unknown: ")) {
            return new Unknown(n, elements, rank, status.substring("unknown: ".length()));
        }
        throw new IllegalArgumentException("the member at n = " + n + " has no certificate and the status \"" + status
                + "\"; expected \"orientable\" or \"unknown: ...\"");
    }
}
