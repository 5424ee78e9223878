package org.chirocore.cert;

import org.chirocore.matroid.Construction;

/** Where the reduced matroid came from, as a certificate's provenance names it. */
public sealed interface Source {

    /** The matroid {@code construction.build()} returns (for a cube construction, the pulled cube, possibly contracted). */
    record Constructed(Construction construction) implements Source {
    }

    /**
     * A matroid read from a file, identified by the digest of its bytes.
     *
     * @param sha256 the SHA-256 of the file's bytes, 64 lower-case hex digits
     * @param elements the matroid's number of elements
     * @param rank its rank
     */
    record Given(String sha256, int elements, int rank) implements Source {
        public Given {
            if (!sha256.matches("[0-9a-f]{64}")) {
                throw new IllegalArgumentException("A SHA-256 digest is 64 lower-case hex digits, not \"" + sha256
                        + "\".");
            }
        }
    }
}
