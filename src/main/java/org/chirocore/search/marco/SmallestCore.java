package org.chirocore.search.marco;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Minor;
import org.chirocore.search.CoreConstraints;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.MinimalityDecider;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.SearchStats;

/**
 * Finds a minor-minimal non-orientable minor of M with the fewest elements. A non-orientable minor
 * with the fewest elements is minor-minimal by itself (every proper minor has fewer elements), so
 * it suffices to find the smallest non-orientable minor. Every minor is (M/C)|S with C independent
 * and S spanning M/C; a restriction that does not span is a minor of higher corank, met with a
 * larger C. So for each independent C of size rank(M) − R (R from rank(M) down to 3: every
 * matroid of rank at most 2 is orientable), one per orbit of the symmetry group (an automorphism
 * maps a minor to an isomorphic one of the same size), a {@link RestrictionExplorer} looks for a
 * non-orientable restriction of M/C of at most {@code cap} elements, cap being one less than the
 * smallest found so far (at first, the size of M). Each find is shrunk to a minimal one and lowers
 * the cap; the explorer of C ends when every restriction of at most cap elements is explored. When
 * all have ended, no non-orientable minor is smaller than the best found: every C's search was
 * exhausted at a cap at least the final one. The best is then certified minimal by its
 * single-element minors ({@link MinimalityDecider}), whose witnesses go into its certificate.
 *
 * <p>The claim "nothing smaller" rests on the producer's SAT answers (the orientable answers that
 * block subsets in the map, and the map's final unsatisfiability), which are not independently
 * checked. Cost: per contraction set, one MARCO run restricted to small sets (exponential in the
 * worst case; every solver call within the budget).
 */
public final class SmallestCore {
    /**
     * How the search of one contraction set ended.
     *
     * @param contracted the labels of C
     * @param exhaustedBelow every restriction of M/C with fewer elements than this was explored and
     *     none is non-orientable (the cap at the end, plus one)
     * @param orbit how many contraction sets the symmetry maps C to (C included)
     * @param orientable orientable restrictions answered, each grown to a maximal one (its subsets blocked)
     * @param nonOrientable minimal non-orientable restrictions found (each lowered the cap)
     * @param solverCalls orientability solves and map calls
     */
    public record Exhausted(List<String> contracted, int exhaustedBelow, int orbit, int orientable,
            int nonOrientable, int solverCalls) {
        public Exhausted {
            contracted = List.copyOf(contracted);
        }
    }

    /** The answer of {@link #search}. */
    public sealed interface Result {
    }

    /**
     * A smallest core, with the record of why nothing smaller exists.
     *
     * @param core the core, its path and its minimality witnesses
     * @param searched one entry per contraction set up to symmetry, in the order searched
     * @param millis wall-clock time
     */
    public record Found(MinimalCore core, List<Exhausted> searched, long millis) implements Result {
        public Found {
            searched = List.copyOf(searched);
        }
    }

    /**
     * Every minor is orientable (every contraction set's search was exhausted with nothing found).
     *
     * @param searched one entry per contraction set up to symmetry
     */
    public record NoneExists(List<Exhausted> searched) implements Result {
        public NoneExists {
            searched = List.copyOf(searched);
        }
    }

    /** A budget ran out; nothing is claimed. */
    public record Unknown(String reason) implements Result {
    }

    private final SearchSettings settings;
    private final Symmetry symmetry;
    private final Progress progress;
    private final long totalMillis;

    /**
     * A search with these settings (seed, budget per solver call) and symmetry group.
     *
     * @param totalMillis wall-clock limit of the whole search, after which it answers unknown; it
     *     is checked between explorer steps and is the deadline of every solver call; 0 for none
     */
    public SmallestCore(SearchSettings settings, Symmetry symmetry, long totalMillis, Progress progress) {
        this.settings = settings;
        this.symmetry = symmetry;
        this.totalMillis = totalMillis;
        this.progress = progress;
    }

    /** The best minor found so far: M/C restricted to set, on N = M/C's numbering. */
    private record Best(int[] contracted, ExplicitMatroid n, long set) {
    }

    /** Searches {@code m} for a smallest minor-minimal non-orientable minor. */
    public Result search(ExplicitMatroid m) {
        long started = System.currentTimeMillis();
        long deadline = totalMillis == 0 ? 0 : started + totalMillis;
        List<Exhausted> searched = new ArrayList<>();
        Best best = null;
        int cap = m.size();
        int calls = 0;
        for (int rank : CoreConstraints.none().ranks(m.rank())) {
            for (int[] c : symmetry.independentRepresentatives(m, m.rank() - rank)) {
                ExplicitMatroid n = ExplicitMatroid.of(new Minor(m, c, new int[0]));
                List<String> contracted = Arrays.stream(c).mapToObj(m.labels()::get).toList();
                progress.report("at most " + cap + " elements, contracting "
                        + (c.length == 0 ? "nothing" : String.join(" ", contracted)), n.size(), n.rank(), calls);
                RestrictionExplorer explorer = new RestrictionExplorer(n, 0, settings.budget().until(deadline), true,
                        settings.seed());
                explorer.limitSize(cap);
                int orientable = 0;
                int found = 0;
                while (true) {
                    if (totalMillis > 0 && System.currentTimeMillis() - started > totalMillis) {
                        return new Unknown("the total time of " + totalMillis + " ms ran out");
                    }
                    RestrictionExplorer.Step step = explorer.next();
                    if (step instanceof RestrictionExplorer.OutOfBudget o) {
                        return new Unknown("the search after contracting " + contracted + " ran out of budget: "
                                + o.reason());
                    }
                    if (step instanceof RestrictionExplorer.Done) {
                        break;
                    }
                    if (step instanceof RestrictionExplorer.Orientable) {
                        orientable++;
                    } else {
                        long set = ((RestrictionExplorer.MinimalNonOrientable) step).set();
                        found++;
                        best = new Best(c, n, set);
                        cap = Long.bitCount(set) - 1;
                        explorer.limitSize(cap);
                    }
                }
                calls += explorer.solverCalls();
                searched.add(new Exhausted(contracted, cap + 1, symmetry.orbitSize(ElementSets.mask(c)), orientable,
                        found, explorer.solverCalls()));
            }
        }
        if (best == null) {
            return new NoneExists(searched);
        }
        return certified(m, best, searched, calls, started);
    }

    private Result certified(ExplicitMatroid m, Best best, List<Exhausted> searched, int calls, long started) {
        ExplicitMatroid core = ExplicitMatroid.of(Minor.restriction(best.n(), ElementSets.elements(best.set())));
        MinimalityDecider.Result result = MinimalityDecider.decide(core, settings.budget());
        if (result instanceof MinimalityDecider.Unknown u) {
            return new Unknown("deciding the single-element minors of the smallest core ran out of budget: "
                    + u.reason());
        }
        if (!(result instanceof MinimalityDecider.Minimal minimal)) {
            // Every proper minor is smaller than the smallest non-orientable minor, so this is a bug.
            throw new IllegalStateException("A smallest non-orientable minor has a non-orientable single-element minor: "
                    + result);
        }
        List<String> contracted = Arrays.stream(best.contracted()).mapToObj(m.labels()::get).toList();
        List<String> deleted = m.labels().stream().filter(l -> !contracted.contains(l) && !core.labels().contains(l))
                .toList();
        long millis = System.currentTimeMillis() - started;
        MinimalCore found = new MinimalCore(core, contracted, deleted, minimal.witnesses(), settings,
                new SearchStats(calls + 2 * core.size(), best.n().size(), millis));
        return new Found(found, searched, millis);
    }
}
