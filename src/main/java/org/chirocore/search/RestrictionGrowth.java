package org.chirocore.search;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Flats;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.OrientationSession;

/**
 * Grows a small non-orientable restriction M|S of a large matroid, so that only subsets of S are
 * ever enumerated. Starts from the focus elements of the settings completed to a spanning set
 * (from a basis when there is no focus) and, while M|S is orientable, adds the outside element
 * lying on the most hyperplanes of M|S (it adds the most dependencies, hence constraints); ties
 * go by a seeded order. Once M|S is non-orientable the solver's needed elements cut S down.
 * A restriction of the same rank is a minor, so a non-orientable M|S proves M non-orientable.
 */
final class RestrictionGrowth {
    /**
     * The grown restriction: non-orientable, or the whole ground set when growth reached it
     * without a quick proof; null when the restriction outgrew what can be enumerated or the
     * deadline of the settings' budget passed.
     */
    record Grown(int[] elements, int decisions) {
    }

    /**
     * Growth steps only look for quick proofs of non-orientability: proving an intermediate
     * restriction orientable is the expensive case and is never needed, so a step that runs out
     * of this budget just grows further.
     */
    private static final Budget GROWTH_BUDGET = new Budget(20_000, 12, 0);

    private final Matroid m;
    private final SearchSettings settings;
    private final Progress progress;

    RestrictionGrowth(Matroid m, SearchSettings settings, Progress progress) {
        this.m = m;
        this.settings = settings;
        this.progress = progress;
    }

    Grown grow() {
        List<Integer> order = new ArrayList<>();
        for (int e = 0; e < m.size(); e++) {
            order.add(e);
        }
        Collections.shuffle(order, new Random(settings.seed()));
        // Start from the focus elements still present (where the obstruction is expected), made
        // spanning by a greedy completion in the seeded order.
        int[] s = settings.focus().stream().mapToInt(m.labels()::indexOf).filter(e -> e >= 0).sorted().toArray();
        for (int e : order) {
            int rank = m.rank(s);
            if (rank == m.rank()) {
                break;
            }
            int[] t = ElementSets.with(s, e);
            if (m.rank(t) > rank) {
                s = t;
            }
        }
        int decisions = 0;
        Budget budget = GROWTH_BUDGET.until(settings.budget().deadline());
        while (budget.remaining(System.currentTimeMillis()) >= 0 && s.length <= ExplicitMatroid.MAX_ELEMENTS
                && ElementSets.binomial(s.length, m.rank()) <= BasisIndex.MAX_SUBSETS) {
            progress.report("growing a non-orientable restriction", s.length, m.rank(), decisions);
            Minor restriction = Minor.restriction(m, s);
            BasisIndex index = BasisIndex.of(restriction);
            OrientationSession.Outcome outcome = new OrientationSession(index, true, budget)
                    .solve(ElementSet.range(s.length));
            decisions++;
            if (outcome instanceof OrientationSession.Unsatisfiable u) {
                int[] needed = u.needed().elements();
                int[] out = new int[needed.length];
                for (int i = 0; i < needed.length; i++) {
                    out[i] = s[needed[i]];
                }
                return new Grown(out, decisions);
            }
            if (s.length == m.size()) {
                return new Grown(s, decisions);
            }
            s = ElementSets.with(s, mostConstrained(restriction, s, order));
        }
        return new Grown(null, decisions);
    }

    /** A maximal independent subset (at most {@code limit} elements) taken greedily in the given order. */
    private int[] independentPart(int[] candidates, int limit) {
        int[] part = new int[0];
        for (int e : candidates) {
            if (part.length == limit) {
                break;
            }
            int[] t = ElementSets.with(part, e);
            if (m.rank(t) == t.length) {
                part = t;
            }
        }
        return part;
    }

    /** The element outside s on the most hyperplanes of M|s; the earliest in {@code order} on ties. */
    private int mostConstrained(Minor restriction, int[] s, List<Integer> order) {
        List<int[]> spans = new ArrayList<>();
        for (int[] h : Flats.hyperplanes(restriction)) {
            int[] members = new int[h.length];
            for (int i = 0; i < h.length; i++) {
                members[i] = s[h[i]];
            }
            spans.add(independentPart(members, m.rank() - 1));
        }
        int best = -1;
        int bestScore = -1;
        for (int e : order) {
            if (ElementSets.contains(s, e)) {
                continue;
            }
            int score = 0;
            for (int[] span : spans) {
                if (m.rank(ElementSets.with(span, e)) == span.length) {
                    score++;
                }
            }
            if (score > bestScore) {
                best = e;
                bestScore = score;
            }
        }
        return best;
    }
}
