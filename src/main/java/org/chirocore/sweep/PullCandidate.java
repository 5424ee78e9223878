package org.chirocore.sweep;

import java.util.Optional;

import org.chirocore.matroid.GeneralPositionViolation;

/**
 * A vertex O outside the representative of a hyperplane orbit, one per orbit of the hyperplane's
 * stabiliser on the vertices off H, with the exact general-position test of (H, O).
 *
 * @param hyperplane the orbit of H, whose representative is H
 * @param vertex the label of O (0/1 string, coordinate 1 first)
 * @param vertexOrbit the number of vertices in O's orbit under the stabiliser of H
 * @param orbitSize the number of pairs (H', O') in the orbit of (H, O) under B_n: the orbit size
 *     of H times {@code vertexOrbit}
 * @param violation why (H, O) are not in general position; empty when they are
 */
public record PullCandidate(HyperplaneOrbit hyperplane, String vertex, long vertexOrbit, long orbitSize,
        Optional<GeneralPositionViolation> violation) {

    /** Whether (H, O) are in general position, so that O can be pulled to H. */
    public boolean inGeneralPosition() {
        return violation.isEmpty();
    }
}
