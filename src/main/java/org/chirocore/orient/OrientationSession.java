package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;

import org.sat4j.core.VecInt;
import org.sat4j.minisat.SolverFactory;
import org.sat4j.specs.ContradictionException;
import org.sat4j.specs.ISolver;
import org.sat4j.specs.IVecInt;
import org.sat4j.specs.TimeoutException;

/**
 * An incremental search for a chirotope on the bases of one matroid, with relations added
 * lazily: solve on the relations known so far, check the model against every relation among
 * the active elements, add the violated ones, repeat. With element selectors, each relation's
 * clauses are guarded by "all its elements are kept", so one session answers for every
 * restriction M|S of full rank (a relation of M lies in M|S iff it mentions no element outside
 * S), and an unsatisfiable answer comes with the elements the solver needed.
 *
 * <p>This class and {@link RelationCore} are the only ones that talk to sat4j; this one turns sat4j's exceptions into answers:
 * a contradiction while adding clauses is unsatisfiability, a time-out is "unknown". A session
 * built for {@link RefutationSearch} ({@link #recording}) keeps the relations it added, in order, and
 * may have the solver log its learned and deleted clauses to a {@link DratLog}.
 */
public final class OrientationSession {
    /** Violated relations added per round; bounds the memory one round may take. */
    private static final int RELATIONS_PER_ROUND = 20_000;
    /**
     * Violated relations added per (r−2)-set X and round. Spreading a round over many X matters:
     * on the 5-cube corner construction (31 elements, rank 5) a cap of 50 decides in 4 rounds and
     * about 1 s, where taking the first 20,000 violations in scan order needed 41 rounds and 39 s.
     */
    static final int RELATIONS_PER_X = 50;
    /**
     * The per-X cap of a session that only finds a refutation's relations for {@link RelationCore}
     * to cut down: fewer relations per X and round give the solver fewer redundant relations to
     * carry. On the tipless rank-n spikes (docs/families.md) a cap of 2 added 21,108 relations
     * at n = 8 where 50 added 95,667, and the whole prediction finished in 30 s instead of 51 s,
     * with 0.9 GB of RSS instead of 3.5.
     */
    static final int FINDER_RELATIONS_PER_X = 2;

    /** The result of one {@link #solve}. */
    public sealed interface Outcome {
    }

    /** A sign per variable satisfying every relation among the active elements. */
    public record Satisfiable(byte[] signs) implements Outcome {
    }

    /**
     * No chirotope: the active elements in {@code needed} already admit none (with selectors;
     * without, {@code needed} is the whole active set).
     */
    public record Unsatisfiable(ElementSet needed) implements Outcome {
    }

    /** The budget ran out. */
    public record OutOfBudget(String reason) implements Outcome {
    }

    private final BasisIndex index;
    private final boolean selectors;
    private final Budget budget;
    private final ISolver solver;
    private final RelationScan scan;
    private final long started;
    /** The relations whose clauses went to the solver, in order; null unless recording. */
    private final List<GpRelation> added;
    private final int perX;
    private boolean contradiction;
    private long relations;
    private long clauses;
    private int rounds;
    private long conflicts;

    /**
     * @param selectors whether relations are guarded by element selectors (needed for {@link #solve}
     *     on a proper subset and for the elements an unsatisfiable answer needed)
     */
    public OrientationSession(BasisIndex index, boolean selectors, Budget budget) {
        this(index, selectors, budget, RELATIONS_PER_X);
    }

    /**
     * A session adding at most {@code perX} violated relations per (r−2)-set X and round
     * ({@link #RELATIONS_PER_X} for the public constructor).
     */
    OrientationSession(BasisIndex index, boolean selectors, Budget budget, int perX) {
        this(index, selectors, budget, null, false, perX);
    }

    /**
     * A session without selectors whose solver logs its clausal proof to {@code log}; it records
     * the relations it adds (see {@link #addedRelations}).
     */
    /**
     * A session without selectors that records the relations it adds (see {@link #addedRelations}),
     * with its solver logging to {@code log} unless that is null, adding at most {@code perX}
     * violated relations per (r−2)-set X and round.
     */
    static OrientationSession recording(BasisIndex index, Budget budget, DratLog log, int perX) {
        return new OrientationSession(index, false, budget, log, true, perX);
    }

    private OrientationSession(BasisIndex index, boolean selectors, Budget budget, DratLog log, boolean record,
            int perX) {
        this.index = index;
        this.selectors = selectors;
        this.budget = budget;
        this.solver = SolverFactory.newDefault();
        this.scan = new RelationScan(index);
        this.started = System.currentTimeMillis();
        this.added = record ? new ArrayList<>() : null;
        this.perX = perX;
        if (log != null) {
            solver.setSearchListener(log);
        }
        solver.newVar(index.basisCount() + (selectors ? index.size() : 0));
        if (budget.conflictsPerCall() > 0) {
            solver.setTimeoutOnConflicts(budget.conflictsPerCall());
        }
        for (int v : Normalisation.fixedVariables(index)) {
            addClause(new int[] {v});
        }
    }

    private int selector(int element) {
        return index.basisCount() + 1 + element;
    }

    private void addClause(int[] clause) {
        if (contradiction) {
            return;
        }
        try {
            solver.addClause(new VecInt(clause));
            clauses++;
        } catch (ContradictionException e) {
            contradiction = true;
        }
    }

    private void add(GpRelation relation) {
        if (added != null && !contradiction) {
            // Relations after a contradiction gave the solver no clause; a proof does not need them.
            added.add(relation);
        }
        relations++;
        int[] guard = selectors ? relation.support().elements() : new int[0];
        for (int[] c : ClauseEncoding.clauses(index, relation)) {
            int[] clause = Arrays.copyOf(c, c.length + guard.length);
            for (int i = 0; i < guard.length; i++) {
                clause[c.length + i] = -selector(guard[i]);
            }
            addClause(clause);
        }
    }

    /** Gives the solver the clauses of {@code given} before any solve, in order (a known refutation's). */
    void addAll(List<GpRelation> given) {
        given.forEach(this::add);
    }

    /**
     * Looks for a chirotope of the restriction to {@code active}, which must have full rank (all
     * elements when the session has no selectors).
     */
    public Outcome solve(ElementSet active) {
        if (!selectors && !active.equals(ElementSet.range(index.size()))) {
            throw new IllegalArgumentException("A session without selectors decides the whole matroid only.");
        }
        IVecInt assumptions = new VecInt();
        if (selectors) {
            for (int e : active.elements()) {
                assumptions.push(selector(e));
            }
        }
        for (int round = 1;; round++) {
            if (contradiction) {
                return new Unsatisfiable(active);
            }
            if (budget.rounds() > 0 && round > budget.rounds()) {
                return new OutOfBudget("the limit of " + budget.rounds() + " solve-and-check rounds was reached");
            }
            long remaining = budget.remaining(started);
            if (remaining < 0) {
                return new OutOfBudget(budget.timeReason());
            }
            if (remaining > 0 && budget.conflictsPerCall() == 0) {
                solver.setTimeoutMs(remaining);
            }
            rounds++;
            boolean sat;
            try {
                sat = solver.isSatisfiable(assumptions);
            } catch (TimeoutException e) {
                return new OutOfBudget(budget.conflictsPerCall() > 0
                        ? "a solver call exceeded " + budget.conflictsPerCall() + " conflicts"
                        : budget.timeReason());
            } finally {
                // sat4j's statistics accumulate over the solver's calls, which are all this session's.
                conflicts = conflictCount();
            }
            if (!sat) {
                return new Unsatisfiable(selectors ? neededElements() : active);
            }
            byte[] signs = signsOfModel();
            List<GpRelation> violated = scan.violated(signs, active, RELATIONS_PER_ROUND, perX);
            if (violated.isEmpty()) {
                return new Satisfiable(signs);
            }
            violated.forEach(this::add);
        }
    }

    private long conflictCount() {
        Object c = solver.getStat().get("conflicts");
        return c instanceof Number n ? n.longValue() : 0;
    }

    private ElementSet neededElements() {
        IVecInt explanation = solver.unsatExplanation();
        int[] needed = new int[explanation == null ? 0 : explanation.size()];
        for (int i = 0; i < needed.length; i++) {
            needed[i] = Math.abs(explanation.get(i)) - index.basisCount() - 1;
        }
        return ElementSet.of(needed);
    }

    private byte[] signsOfModel() {
        byte[] signs = new byte[index.basisCount()];
        for (int v = 1; v <= signs.length; v++) {
            signs[v - 1] = (byte) (solver.model(v) ? 1 : -1);
        }
        return signs;
    }

    /** Figures so far. */
    public SolveStats stats() {
        return new SolveStats(index.basisCount(), relations, clauses, rounds, conflicts,
                System.currentTimeMillis() - started);
    }

    /**
     * The relations whose clauses were given to the solver, in the order added; only for a
     * recording session.
     */
    List<GpRelation> addedRelations() {
        return List.copyOf(added);
    }

    /** The basis index this session works on. */
    public BasisIndex index() {
        return index;
    }
}
