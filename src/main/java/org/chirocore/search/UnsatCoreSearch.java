package org.chirocore.search;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.Simplification;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.OrientabilityDecider;
import org.chirocore.orient.OrientationSession;
import org.chirocore.orient.WitnessCheck;

/**
 * Reduces a non-orientable matroid to a minor-minimal non-orientable minor. Deletions go through
 * one selector session per minor: an unsatisfiable answer names the elements the solver needed,
 * and all others are deleted at once (a relation survives the deletion of D iff it mentions no
 * element of D). Contractions are decided on the contracted minor itself. When no single-element
 * deletion or contraction is non-orientable, the orientation witnesses of all of them, each
 * re-checked, are the proof of minimality.
 *
 * <p>Inputs too large to enumerate (see {@link #enumerable}) are first cut down, so their
 * r-subsets are never all enumerated: the focus elements of the settings are contracted (rank
 * kept at least 3), the result is simplified, and then decided or grown from by
 * {@link RestrictionGrowth}. The element order of each pass is a permutation drawn from the seed.
 */
public final class UnsatCoreSearch implements CoreSearch {
    /** Largest C(n, r) that is enumerated directly; larger inputs are grown from a small restriction. */
    public static final long DIRECT_LIMIT = 20_000;

    /** Largest number of relation index combinations C(n, r−2)·C(n−r+2, 4) scanned directly. */
    public static final long SCAN_LIMIT = 50_000_000;

    private final SearchSettings settings;
    private final OrientabilityDecider decider;
    private final Progress progress;

    /**
     * A search with {@code settings} that decides whole matroids with {@code decider} (the
     * selector sessions of the deletion steps are the search's own), reporting to {@code progress}.
     */
    public UnsatCoreSearch(SearchSettings settings, OrientabilityDecider decider, Progress progress) {
        this.settings = settings;
        this.decider = decider;
        this.progress = progress;
    }

    /** A search deciding with the lazy SAT decider under the settings' budget. */
    public UnsatCoreSearch(SearchSettings settings, Progress progress) {
        this(settings, new LazySatDecider(settings.budget()), progress);
    }

    /** Mutable state of one reduction. */
    private final class Run {
        final Random random = new Random(settings.seed());
        final List<String> contracted = new ArrayList<>();
        final List<String> deleted = new ArrayList<>();
        final long started = System.currentTimeMillis();
        int decisions;
        int grownTo;
    }

    @Override
    public SearchResult reduce(Matroid input) {
        Run run = new Run();
        run.grownTo = input.size();
        ExplicitMatroid current = enumerable(input) ? ExplicitMatroid.of(input) : startingMinor(input, run);
        if (current == null) {
            return new SearchResult.Unknown("no non-orientable minor small enough to enumerate was found; the input has "
                    + input.size() + " elements of rank " + input.rank());
        }
        boolean first = true;
        while (true) {
            progress.report("minimising", current.size(), current.rank(), run.decisions);
            OrientationSession session = new OrientationSession(BasisIndex.of(current), true, settings.budget());
            ElementSet all = ElementSet.range(current.size());
            OrientationSession.Outcome outcome = session.solve(all);
            run.decisions++;
            if (outcome instanceof OrientationSession.OutOfBudget o) {
                return new SearchResult.Unknown(o.reason());
            }
            if (outcome instanceof OrientationSession.Satisfiable s) {
                if (!first) {
                    throw new IllegalStateException("A minor found non-orientable was later found orientable.");
                }
                Chirotope witness = session.index().chirotope(s.signs(), all);
                return new SearchResult.Orientable(WitnessCheck.checked(current, witness));
            }
            first = false;
            ElementSet needed = ((OrientationSession.Unsatisfiable) outcome).needed();
            if (!needed.equals(all)) {
                current = restrict(current, needed, run);
                continue;
            }
            MinimalityDecider.Result pass = minimalityPass(current, session, run);
            if (pass instanceof MinimalityDecider.Unknown u) {
                return new SearchResult.Unknown(u.reason());
            }
            if (pass instanceof MinimalityDecider.NonOrientableDeletion d) {
                current = restrict(current, d.needed(), run);
                continue;
            }
            if (pass instanceof MinimalityDecider.NonOrientableContraction c) {
                run.contracted.add(current.labels().get(c.element()));
                current = c.minor();
                continue;
            }
            List<MinorWitness> witnesses = ((MinimalityDecider.Minimal) pass).witnesses();
            checkPath(input, current, run);
            SearchStats stats = new SearchStats(run.decisions, run.grownTo, System.currentTimeMillis() - run.started);
            return new SearchResult.Found(new MinimalCore(current, run.contracted, run.deleted, witnesses, settings, stats));
        }
    }

    /**
     * Whether all r-subsets of {@code m} and one scan of its relations are cheap enough to do
     * directly: at most {@link ExplicitMatroid#MAX_ELEMENTS} elements, {@link #DIRECT_LIMIT} r-subsets or a rank of at most 3, and
     * at most {@link #SCAN_LIMIT} relation index combinations.
     */
    static boolean enumerable(Matroid m) {
        int n = m.size();
        int r = m.rank();
        long subsets = ElementSets.binomial(n, r);
        long scan;
        try {
            scan = r < 2 ? 0 : Math.multiplyExact(ElementSets.binomial(n, r - 2), ElementSets.binomial(n - r + 2, 4));
        } catch (ArithmeticException overflow) {
            scan = Long.MAX_VALUE;
        }
        return n <= ExplicitMatroid.MAX_ELEMENTS && (subsets <= DIRECT_LIMIT || r <= 3) && scan <= SCAN_LIMIT
                && subsets <= BasisIndex.MAX_SUBSETS;
    }

    /**
     * A non-orientable minor of a large input small enough to enumerate, with its path recorded in
     * {@code run}; null when none was found. First the focus elements are contracted (rank ≥ 3 is
     * kept: every matroid of rank at most 2 is orientable) and the result is decided or grown from;
     * failing that, a restriction of the input itself is grown.
     */
    private ExplicitMatroid startingMinor(Matroid input, Run run) {
        Matroid m = input;
        List<String> focusContracted = new ArrayList<>();
        List<String> focus = new ArrayList<>(settings.focus());
        Collections.shuffle(focus, run.random);
        for (String label : focus) {
            int e = m.labels().indexOf(label);
            if (enumerable(m) || m.rank() <= 3 || e < 0 || m.rank(new int[] {e}) == 0) {
                continue;
            }
            m = new Minor(m, new int[] {e}, new int[0]);
            focusContracted.add(label);
        }
        if (!focusContracted.isEmpty()) {
            progress.report("contracted the focus " + focusContracted, m.size(), m.rank(), run.decisions);
            ExplicitMatroid found = nonOrientablePart(m, run);
            if (found != null) {
                run.contracted.addAll(focusContracted);
                return found;
            }
        }
        return nonOrientablePart(input, run);
    }

    /**
     * A non-orientable restriction of {@code m} small enough to enumerate, or null: {@code m}
     * itself or its simplification when that is enumerable and decided non-orientable within the
     * budget, else a restriction grown inside the simplification. The deleted labels are recorded
     * in {@code run} on success only.
     */
    private ExplicitMatroid nonOrientablePart(Matroid m, Run run) {
        Matroid candidate = m;
        if (!enumerable(m)) {
            // A restriction is a minor, so a non-orientable simplification serves as well as m.
            int[] simple = Simplification.representatives(m);
            if (simple.length < m.size()) {
                candidate = Minor.restriction(m, simple);
                progress.report("simplified", candidate.size(), candidate.rank(), run.decisions);
            }
        }
        ExplicitMatroid found;
        if (enumerable(candidate)) {
            ExplicitMatroid explicit = ExplicitMatroid.of(candidate);
            Orientability answer = decider.decide(explicit);
            run.decisions++;
            found = answer instanceof Orientability.NonOrientable ? explicit : null;
        } else {
            progress.report("growing a non-orientable restriction", candidate.size(), candidate.rank(), run.decisions);
            RestrictionGrowth.Grown grown = new RestrictionGrowth(candidate, settings, progress).grow();
            run.decisions += grown.decisions();
            found = grown.elements() == null ? null : ExplicitMatroid.of(Minor.restriction(candidate, grown.elements()));
        }
        if (found == null) {
            return null;
        }
        Set<String> kept = new HashSet<>(found.labels());
        for (String label : m.labels()) {
            if (!kept.contains(label)) {
                run.deleted.add(label);
            }
        }
        run.grownTo = found.size();
        return found;
    }

    /** The restriction of {@code m} to the elements of {@code kept}, recording the deleted labels. */
    private static ExplicitMatroid restrict(ExplicitMatroid m, ElementSet kept, Run run) {
        for (int e = 0; e < m.size(); e++) {
            if (!kept.contains(e)) {
                run.deleted.add(m.labels().get(e));
            }
        }
        ExplicitMatroid next = ExplicitMatroid.of(Minor.restriction(m, kept.elements()));
        if (next.rank() != m.rank()) {
            throw new IllegalStateException("Deleting the elements no relation needed lowered the rank.");
        }
        return next;
    }

    /** One pass over the single-element minors of {@code m} in a seeded order: it shrinks m or proves it minimal. */
    private MinimalityDecider.Result minimalityPass(ExplicitMatroid m, OrientationSession session, Run run) {
        List<Integer> order = new ArrayList<>();
        for (int e = 0; e < m.size(); e++) {
            order.add(e);
        }
        Collections.shuffle(order, run.random);
        MinimalityDecider minimality = new MinimalityDecider(decider, settings.strategy(), progress);
        MinimalityDecider.Result result = minimality.decide(m, session, order);
        run.decisions += minimality.decisions();
        return result;
    }

    /** Re-derives the core as M/C\D from the input and the recorded path, and insists it is the same. */
    private static void checkPath(Matroid input, ExplicitMatroid core, Run run) {
        int[] c = indices(input, run.contracted);
        int[] d = indices(input, run.deleted);
        ExplicitMatroid rebuilt = ExplicitMatroid.of(new Minor(input, c, d));
        if (!rebuilt.equals(core)) {
            throw new IllegalStateException("The recorded path does not rebuild the core from the input.");
        }
    }

    /**
     * The element indices of {@code labels} in {@code m}, sorted. The labels are looked up in a
     * map: a path deletes almost all of a pulled 16-cube's 2^16 vertices, and a linear search per
     * label would cost about 2·10^9 string comparisons.
     */
    private static int[] indices(Matroid m, List<String> labels) {
        Map<String, Integer> index = new HashMap<>();
        for (int e = 0; e < m.size(); e++) {
            index.put(m.labels().get(e), e);
        }
        int[] out = new int[labels.size()];
        for (int i = 0; i < out.length; i++) {
            Integer e = index.get(labels.get(i));
            if (e == null) {
                throw new IllegalStateException("The recorded label " + labels.get(i) + " is not an element of the input.");
            }
            out[i] = e;
        }
        Arrays.sort(out);
        return out;
    }
}
