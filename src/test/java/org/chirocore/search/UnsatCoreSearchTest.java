package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** {@link UnsatCoreSearch} under the core-search contract, and its restriction growth. */
class UnsatCoreSearchTest extends CoreSearchContract {

    @Override
    CoreSearch search(SearchSettings settings) {
        return new UnsatCoreSearch(settings, new LazySatDecider(settings.budget()), Progress.SILENT);
    }

    @Test
    void growthFindsANonOrientableRestriction() {
        // AG(3,2) is non-orientable (binary, not regular: Oxley, Matroid Theory, 2nd ed., §6.6),
        // so growth must stop at a non-orientable restriction of full rank.
        Matroid m = NamedMatroids.binaryAffineCube();
        RestrictionGrowth.Grown grown = new RestrictionGrowth(m,
                new SearchSettings(3, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT).grow();
        Matroid restriction = Minor.restriction(m, grown.elements());
        assertEquals(m.rank(), restriction.rank());
        assertInstanceOf(Orientability.NonOrientable.class, new LazySatDecider(Budget.UNLIMITED).decide(restriction));
    }

    @Test
    @Tag("slow")
    void withoutFocusTheFiveCubeIsReducedThroughGrowth() {
        Matroid m = CubeConstruction.corner(5).build();
        SearchResult r = search(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED)).reduce(m);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertTrue(found.stats().grownTo() < m.size());
        assertMinimalityDecider(found);
    }
}
