package org.chirocore.search;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.Realised;

/**
 * Times the corner construction ({@link CubeConstruction#corner}: H spanned by the unit vectors,
 * the all-ones vertex pulled to it and contracted) for one dimension: a plain orientability
 * decision of the whole matroid (only up to {@link #MAX_DECIDED_DIMENSION}, beyond which it is
 * far slower than the reduction) and a reduction to a minimal core; and orientable instances
 * ({@link #orientable}), decided by their realisation or by the SAT search. It measures and
 * asserts nothing; the figures are for people comparing changes.
 */
public final class Benchmark {
    /**
     * Largest n whose whole matroid is decided directly: the 6-cube's contraction has
     * C(63, 6) ≈ 67 million 6-subsets, more than the basis index enumerates.
     */
    public static final int MAX_DECIDED_DIMENSION = 5;

    /** Time limit of the SAT search on the 5-cube when the budget sets none: ten minutes. */
    public static final long DEFAULT_SEARCH_MILLIS = 600_000;

    private Benchmark() {
    }

    /**
     * One dimension's figures.
     *
     * @param n the cube dimension
     * @param elements elements of the constructed matroid
     * @param rank its rank
     * @param decision the direct decision, when n ≤ {@link #MAX_DECIDED_DIMENSION}; its stats
     *     hold its time
     * @param reduction the reduction's result
     * @param reduceMillis wall-clock time of the reduction
     */
    public record Row(int n, int elements, int rank, Optional<Orientability> decision, SearchResult reduction,
            long reduceMillis) {
    }

    /**
     * Builds the corner construction of the n-cube and times deciding and reducing it.
     *
     * @throws IllegalArgumentException when the construction cannot be built for n (e.g. n = 1)
     */
    public static Row corner(int n, SearchSettings settings) {
        CubeConstruction construction = CubeConstruction.corner(n);
        Matroid m = construction.build();
        SearchSettings focused = new SearchSettings(settings.seed(), settings.strategy(), settings.budget(),
                construction.focus());
        Optional<Orientability> decision = n <= MAX_DECIDED_DIMENSION
                ? Optional.of(new LazySatDecider(settings.budget()).decide(m))
                : Optional.empty();
        long start = System.nanoTime();
        SearchResult reduction = new UnsatCoreSearch(focused, Progress.SILENT).reduce(m);
        long millis = (System.nanoTime() - start) / 1_000_000;
        return new Row(n, m.size(), m.rank(), decision, reduction, millis);
    }

    /**
     * One orientable instance's figures.
     *
     * @param name what was decided
     * @param elements its number of elements
     * @param rank its rank
     * @param method "realisation" (determinant signs, checked) or "search" (the lazy SAT loop)
     * @param verdict "orientable", "non-orientable" or "unknown" (the search's budget ran out)
     * @param bases its number of bases
     * @param relations 3-term relations given to the solver (0 for a realisation)
     * @param millis wall-clock time of the decision
     */
    public record OrientableRow(String name, int elements, int rank, String method, String verdict, long bases,
            long relations, long millis) {
    }

    /**
     * Decides the orientable instances: the real 4- and 5-cube as matrices over Q (by their
     * determinant signs), the 5-cube again by the SAT search alone (within the budget's time
     * limit, else {@link #DEFAULT_SEARCH_MILLIS}), and the Vámos matroid, orientable but not
     * realisable over any field (Björner et al., <i>Oriented Matroids</i>, 2nd ed.; Oxley,
     * <i>Matroid Theory</i>, Appendix, V8), which only the search can decide. Each row goes to
     * {@code sink} as soon as it is measured.
     */
    public static void orientable(Budget budget, Consumer<OrientableRow> sink) {
        Budget search = budget.millis() > 0 ? budget
                : new Budget(budget.conflictsPerCall(), budget.rounds(), DEFAULT_SEARCH_MILLIS);
        for (int n = 4; n <= 5; n++) {
            Matroid cube = AffineCube.real(n).matrixMatroid();
            Realised r = Realised.decide(cube).orElseThrow();
            sink.accept(new OrientableRow("real " + n + "-cube", cube.size(), cube.rank(), "realisation",
                    "orientable", r.bases(), 0, r.millis()));
        }
        sink.accept(searched("Vamos V8", vamos(), search));
        sink.accept(searched("real 5-cube", AffineCube.real(5).matrixMatroid(), search));
    }

    private static OrientableRow searched(String name, Matroid m, Budget budget) {
        Orientability o = new LazySatDecider(budget).decide(m);
        return new OrientableRow(name, m.size(), m.rank(), "search", o.verdict(), o.stats().bases(),
                o.stats().relations(), o.stats().millis());
    }

    /**
     * The Vámos matroid: rank 4 on a, a', b, b', c, c', d, d', whose only non-bases are {a,a',b,b'},
     * {a,a',c,c'}, {a,a',d,d'}, {b,b',c,c'}, {b,b',d,d'} (Oxley, <i>Matroid Theory</i>, Appendix, V8).
     */
    private static Matroid vamos() {
        List<int[]> pairsOfPairs = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            for (int j = i + 1; j < 4; j++) {
                if (i + j < 5) {
                    // every pair of the pairs {2i, 2i+1} except the last, {c,c',d,d'} (i = 2, j = 3)
                    pairsOfPairs.add(new int[] {2 * i, 2 * i + 1, 2 * j, 2 * j + 1});
                }
            }
        }
        return ExplicitMatroid.fromNonBases(List.of("a", "a'", "b", "b'", "c", "c'", "d", "d'"), 4, pairsOfPairs);
    }
}
