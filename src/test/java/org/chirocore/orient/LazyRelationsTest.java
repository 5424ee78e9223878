package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Matroid;
import org.junit.jupiter.api.Test;

/** The lazy loop decides large matroids while giving the solver a small share of all relations. */
class LazyRelationsTest {

    @Test
    void theFiveCubeCornerConstructionIsDecidedFromFewRelations() {
        // 31 elements of rank 5 after contracting the pulled vertex: C(31,3)·C(28,4) = 92,035,125 (4,495 · 20,475)
        // index combinations (X; a, b, c, d). Non-orientable: it has the Fano plane as a minor
        // (found by the reduction tests), and F7 is not orientable (Oxley, Matroid Theory, §6.6).
        Matroid m = CubeConstruction.corner(5).build();
        assertEquals(31, m.size());
        assertEquals(5, m.rank());
        long combinations = ElementSets.binomial(31, 3) * ElementSets.binomial(28, 4);
        assertEquals(92_035_125L, combinations);
        Orientability answer = new LazySatDecider(Budget.UNLIMITED).decide(m);
        assertEquals("non-orientable", answer.verdict());
        assertTrue(answer.stats().relations() * 100 < combinations,
                "the solver saw " + answer.stats().relations() + " relations");
    }
}
