package org.chirocore.search;

import java.util.Optional;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Matroid;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;

/**
 * Times the corner construction ({@link CubeConstruction#corner}: H spanned by the unit vectors,
 * the all-ones vertex pulled to it and contracted) for one dimension: a plain orientability
 * decision of the whole matroid (only up to {@link #MAX_DECIDED_DIMENSION}, beyond which it is
 * far slower than the reduction) and a reduction to a minimal core. It measures and asserts
 * nothing; the figures are for people comparing changes.
 */
public final class Benchmark {
    /**
     * Largest n whose whole matroid is decided directly: the 6-cube's contraction has
     * C(63, 6) ≈ 67 million 6-subsets, more than the basis index enumerates.
     */
    public static final int MAX_DECIDED_DIMENSION = 5;

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
}
