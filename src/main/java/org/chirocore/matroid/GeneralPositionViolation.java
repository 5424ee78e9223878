package org.chirocore.matroid;

import java.util.List;

/**
 * Why a hyperplane H and a point O ∉ H of a matroid are not in general position: a hyperline L
 * of the matroid contained in H and an element y outside L ∪ {O} in the closure of L ∪ {O}.
 * It is its own proof: anyone can check rank(L ∪ {O, y}) = rank(L ∪ {O}) with one rank oracle.
 *
 * @param hyperline the hyperline L, strictly increasing element indices
 * @param point the point O being pulled
 * @param witness the element y
 * @param message a full sentence naming L, O and y by their labels
 */
public record GeneralPositionViolation(List<Integer> hyperline, int point, int witness, String message) {
    public GeneralPositionViolation {
        hyperline = List.copyOf(hyperline);
        if (hyperline.contains(witness) || witness == point) {
            throw new IllegalArgumentException("The witness " + witness + " must lie outside the hyperline "
                    + hyperline + " and differ from the point " + point + ".");
        }
    }
}
