package org.chirocore.matroid;

import java.util.List;

/**
 * Why a hyperplane H and a point O ∉ H of a matroid are not in general position: a hyperline L
 * of the matroid contained in H and an element y outside L ∪ {O} in the closure of L ∪ {O}.
 * It is its own proof, verified by {@link #holdsIn}.
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

    /**
     * Whether this is a genuine violation in {@code m}: L is a flat of rank r − 2 not containing
     * O, and adding y to L ∪ {O} keeps its rank. Costs size() + 2 rank queries.
     */
    public boolean holdsIn(Matroid m) {
        int[] l = hyperline.stream().mapToInt(Integer::intValue).toArray();
        int[] withPoint = ElementSets.with(l, point);
        return m.rank(l) == m.rank() - 2 && Flats.isFlat(m, l) && withPoint.length == l.length + 1
                && m.rank(ElementSets.with(withPoint, witness)) == m.rank(withPoint);
    }
}
