package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalInt;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.junit.jupiter.api.Test;

/** Constrained searches: the rank, kept and avoided elements are honoured, and "none exists" is only said when true. */
class SteeredSearchTest {
    private static SteeredSearch.Result search(Matroid m, int rank, List<String> keep, List<String> avoid) {
        CoreConstraints c = new CoreConstraints(rank == 0 ? OptionalInt.empty() : OptionalInt.of(rank), keep, avoid);
        return new SteeredSearch(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), c, 0,
                Progress.SILENT).search(m);
    }

    private static MinimalCore found(SteeredSearch.Result r) {
        return assertInstanceOf(SteeredSearch.Found.class, r, r.toString()).core();
    }

    /**
     * AG(3,2)/e ≅ F7 and AG(3,2)\e ≅ F7* (Oxley, Matroid Theory, 2nd ed., Appendix, entry AG(3,2));
     * both are minor-minimal non-orientable (binary and not regular, Bland and Las Vergnas 1978;
     * Oxley §6.6). So rank 3 must give F7 by one contraction and rank 4 F7* by one deletion.
     */
    @Test
    void ranksOfTheBinaryAffineCubeGiveFanoAndItsDual() {
        Matroid ag = NamedMatroids.binaryAffineCube();
        MinimalCore three = found(search(ag, 3, List.of(), List.of()));
        assertEquals(3, three.core().rank());
        assertEquals(1, three.contracted().size());
        assertTrue(new HyperplaneIsomorphismInspector(three.core(), NamedMatroids.fano()).find().isPresent());
        MinimalCore four = found(search(ag, 4, List.of(), List.of()));
        assertEquals(List.of(), four.contracted());
        assertTrue(new HyperplaneIsomorphismInspector(four.core(), NamedMatroids.fanoDual()).find().isPresent());
    }

    /**
     * Kept elements stay in the core, avoided ones are deleted; the core is rebuilt from its path
     * and re-decided. With 000 avoided, rank 3 leaves AG(3,2)/e\000 ≅ F7\x ≅ M(K4), which is
     * graphic, hence orientable (Oxley, Matroid Theory, 2nd ed., Appendix, F7): none exists.
     */
    @Test
    void keptAndAvoidedElementsAreHonoured() {
        Matroid ag = NamedMatroids.binaryAffineCube();
        assertInstanceOf(SteeredSearch.NoneExists.class, search(ag, 3, List.of(), List.of("000")));
        MinimalCore core = found(search(ag, 4, List.of("110"), List.of("000")));
        assertTrue(core.core().labels().contains("110"));
        assertEquals(List.of("000"), core.deleted());
        ExplicitMatroid rebuilt = ExplicitMatroid.of(new Minor(ag, indices(ag, core.contracted()),
                indices(ag, core.deleted())));
        assertEquals(core.core(), rebuilt);
        assertInstanceOf(Orientability.NonOrientable.class, new LazySatDecider(Budget.UNLIMITED).decide(rebuilt));
    }

    /**
     * F7 is minor-minimal non-orientable (as above), so with an element avoided nothing is left to
     * find: the space is small enough to be exhausted, and the answer is "none exists".
     */
    @Test
    void avoidingAnElementOfTheFanoPlaneLeavesNoCore() {
        SteeredSearch.Result r = search(NamedMatroids.fano(), 3, List.of(), List.of("1"));
        assertInstanceOf(SteeredSearch.NoneExists.class, r, r.toString());
    }

    /** F7 has rank 3, so its only core of rank 3 is itself; rank 4 is out of range. */
    @Test
    void rankOutOfRangeIsRefused() {
        assertEquals(7, found(search(NamedMatroids.fano(), 3, List.of(), List.of())).core().size());
        assertThrows(IllegalArgumentException.class, () -> search(NamedMatroids.fano(), 4, List.of(), List.of()));
        assertThrows(IllegalArgumentException.class, () -> search(NamedMatroids.fano(), 3, List.of("9"), List.of()));
        assertThrows(IllegalArgumentException.class, () -> search(NamedMatroids.fano(), 3, List.of("1"),
                List.of("1")));
    }

    private static int[] indices(Matroid m, List<String> labels) {
        return labels.stream().mapToInt(m.labels()::indexOf).sorted().toArray();
    }
}
