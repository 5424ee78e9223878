package org.chirocore.search.marco;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.chirocore.check.ChirotopeCheck;
import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The explorer with and without the automorphism group, against a brute force written here: every
 * restriction of N decided directly. With the group, every explored set's images are reported
 * too, orientable images with witnesses carried over by the automorphism; those witnesses pass
 * the independent checker. AG(3,2) (binary, non-regular: non-orientable, Bland and Las Vergnas
 * 1978; Oxley, Matroid Theory, 2nd ed., §6.6) and AG(2,3) (AG(2,3) minus a point is not
 * orientable, every rank-3 oriented matroid on 8 elements being realisable, Björner et al.,
 * Oriented Matroids, from memory; the brute force decides it here anyway).
 */
class RestrictionExplorerTest {
    static Stream<ExplicitMatroid> matroids() {
        return Stream.of(ExplicitMatroid.of(NamedMatroids.binaryAffineCube()),
                ExplicitMatroid.of(NamedMatroids.ternaryAffinePlane()));
    }

    /** The steps of a complete exploration: orientable sets (with witnesses) and minimal non-orientable sets. */
    private record Explored(List<RestrictionExplorer.Orientable> orientable, TreeSet<Long> minimal) {
    }

    private static Explored explore(ExplicitMatroid n, List<int[]> group) {
        RestrictionExplorer explorer = new RestrictionExplorer(n, 0, Budget.UNLIMITED, true, 3, group);
        List<RestrictionExplorer.Orientable> orientable = new ArrayList<>();
        TreeSet<Long> minimal = new TreeSet<>();
        while (true) {
            RestrictionExplorer.Step step = explorer.next();
            if (step instanceof RestrictionExplorer.Done) {
                return new Explored(orientable, minimal);
            }
            if (step instanceof RestrictionExplorer.Orientable o) {
                orientable.add(o);
            } else if (step instanceof RestrictionExplorer.MinimalNonOrientable s) {
                assertTrue(minimal.add(s.set()), "reported twice: " + s.set());
            } else {
                throw new AssertionError("unexpected step " + step);
            }
        }
    }

    private static boolean orientable(ExplicitMatroid n, long set) {
        int[] elements = ElementSets.elements(set);
        if (n.rank(elements) < n.rank()) {
            return true; // no basis of N, hence no relation
        }
        return new LazySatDecider(Budget.UNLIMITED).decide(ExplicitMatroid.of(Minor.restriction(n, elements)))
                instanceof Orientability.Orientable;
    }

    @ParameterizedTest
    @MethodSource("matroids")
    void withTheGroupTheExplorationAgreesWithBruteForce(ExplicitMatroid n) {
        Symmetry group = Symmetry.automorphisms(n);
        Explored with = explore(n, group.permutations());
        Explored without = explore(n, List.of());
        TreeSet<Long> minimal = new TreeSet<>();
        for (long s = 0; s < 1L << n.size(); s++) {
            boolean orientable = orientable(n, s);
            long set = s;
            // orientable exactly when inside an explored orientable set
            assertEquals(orientable, with.orientable().stream().anyMatch(o -> (set & ~o.set()) == 0), "set " + s);
            if (!orientable && ElementSets.elements(s).length > 0) {
                boolean minimalHere = true;
                for (int e : ElementSets.elements(s)) {
                    minimalHere &= orientable(n, s & ~(1L << e));
                }
                if (minimalHere) {
                    minimal.add(s);
                }
            }
        }
        assertEquals(minimal, with.minimal());
        assertEquals(minimal, without.minimal());
        for (RestrictionExplorer.Orientable o : with.orientable()) {
            for (int e = 0; e < n.size(); e++) {
                assertTrue((o.set() >> e & 1) == 1 || !orientable(n, o.set() | 1L << e), "not maximal: " + o.set());
            }
            if (o.witness().isPresent()) {
                Chirotope w = o.witness().get();
                ExplicitMatroid restriction = ExplicitMatroid.of(Minor.restriction(n, ElementSets.elements(o.set())));
                assertEquals(sorted(restriction.bases()), sorted(w.bases()), "the witness's support is not the bases");
                Optional<String> v = ChirotopeCheck.violation(ElementSets.elements(o.set()).length, w.rank(),
                        w.bases(), signs(w));
                assertTrue(v.isEmpty(), v.orElse(""));
            }
        }
    }

    private static List<String> sorted(List<int[]> sets) {
        return sets.stream().map(java.util.Arrays::toString).sorted().toList();
    }

    private static String signs(Chirotope w) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < w.size(); i++) {
            b.append(w.sign(i) > 0 ? '+' : '-');
        }
        return b.toString();
    }
}
