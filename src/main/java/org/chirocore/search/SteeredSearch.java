package org.chirocore.search;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.Set;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.OrientationSession;
import org.chirocore.search.marco.RestrictionExplorer;

/**
 * Looks for a minor-minimal non-orientable minor meeting {@link CoreConstraints}, steering
 * instead of filtering: for each wanted rank R it runs through the independent contraction sets
 * C of size rank(M) − R (avoiding kept and avoided elements, focus elements first, then a seeded
 * order), and for each it enumerates the minimal non-orientable restrictions of M/C\A (A the
 * avoided elements) that contain the kept elements ({@link RestrictionExplorer}). Such a
 * restriction N is deletion-minimal; it is a core exactly when every N/e is orientable too
 * ({@link MinimalityDecider}). When some N/e is non-orientable the path dead-ends (N is not a core
 * of rank R) and the enumeration goes on: the next restriction, then the next contraction set.
 *
 * <p>Answers: a core (with its witnesses), "none exists" when every contraction set's
 * enumeration was completed, or unknown when a budget ran out or a minor too large to enumerate
 * had to be cut down to a grown restriction ({@link RestrictionGrowth}), which makes the
 * enumeration inside it incomplete. Cost: per contraction set, one selector session and up to
 * |E| solves per restriction found, plus up to 2|N| decisions per candidate N.
 */
public final class SteeredSearch {
    /** The outcome. */
    public sealed interface Result {
    }

    /** A core meeting the constraints. */
    public record Found(MinimalCore core) implements Result {
    }

    /**
     * No core meets the constraints: every listed space was enumerated completely.
     *
     * @param enumerated what was enumerated, in words
     */
    public record NoneExists(String enumerated) implements Result {
    }

    /** A budget ran out, or part of the space could not be enumerated; nothing is claimed. */
    public record Unknown(String reason) implements Result {
    }

    /** Largest C(n, r) of a minor whose restrictions are explored directly (the 5-cube's 31 elements of rank 5 are). */
    public static final long EXPLORED_SUBSETS = 2_000_000;

    /**
     * The budget of one seed's solve: proving a large restriction orientable is what makes an
     * exploration slow, and a seed that runs out of this is replaced by a random half of itself.
     */
    private static final Budget SEED_BUDGET = new Budget(20_000, 12, 0);

    private final SearchSettings settings;
    private final CoreConstraints constraints;
    private final long totalMillis;
    private final Progress progress;

    /**
     * @param totalMillis wall-clock limit of the whole search, 0 for none (without it, a minor
     *     too large to enumerate gets one grown restriction per contraction set; with it, further
     *     ones from later seeds while time remains)
     */
    public SteeredSearch(SearchSettings settings, CoreConstraints constraints, long totalMillis, Progress progress) {
        if (totalMillis < 0) {
            throw new IllegalArgumentException("The total time limit must not be negative, not " + totalMillis + ".");
        }
        this.settings = settings;
        this.constraints = constraints;
        this.totalMillis = totalMillis;
        this.progress = progress;
    }

    /** Mutable figures of one search. */
    private static final class Tally {
        final long started = System.currentTimeMillis();
        /** When the total time limit ends (epoch ms), 0 for none; every solver call's budget carries it. */
        final long deadline;
        int decisions;
        int contractionSets;
        int restrictions;
        int deadEnds;
        String incomplete;

        Tally(long totalMillis) {
            deadline = totalMillis == 0 ? 0 : started + totalMillis;
        }
    }

    /**
     * Searches {@code input}.
     *
     * @throws IllegalArgumentException when the constraints do not fit the input (see
     *     {@link CoreConstraints#validate})
     */
    public Result search(Matroid input) {
        constraints.validate(input);
        Tally tally = new Tally(totalMillis);
        int[] keep = indices(input, constraints.keep());
        int[] avoid = indices(input, constraints.avoid());
        List<Integer> candidates = contractionCandidates(input, keep, avoid);
        for (int round = 0;; round++) {
            boolean grownAny = false;
            for (int rank : constraints.ranks(input.rank())) {
                int k = input.rank() - rank;
                if (k > candidates.size()) {
                    continue;
                }
                int[] comb = ElementSets.range(k);
                do {
                    int[] c = new int[k];
                    for (int i = 0; i < k; i++) {
                        c[i] = candidates.get(comb[i]);
                    }
                    Arrays.sort(c);
                    if (input.rank(c) < k) {
                        continue;
                    }
                    Minor n0 = new Minor(input, c, avoid);
                    boolean direct = explorable(n0);
                    if (direct && round > 0) {
                        continue;
                    }
                    grownAny |= !direct;
                    if (round == 0) {
                        tally.contractionSets++;
                    }
                    MinimalCore found = explore(input, n0, c, round, tally);
                    if (found != null) {
                        return new Found(found);
                    }
                    if (outOfTime(tally)) {
                        return new Unknown("the total time limit of " + totalMillis + " ms ran out after "
                                + summary(tally));
                    }
                } while (ElementSets.nextCombination(comb, candidates.size()));
            }
            if (tally.incomplete == null) {
                return new NoneExists(summary(tally) + "; every minimal non-orientable restriction of each M/C"
                        + (avoid.length > 0 ? "\\A" : "") + (keep.length > 0 ? " containing the kept elements" : "")
                        + " was enumerated and each has a non-orientable single-element contraction");
            }
            if (!grownAny || totalMillis == 0) {
                return new Unknown(tally.incomplete + " (" + summary(tally) + ")");
            }
        }
    }

    /**
     * The elements that may be contracted: neither kept nor avoided nor loops; focus elements
     * first, each group in a seeded order.
     */
    private List<Integer> contractionCandidates(Matroid input, int[] keep, int[] avoid) {
        Random random = new Random(settings.seed());
        List<Integer> focus = new ArrayList<>();
        List<Integer> others = new ArrayList<>();
        for (int e = 0; e < input.size(); e++) {
            if (ElementSets.contains(keep, e) || ElementSets.contains(avoid, e) || input.rank(new int[] {e}) == 0) {
                continue;
            }
            (settings.focus().contains(input.labels().get(e)) ? focus : others).add(e);
        }
        Collections.shuffle(focus, random);
        Collections.shuffle(others, random);
        focus.addAll(others);
        return focus;
    }

    /**
     * Enumerates the minimal non-orientable restrictions of {@code n0} = M/C\A containing the kept
     * elements, and returns the first that is a core; records in the tally what was left
     * incomplete.
     */
    private MinimalCore explore(Matroid input, Minor n0, int[] c, int round, Tally tally) {
        List<String> contracted = labels(input, c);
        progress.report("contracting " + (contracted.isEmpty() ? "nothing" : String.join(" ", contracted)),
                n0.size(), n0.rank(), tally.decisions);
        ExplicitMatroid space;
        if (explorable(n0)) {
            space = ExplicitMatroid.of(n0);
        } else {
            space = grownRegion(n0, round, tally);
            if (space == null) {
                return null;
            }
        }
        long required = ElementSets.mask(indices(space, constraints.keep()));
        RestrictionExplorer explorer = new RestrictionExplorer(space, required, settings.budget().until(tally.deadline),
                Optional.of(SEED_BUDGET.until(tally.deadline)), false, settings.seed() + round);
        try {
            while (!outOfTime(tally)) {
                RestrictionExplorer.Step step = explorer.next();
                if (step instanceof RestrictionExplorer.Done) {
                    return null;
                }
                if (step instanceof RestrictionExplorer.OutOfBudget o) {
                    tally.incomplete = "the enumeration after contracting " + contracted + " ran out of budget: "
                            + o.reason();
                    return null;
                }
                if (step instanceof RestrictionExplorer.MinimalNonOrientable mus) {
                    tally.restrictions++;
                    MinimalCore core = candidate(input, space, mus.set(), contracted, explorer, tally);
                    if (core != null) {
                        return core;
                    }
                }
            }
            tally.incomplete = "the time ran out";
            return null;
        } finally {
            tally.decisions += explorer.solverCalls();
        }
    }

    /**
     * A non-orientable restriction of a minor too large to enumerate, grown from the kept and
     * focus elements (seed shifted by the round), plus the kept elements; null when none was
     * found. Either way the enumeration of this contraction set is incomplete.
     */
    private ExplicitMatroid grownRegion(Minor n0, int round, Tally tally) {
        tally.incomplete = "a minor was too large to enumerate, so only grown restrictions of it were searched";
        Set<String> start = new LinkedHashSet<>(constraints.keep());
        start.addAll(settings.focus());
        SearchSettings growth = new SearchSettings(settings.seed() + round, settings.strategy(),
                settings.budget().until(tally.deadline), new ArrayList<>(start));
        RestrictionGrowth.Grown grown = new RestrictionGrowth(n0, growth, progress).grow();
        tally.decisions += grown.decisions();
        if (grown.elements() == null) {
            return null;
        }
        int[] region = ElementSets.union(grown.elements(), indices(n0, constraints.keep()));
        Minor restriction = Minor.restriction(n0, region);
        return explorable(restriction) ? ExplicitMatroid.of(restriction) : null;
    }

    /**
     * The core (M/C)|S, when every single-element contraction of it is orientable; else null. When
     * (N/e)|U is non-orientable, every restriction containing U + e has a non-orientable
     * contraction, so the explorer excludes the supersets of U + e from then on.
     */
    private MinimalCore candidate(Matroid input, ExplicitMatroid space, long set, List<String> contracted,
            RestrictionExplorer explorer, Tally tally) {
        ExplicitMatroid core = ExplicitMatroid.of(Minor.restriction(space, ElementSets.elements(set)));
        progress.report("checking a minimal non-orientable restriction", core.size(), core.rank(), tally.decisions);
        Budget budget = settings.budget().until(tally.deadline);
        MinimalityDecider proof = new MinimalityDecider(new LazySatDecider(budget), Strategy.CONTRACT_FIRST,
                Progress.SILENT);
        MinimalityDecider.Result result = proof.decide(core, new OrientationSession(BasisIndex.of(core), true,
                budget), range(core.size()));
        tally.decisions += proof.decisions();
        if (result instanceof MinimalityDecider.Minimal minimal) {
            List<String> deleted = new ArrayList<>();
            for (String label : input.labels()) {
                if (!contracted.contains(label) && !core.labels().contains(label)) {
                    deleted.add(label);
                }
            }
            ExplicitMatroid rebuilt = ExplicitMatroid.of(new Minor(input, indices(input, contracted),
                    indices(input, deleted)));
            if (!rebuilt.equals(core)) {
                throw new IllegalStateException("The contraction and deletion sets do not rebuild the core.");
            }
            SearchStats stats = new SearchStats(tally.decisions + explorer.solverCalls(), space.size(),
                    System.currentTimeMillis() - tally.started);
            return new MinimalCore(core, contracted, deleted, minimal.witnesses(), settings, stats);
        }
        if (result instanceof MinimalityDecider.Unknown u) {
            tally.incomplete = "deciding the single-element minors of a candidate ran out of budget: " + u.reason();
        } else if (result instanceof MinimalityDecider.NonOrientableDeletion) {
            throw new IllegalStateException("A restriction found minimal non-orientable has a non-orientable deletion.");
        } else {
            tally.deadEnds++;
            MinimalityDecider.NonOrientableContraction c = (MinimalityDecider.NonOrientableContraction) result;
            OrientationSession.Outcome o = new OrientationSession(BasisIndex.of(c.minor()), true, budget)
                    .solve(ElementSet.range(c.minor().size()));
            tally.decisions++;
            if (o instanceof OrientationSession.Unsatisfiable u) {
                List<String> blocked = new ArrayList<>(labels(c.minor(), u.needed().elements()));
                blocked.add(core.labels().get(c.element()));
                explorer.exclude(ElementSets.mask(indices(space, blocked)));
            }
        }
        return null;
    }

    /**
     * Whether the restrictions of {@code m} are explored directly: at most
     * {@link Limits#ENUMERATED_ELEMENTS} elements (the enumeration's sets are 64-bit masks) and
     * {@link #EXPLORED_SUBSETS} r-subsets (the selector session's basis index; its relations are
     * generated lazily, so the scan size matters less than for a single decision).
     */
    public static boolean explorable(Matroid m) {
        return m.size() <= Limits.ENUMERATED_ELEMENTS && ElementSets.binomial(m.size(), m.rank()) <= EXPLORED_SUBSETS;
    }

    private boolean outOfTime(Tally tally) {
        return tally.deadline > 0 && System.currentTimeMillis() >= tally.deadline;
    }

    private static String summary(Tally tally) {
        return tally.contractionSets + " contraction sets, " + tally.restrictions
                + " minimal non-orientable restrictions (" + tally.deadEnds
                + " with a non-orientable single-element contraction), " + tally.decisions + " solver calls, "
                + (System.currentTimeMillis() - tally.started) + " ms";
    }

    private static List<Integer> range(int n) {
        List<Integer> out = new ArrayList<>();
        for (int e = 0; e < n; e++) {
            out.add(e);
        }
        return out;
    }

    private static List<String> labels(Matroid m, int[] set) {
        List<String> out = new ArrayList<>();
        for (int e : set) {
            out.add(m.labels().get(e));
        }
        return out;
    }

    /** The indices of {@code labels} in m that are elements of it, sorted. */
    private static int[] indices(Matroid m, List<String> labels) {
        return labels.stream().mapToInt(m.labels()::indexOf).filter(e -> e >= 0).sorted().distinct().toArray();
    }
}
