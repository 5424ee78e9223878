package org.chirocore.search.marco;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.TreeSet;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Isomorphism;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The enumeration against a brute force written here independently: every contraction set C,
 * every subset S of the rest, the minor (M/C)|S decided directly, and minimality checked on
 * every single-element deletion and contraction. Cores are compared as labelled minors (ground
 * set and bases), grouped by isomorphism with counts.
 */
class CoreEnumerationTest {
    private static CoreEnumeration.Result enumerate(ExplicitMatroid m, Symmetry g, OptionalInt rank) {
        return new CoreEnumeration(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED),
                new CoreConstraints(rank, List.of(), List.of()), g, Progress.SILENT).enumerate(m);
    }

    /** Every core of m of rank 3..rank(m) (or the given rank), as "sorted labels|sorted bases" keys. */
    private static List<ExplicitMatroid> bruteForce(ExplicitMatroid m, OptionalInt onlyRank) {
        Map<ExplicitMatroid, Boolean> orientable = new HashMap<>();
        List<ExplicitMatroid> cores = new ArrayList<>();
        int n = m.size();
        for (long c = 0; c < 1L << n; c++) {
            int[] cs = elements(c);
            int rank = m.rank() - cs.length;
            if (m.rank(cs) < cs.length || rank < 3 || (onlyRank.isPresent() && rank != onlyRank.getAsInt())) {
                continue;
            }
            for (long s = 0; s < 1L << n; s++) {
                if ((s & c) != 0) {
                    continue;
                }
                ExplicitMatroid minor = ExplicitMatroid.of(new Minor(m, cs, elements(~(s | c) & ((1L << n) - 1))));
                if (minor.rank() != rank || isOrientable(minor, orientable)) {
                    continue;
                }
                boolean minimal = true;
                for (int e = 0; e < minor.size() && minimal; e++) {
                    minimal = isOrientable(ExplicitMatroid.of(new Minor(minor, new int[0], new int[] {e})), orientable)
                            && isOrientable(ExplicitMatroid.of(new Minor(minor, new int[] {e}, new int[0])), orientable);
                }
                if (minimal && !cores.contains(minor)) {
                    cores.add(minor);
                }
            }
        }
        return cores;
    }

    private static boolean isOrientable(ExplicitMatroid m, Map<ExplicitMatroid, Boolean> memo) {
        return memo.computeIfAbsent(m, x -> x.rank() <= 2
                || new LazySatDecider(Budget.UNLIMITED).decide(x) instanceof Orientability.Orientable);
    }

    private static int[] elements(long mask) {
        return java.util.stream.IntStream.range(0, 64).filter(i -> (mask >> i & 1) != 0).toArray();
    }

    /** The brute force's cores grouped by isomorphism: a representative and a count per class. */
    private static Map<ExplicitMatroid, Integer> classes(List<ExplicitMatroid> cores) {
        Map<ExplicitMatroid, Integer> out = new HashMap<>();
        for (ExplicitMatroid core : cores) {
            ExplicitMatroid rep = out.keySet().stream()
                    .filter(r -> new HyperplaneIsomorphismInspector(r, core).find().isPresent()).findFirst().orElse(core);
            out.merge(rep, 1, Integer::sum);
        }
        return out;
    }

    private static void assertAgrees(ExplicitMatroid m, Symmetry g, OptionalInt rank) {
        CoreEnumeration.Result r = enumerate(m, g, rank);
        assertTrue(r.complete(), r.incomplete().orElse(""));
        List<ExplicitMatroid> cores = bruteForce(m, rank);
        assertProofsAgree(m, r, cores);
        Map<ExplicitMatroid, Integer> expected = classes(cores);
        assertEquals(expected.size(), r.classes().size(), "classes");
        for (CoreEnumeration.CoreClass c : r.classes()) {
            ExplicitMatroid rep = expected.keySet().stream()
                    .filter(x -> new HyperplaneIsomorphismInspector(x, c.example().core()).find().isPresent())
                    .findFirst().orElseThrow();
            assertEquals(expected.get(rep), c.count(), "count of " + c.example().core());
        }
    }

    /**
     * The proofs of the evidence against the brute force: a dead end's set is no core and its
     * contraction (the minor the refutation is over, on S − e) is decided non-orientable here; a
     * class member's set is a core and its element map an isomorphism onto its class's first core.
     */
    private static void assertProofsAgree(ExplicitMatroid m, CoreEnumeration.Result r, List<ExplicitMatroid> cores) {
        for (CoreEnumeration.ContractionEvidence e : r.evidence()) {
            int[] c = e.contracted().stream().mapToInt(m.labels()::indexOf).toArray();
            for (CoreEnumeration.MinimalSet s : e.minimal()) {
                int[] deleted = java.util.stream.IntStream.range(0, m.size())
                        .filter(x -> !e.contracted().contains(m.labels().get(x)) && !s.elements().contains(m.labels().get(x)))
                        .toArray();
                ExplicitMatroid restriction = ExplicitMatroid.of(new Minor(m, c, deleted));
                if (s.proof().orElse(null) instanceof CoreEnumeration.DeadEnd d) {
                    assertTrue(!cores.contains(restriction), "a dead end is a core: " + s.elements());
                    List<String> rest = new ArrayList<>(s.elements());
                    rest.remove(d.contracted());
                    assertEquals(rest, d.minor().labels());
                    assertEquals(ExplicitMatroid.of(new Minor(restriction, new int[] {s.elements().indexOf(d.contracted())},
                            new int[0])), d.minor());
                    assertTrue(!isOrientable(d.minor(), new HashMap<>()), "the dead end's contraction is orientable");
                } else if (s.proof().orElse(null) instanceof CoreEnumeration.ClassMember k) {
                    assertTrue(cores.contains(restriction), "a class member is no core: " + s.elements());
                    ExplicitMatroid example = r.classes().get(k.classNumber() - 1).example().core();
                    Isomorphism iso = new Isomorphism(k.images().stream().map(example.labels()::indexOf).toList());
                    assertTrue(iso.isIsomorphism(restriction, example), "not an isomorphism: " + k);
                }
            }
        }
    }

    /**
     * AG(3,2): every single-element contraction is F7 and every deletion F7* (Oxley, Matroid
     * Theory, 2nd ed., Appendix, AG(3,2)); both are minimal non-orientable (binary, not regular:
     * Bland and Las Vergnas 1978; Oxley §6.6, Tutte's excluded minors for regularity). So two
     * classes with 8 minors each, with the full automorphism group or none.
     */
    @Test
    void binaryAffineCubeHasEightFanosAndEightDuals() {
        ExplicitMatroid ag = ExplicitMatroid.of(NamedMatroids.binaryAffineCube());
        Symmetry g = Symmetry.automorphisms(ag);
        assertEquals(1344, g.order(), "|AGL(3,2)| = 8 · 168 (Oxley, Appendix, AG(3,2); from memory)");
        CoreEnumeration.Result r = enumerate(ag, g, OptionalInt.empty());
        assertEquals(2, r.classes().size());
        TreeSet<String> found = new TreeSet<>();
        for (CoreEnumeration.CoreClass c : r.classes()) {
            found.add(c.example().core().rank() + ":" + c.count());
        }
        assertEquals(new TreeSet<>(List.of("3:8", "4:8")), found);
        assertAgrees(ag, Symmetry.none(ag.size()), OptionalInt.empty());
        assertAgrees(ag, g, OptionalInt.empty());
    }

    /** AG(2,3) against the brute force, with its automorphism group (order 432 = 9 · |GL(2,3)|, common practice). */
    @Test
    void ternaryAffinePlaneAgreesWithBruteForce() {
        ExplicitMatroid ag = ExplicitMatroid.of(NamedMatroids.ternaryAffinePlane());
        Symmetry g = Symmetry.automorphisms(ag);
        assertEquals(432, g.order());
        assertAgrees(ag, g, OptionalInt.empty());
    }

    /**
     * The corner construction of the 4-cube (15 elements, rank 4), rank 3, against the brute
     * force, with the cube symmetries fixing H and O: the coordinate permutations (S4, 24) and no
     * reflection, which moves O.
     */
    @Test
    @Tag("slow")
    void cornerOfTheFourCubeAgreesWithBruteForce() {
        CubeConstruction c = CubeConstruction.corner(4);
        ExplicitMatroid m = ExplicitMatroid.of(c.build());
        Symmetry g = Symmetry.ofCube(c, m);
        assertEquals(24, g.order());
        assertAgrees(m, g, OptionalInt.of(3));
        assertAgrees(m, g, OptionalInt.of(4));
    }

    /** The cube group is computed: on the 3-cube corner (the Fano plane) it is S3. */
    @Test
    void cubeSymmetriesFixingHAndOAreComputed() {
        CubeConstruction c = CubeConstruction.corner(3);
        ExplicitMatroid m = ExplicitMatroid.of(c.build());
        assertEquals(6, Symmetry.ofCube(c, m).order());
        assertEquals(168, Symmetry.automorphisms(m).order(), "|Aut F7| = |PGL(3,2)| = 168 (Oxley, Appendix, F7)");
    }
}
