package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.junit.jupiter.api.Test;

/** A deadline carried by a budget stops every solver call that starts after it; it never turns into an answer. */
class BudgetTest {
    /** Epoch millisecond 1: long past. */
    private static final long PASSED = 1;

    @Test
    void untilKeepsTheEarlierDeadline() {
        Budget b = new Budget(10, 2, 500);
        assertEquals(0, b.deadline());
        assertEquals(b, b.until(0));
        assertEquals(7, b.until(9).until(7).until(8).deadline());
        assertEquals(10, b.until(7).conflictsPerCall());
        assertEquals(500, b.until(7).millis());
    }

    /**
     * F7 is not orientable (binary and not regular: Bland and Las Vergnas 1978; Oxley, Matroid
     * Theory, 2nd ed., §6.6), so without a deadline the session answers unsatisfiable; with a
     * passed deadline it must answer out of budget, and so must the map of unexplored subsets.
     */
    @Test
    void aPassedDeadlineAnswersOutOfBudget() {
        BasisIndex index = BasisIndex.of(NamedMatroids.fano());
        ElementSet all = ElementSet.range(7);
        assertInstanceOf(OrientationSession.Unsatisfiable.class,
                new OrientationSession(index, true, Budget.UNLIMITED).solve(all));
        OrientationSession.Outcome late = new OrientationSession(index, true, Budget.UNLIMITED.until(PASSED)).solve(all);
        assertEquals("the total time limit ran out", assertInstanceOf(OrientationSession.OutOfBudget.class, late).reason());
        UnexploredSubsets map = new UnexploredSubsets(7, all, ElementSet.EMPTY);
        assertInstanceOf(UnexploredSubsets.OutOfBudget.class, map.next(new Budget(100, 0, 0).until(PASSED),
                new int[] {0, 1, 2, 3, 4, 5, 6}));
        assertInstanceOf(UnexploredSubsets.Seed.class, map.next(new Budget(100, 0, 0), new int[] {0, 1, 2, 3, 4, 5, 6}));
    }
}
