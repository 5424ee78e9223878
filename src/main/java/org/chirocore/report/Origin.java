package org.chirocore.report;

import java.util.List;

/**
 * Where a certificate's core came from (the {@code provenance} member of
 * docs/certificate-format.md): a cube construction or a given matroid, and the minor path
 * C (contracted) and D (deleted) applied to it.
 */
public sealed interface Origin permits Origin.Construction, Origin.Given {
    /** The labels of C, the contracted elements. */
    List<String> contracted();

    /** The labels of D, the deleted elements. */
    List<String> deleted();

    /**
     * A pulled cube.
     *
     * @param cube the dimension n
     * @param field {@code "Q"} or {@code "GF(p)"}
     * @param hyperplane the labels of H's vertices
     * @param pulled the label of O
     * @param contractPulled whether O is contracted before the path
     * @param contracted the labels of C
     * @param deleted the labels of D
     */
    record Construction(int cube, String field, List<String> hyperplane, String pulled, boolean contractPulled,
            List<String> contracted, List<String> deleted) implements Origin {
        public Construction {
            hyperplane = List.copyOf(hyperplane);
            contracted = List.copyOf(contracted);
            deleted = List.copyOf(deleted);
        }
    }

    /**
     * A matroid read from a file, known by the SHA-256 of its bytes.
     *
     * @param sha256 the input file's SHA-256
     * @param elements its number of elements
     * @param rank its rank
     * @param contracted the labels of C
     * @param deleted the labels of D
     */
    record Given(String sha256, int elements, int rank, List<String> contracted, List<String> deleted) implements Origin {
        public Given {
            contracted = List.copyOf(contracted);
            deleted = List.copyOf(deleted);
        }
    }
}
