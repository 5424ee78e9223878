package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.IndependentCheck;
import org.junit.jupiter.api.Test;

class MinimalityDeciderTest {
    @Test
    void theFanoPlaneIsMinimalWithCheckedWitnesses() {
        // F7 (Oxley, Matroid Theory, 2nd ed., Example 1.5.7) is minor-minimal non-orientable: its
        // single-element deletions and contractions have rank at most 3 on 6 elements and are
        // regular, hence orientable; the check must find all 14 and re-check each
        ExplicitMatroid fano = ExplicitMatroid.of(NamedMatroids.fano());
        MinimalityDecider.Minimal minimal = assertInstanceOf(MinimalityDecider.Minimal.class,
                MinimalityDecider.decide(fano, Budget.UNLIMITED));
        assertEquals(14, minimal.witnesses().size());
        for (int e = 0; e < fano.size(); e++) {
            int[] single = {e};
            // the independent checker accepts each witness for the minor it claims to orient
            IndependentCheck.assertOrients(new Minor(fano, new int[0], single), minimal.witnesses().get(2 * e).witness());
            IndependentCheck.assertOrients(new Minor(fano, single, new int[0]),
                    minimal.witnesses().get(2 * e + 1).witness());
        }
    }

    @Test
    void theBinaryAffineCubeIsNotMinimal() {
        // AG(3, 2)/e is the Fano plane for every e: the 7 other points of the binary affine cube
        // project to the 7 distinct points of PG(2, 2); asserted here by isomorphism
        ExplicitMatroid ag32 = ExplicitMatroid.of(NamedMatroids.binaryAffineCube());
        MinimalityDecider.NonOrientableContraction c = assertInstanceOf(MinimalityDecider.NonOrientableContraction.class,
                MinimalityDecider.decide(ag32, Budget.UNLIMITED));
        assertEquals(0, c.element());
        assertTrue(new HyperplaneIsomorphismInspector(c.minor(), NamedMatroids.fano()).find().isPresent());
    }
}
