package org.chirocore.search.marco;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.Random;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Limits;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.TooLargeException;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.OrientationSession;
import org.chirocore.orient.UnexploredSubsets;
import org.chirocore.orient.WitnessCheck;

/**
 * Enumerates the minimal non-orientable restrictions of full rank of one matroid N (the minimal
 * unsatisfiable subsets over element selectors), MARCO style: a map of the unexplored subsets
 * ({@link UnexploredSubsets}) gives a maximal unexplored seed; an unsatisfiable seed is shrunk
 * to a minimal non-orientable restriction and its supersets are blocked; a satisfiable one is
 * (optionally) grown to a maximal orientable restriction and its subsets are blocked. One
 * selector session on N answers every orientability question, so learned clauses are shared.
 *
 * <p>Only restrictions containing the {@code required} elements are reported: the shrink removes
 * the other elements first, and when a required element turns out removable too, no minimal
 * non-orientable restriction inside the shrunk set contains all required elements (any one
 * would miss a critical non-required element), so its subsets are blocked instead.
 *
 * <p>A restriction that does not span N is never non-orientable here: it contains no basis of
 * N, hence no relation. Minimal non-orientable restrictions of full rank are what a rank-r core
 * of N is made of. Cost: one map call and, per seed, at most |N| orientability solves.
 */
public final class RestrictionExplorer {
    /** One answer of {@link #next}. */
    public sealed interface Step {
    }

    /** A minimal non-orientable restriction N|S containing the required elements. */
    public record MinimalNonOrientable(long set) implements Step {
    }

    /**
     * An orientable restriction N|T whose subsets are now explored; maximal (no element can be
     * added) when the explorer grows seeds.
     *
     * @param witness its re-checked chirotope, when T spans N (otherwise N|T has a lower rank
     *     and contains no relation of N)
     */
    public record Orientable(long set, Optional<Chirotope> witness) implements Step {
    }

    /** Every subset containing the required elements has been explored. */
    public record Done() implements Step {
    }

    /** A solver ran out of budget; the enumeration is incomplete. */
    public record OutOfBudget(String reason) implements Step {
    }

    private final ExplicitMatroid m;
    private final long required;
    private final boolean grow;
    private final Budget budget;
    private final OrientationSession session;
    private final UnexploredSubsets map;
    private final int[] order;
    /**
     * How often a seed whose solve ran out of the seed budget is replaced by a random half of it
     * (the sets explored so far stay exactly known, so the enumeration stays sound).
     */
    private static final int HALVINGS = 8;

    private final List<Long> nonOrientable = new ArrayList<>();
    private final List<Long> orientable = new ArrayList<>();
    private final Optional<Budget> seedBudget;
    /** With a seed budget, seeds larger than this (3r + 1) are replaced by a random part of this size. */
    private final int seedCap;
    private final Random random;
    private int solves;

    /**
     * An explorer of the restrictions of {@code m} containing {@code required}.
     *
     * @param grow whether satisfiable seeds are grown to maximal orientable restrictions (needed
     *     for completeness evidence; costs orientability proofs of large sets)
     * @param seed the seed of the element order of the map, the shrink and the growth
     */
    public RestrictionExplorer(ExplicitMatroid m, long required, Budget budget, boolean grow, long seed) {
        this(m, required, budget, Optional.empty(), grow, seed);
    }

    /**
     * As above, but the seeds (large sets, whose orientable answers are the expensive ones) are cut
     * to a random part of 3r + 1 elements and solved within {@code seedBudget}; a seed that runs
     * out of it is replaced by a random half of itself, up to {@value #HALVINGS} times, before the
     * explorer answers out of budget. The map still records exactly what was explored, so the
     * enumeration stays complete when it ends with {@link Done}.
     */
    public RestrictionExplorer(ExplicitMatroid m, long required, Budget budget, Optional<Budget> seedBudget,
            boolean grow, long seed) {
        if (m.size() > Limits.ENUMERATED_ELEMENTS) {
            throw new TooLargeException("The matroid has " + m.size() + " elements; its restrictions are enumerated on at most "
                    + Limits.ENUMERATED_ELEMENTS + ".");
        }
        this.seedCap = 3 * m.rank() + 1;
        this.m = m;
        this.required = required;
        this.grow = grow;
        this.budget = budget;
        this.seedBudget = seedBudget;
        this.random = new Random(seed);
        this.session = new OrientationSession(BasisIndex.of(m), true, seedBudget.orElse(budget));
        this.map = new UnexploredSubsets(m.size(), ElementSet.range(m.size()), ElementSet.ofMask(required));
        List<Integer> shuffled = new ArrayList<>();
        for (int e = 0; e < m.size(); e++) {
            shuffled.add(e);
        }
        Collections.shuffle(shuffled, new Random(seed));
        this.order = shuffled.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The next minimal non-orientable or explored orientable restriction, or the end. */
    public Step next() {
        while (true) {
            UnexploredSubsets.Next seed = map.next(budget, order);
            if (seed instanceof UnexploredSubsets.Exhausted) {
                return new Done();
            }
            if (seed instanceof UnexploredSubsets.OutOfBudget o) {
                return new OutOfBudget(o.reason());
            }
            long set = ((UnexploredSubsets.Seed) seed).set().toMask();
            if (seedBudget.isPresent() && Long.bitCount(set) > seedCap) {
                set = part(set, seedCap);
            }
            OrientationSession.Outcome outcome = solve(set);
            for (int attempt = 0; outcome instanceof OrientationSession.OutOfBudget && seedBudget.isPresent()
                    && attempt < HALVINGS; attempt++) {
                set = part(set, Long.bitCount(set) / 2);
                outcome = solve(set);
            }
            if (outcome instanceof OrientationSession.OutOfBudget o) {
                return new OutOfBudget(o.reason());
            }
            if (outcome instanceof OrientationSession.Satisfiable s) {
                return orientable(set, s.signs());
            }
            Step shrunk = shrink(((OrientationSession.Unsatisfiable) outcome).needed().toMask() | (set & required));
            if (shrunk != null) {
                return shrunk;
            }
        }
    }

    /**
     * Solves N|set: on N's session, or, with a seed budget, on a fresh session of N|set alone
     * (faster on a small set than N's session with every relation added so far). The answer's
     * needed elements and signs are those of N's numbering either way.
     */
    private OrientationSession.Outcome solve(long set) {
        solves++;
        if (seedBudget.isEmpty()) {
            return session.solve(ElementSet.ofMask(set));
        }
        int[] elements = ElementSets.elements(set);
        if (m.rank(elements) < m.rank()) {
            // N|set contains no basis of N, hence no relation: every sign vector satisfies it.
            byte[] signs = new byte[session.index().basisCount()];
            Arrays.fill(signs, (byte) 1);
            return new OrientationSession.Satisfiable(signs);
        }
        OrientationSession local = new OrientationSession(BasisIndex.of(Minor.restriction(m, elements)), true,
                seedBudget.get());
        OrientationSession.Outcome o = local.solve(ElementSet.range(elements.length));
        if (o instanceof OrientationSession.Unsatisfiable u) {
            return new OrientationSession.Unsatisfiable(ElementSet.ofMask(global(u.needed().toMask(), elements)));
        }
        if (o instanceof OrientationSession.Satisfiable s) {
            return new OrientationSession.Satisfiable(liftedSigns(local.index(), s.signs(), elements));
        }
        return o;
    }

    /** Signs on N's bases from signs on the bases of N|elements (bases of N outside get +1; they are never read). */
    private byte[] liftedSigns(BasisIndex local, byte[] signs, int[] elements) {
        byte[] out = new byte[session.index().basisCount()];
        Arrays.fill(out, (byte) 1);
        for (int v = 1; v <= signs.length; v++) {
            out[session.index().variable(ElementSet.ofMask(global(local.basis(v).toMask(), elements))) - 1] = signs[v - 1];
        }
        return out;
    }

    /** Grows the orientable {@code set} when asked, blocks its subsets and reports it. */
    private Step orientable(long set, byte[] signs) {
        long t = set;
        byte[] model = signs;
        if (grow) {
            for (int e : order) {
                long bigger = t | (1L << e);
                if (bigger == t || containsNonOrientable(bigger)) {
                    continue;
                }
                OrientationSession.Outcome o = solve(bigger);
                if (o instanceof OrientationSession.OutOfBudget b) {
                    return new OutOfBudget(b.reason());
                }
                if (o instanceof OrientationSession.Satisfiable s) {
                    t = bigger;
                    model = s.signs();
                }
            }
        }
        map.blockSubsets(ElementSet.ofMask(t));
        orientable.add(t);
        int[] elements = ElementSets.elements(t);
        Optional<Chirotope> witness = Optional.empty();
        if (m.rank(elements) == m.rank()) {
            witness = Optional.of(WitnessCheck.checked(Minor.restriction(m, elements),
                    session.index().chirotope(model, ElementSet.ofMask(t))));
        }
        return new Orientable(t, witness);
    }

    /**
     * A random part of {@code set} with about {@code size} elements (required elements stay) that
     * is not inside an explored orientable set, so that answering it is progress; {@code set}
     * itself when every try was.
     */
    private long part(long set, int size) {
        for (int tries = 0; tries < HALVINGS; tries++) {
            List<Integer> free = new ArrayList<>();
            for (int e : ElementSets.elements(set & ~required)) {
                free.add(e);
            }
            Collections.shuffle(free, random);
            long t = set & required;
            for (int i = 0; i < free.size() && Long.bitCount(t) < size; i++) {
                t |= 1L << free.get(i);
            }
            long candidate = t;
            if (orientable.stream().noneMatch(o -> (candidate & ~o) == 0)) {
                return candidate;
            }
        }
        return set;
    }

    private boolean containsNonOrientable(long set) {
        for (long u : nonOrientable) {
            if ((u & ~set) == 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * Shrinks the non-orientable {@code set}: non-required elements first, each kept exactly when
     * the set without it is orientable; an unsatisfiable answer cuts the set to the elements the
     * solver needed (plus the required ones, still non-orientable, being a superset). Returns
     * null when a required element turned out removable (its subsets are then blocked). The
     * solves go to a fresh selector session on N|set: on a small restriction it answers far
     * faster than the session on N, which carries every relation added so far.
     */
    private Step shrink(long set) {
        int[] elements = ElementSets.elements(set);
        OrientationSession local = new OrientationSession(BasisIndex.of(Minor.restriction(m, elements)), true, budget);
        long t = ElementSets.allMask(elements.length);
        long localRequired = local(required, elements);
        int[] localOrder = Arrays.stream(order).map(e -> Arrays.binarySearch(elements, e)).filter(i -> i >= 0).toArray();
        for (int pass = 0; pass < 2; pass++) {
            for (int e : localOrder) {
                boolean isRequired = (localRequired & (1L << e)) != 0;
                if ((t & (1L << e)) == 0 || isRequired != (pass == 1)) {
                    continue;
                }
                solves++;
                OrientationSession.Outcome o = local.solve(ElementSet.ofMask(t & ~(1L << e)));
                if (o instanceof OrientationSession.OutOfBudget b) {
                    return new OutOfBudget(b.reason());
                }
                if (o instanceof OrientationSession.Unsatisfiable u) {
                    if (isRequired) {
                        map.blockSubsets(ElementSet.ofMask(global(t, elements)));
                        return null;
                    }
                    t = u.needed().toMask() | (t & localRequired);
                }
            }
        }
        long found = global(t, elements);
        nonOrientable.add(found);
        map.blockSupersets(ElementSet.ofMask(found));
        return new MinimalNonOrientable(found);
    }

    /** The positions in {@code elements} of the members of {@code set}. */
    private static long local(long set, int[] elements) {
        long out = 0;
        for (int i = 0; i < elements.length; i++) {
            if ((set & (1L << elements[i])) != 0) {
                out |= 1L << i;
            }
        }
        return out;
    }

    /** The elements at the positions of {@code positions}. */
    private static long global(long positions, int[] elements) {
        long out = 0;
        for (int i : ElementSets.elements(positions)) {
            out |= 1L << elements[i];
        }
        return out;
    }

    /**
     * From now on only restrictions of at most {@code k} elements are explored: a non-orientable
     * seed is shrunk, so what is reported has at most k elements too; {@link Done} then means
     * that no restriction of at most k elements is minimal non-orientable.
     */
    public void limitSize(int k) {
        map.limitSize(k);
    }

    /**
     * Marks every superset of {@code set} explored without reporting it: for a caller that knows
     * such sets hold nothing it wants (e.g. no core: a set containing U + e where (N/e)|U is
     * non-orientable has a non-orientable contraction).
     */
    public void exclude(long set) {
        map.blockSupersets(ElementSet.ofMask(set));
    }

    /** Orientability solves made so far. */
    public int solves() {
        return solves;
    }

    /** Solver calls made so far: orientability solves and calls of the map's solver. */
    public int solverCalls() {
        return solves + map.calls();
    }
}
