package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

import org.sat4j.core.VecInt;
import org.sat4j.minisat.SolverFactory;
import org.sat4j.specs.ContradictionException;
import org.sat4j.specs.ISolver;
import org.sat4j.specs.IVecInt;
import org.sat4j.specs.TimeoutException;

/**
 * Cuts an unsatisfiable list of 3-term relations (with the normalisation units) down to the part
 * the contradiction needs, an unsatisfiable core. The lazy loop adds every relation a model
 * violates, and most of them the final contradiction never uses, while a certificate lists every
 * relation of its CNF: the certificate's size and the verifier's work follow the list, not the proof.
 *
 * <p>How (an assumption-based unsatisfiable core, common practice): each relation's clauses carry
 * a fresh selector literal; a solve under the selectors of a sublist as assumptions decides that
 * sublist, and an unsatisfiable answer names, through sat4j's {@code unsatExplanation}, the
 * selectors its final conflict used, which is a sublist that is still unsatisfiable. This is
 * repeated on that sublist until it stops shrinking. The result need not be minimal: on the
 * tipless spike of rank 6 it keeps 1,117 of 6,190 relations, where a deletion pass (one solve per
 * relation, tried while measuring) got down to 92, but such a small list made the solver's own
 * proof 60 times longer and the deletion pass cost one solve per relation, so it is not done.
 * Deterministic: sat4j's search depends only on its input. Costs one solve per round on the
 * relations' clauses; the caller's {@link Budget} bounds the wall-clock time.
 */
final class RelationCore {
    /** Rounds of re-solving on the core; the second round rarely shrinks it further. */
    private static final int ROUNDS = 4;

    private final BasisIndex index;
    private final List<GpRelation> relations;
    private final Budget budget;

    /** What {@link #cut} found. */
    sealed interface Outcome {
    }

    /** An unsatisfiable sublist, in the order of the input. */
    record Core(List<GpRelation> relations) implements Outcome {
    }

    /** The time budget ran out; no claim. */
    record OutOfTime(String reason) implements Outcome {
    }

    RelationCore(BasisIndex index, List<GpRelation> relations, Budget budget) {
        this.index = index;
        this.relations = List.copyOf(relations);
        this.budget = budget;
    }

    private int selector(int k) {
        return index.basisCount() + 1 + k;
    }

    /**
     * @throws IllegalStateException when the list is satisfiable: whoever called it had no
     *     refutation, a bug
     */
    Outcome cut() {
        long started = System.currentTimeMillis();
        ISolver solver = SolverFactory.newDefault();
        solver.newVar(index.basisCount() + relations.size());
        try {
            for (int v : Normalisation.fixedVariables(index)) {
                solver.addClause(new VecInt(new int[] {v}));
            }
            for (int k = 0; k < relations.size(); k++) {
                for (int[] c : ClauseEncoding.clauses(index, relations.get(k))) {
                    int[] guarded = Arrays.copyOf(c, c.length + 1);
                    guarded[c.length] = -selector(k);
                    solver.addClause(new VecInt(guarded));
                }
            }
        } catch (ContradictionException e) {
            // Guarded clauses are never empty or unit-contradictory and the units are GF(2)-independent.
            throw new IllegalStateException("Guarded relation clauses contradicted the normalisation units: a bug.", e);
        }
        BitSet kept = new BitSet();
        kept.set(0, relations.size());
        for (int round = 0; round < ROUNDS; round++) {
            long remaining = budget.remaining(started);
            if (remaining < 0) {
                return new OutOfTime(budget.timeReason());
            }
            if (remaining > 0) {
                solver.setTimeoutMs(remaining);
            }
            IVecInt assumptions = new VecInt();
            for (int k = kept.nextSetBit(0); k >= 0; k = kept.nextSetBit(k + 1)) {
                assumptions.push(selector(k));
            }
            try {
                if (solver.isSatisfiable(assumptions)) {
                    throw new IllegalStateException("The relations of a refutation turned out satisfiable: a bug.");
                }
            } catch (TimeoutException e) {
                return new OutOfTime(budget.timeReason());
            }
            BitSet core = explanation(solver);
            boolean shrunk = core.cardinality() < kept.cardinality();
            kept = core;
            if (!shrunk) {
                break;
            }
        }
        List<GpRelation> out = new ArrayList<>();
        for (int k = kept.nextSetBit(0); k >= 0; k = kept.nextSetBit(k + 1)) {
            out.add(relations.get(k));
        }
        return new Core(out);
    }

    private BitSet explanation(ISolver solver) {
        BitSet out = new BitSet();
        IVecInt explanation = solver.unsatExplanation();
        for (int i = 0; explanation != null && i < explanation.size(); i++) {
            int k = Math.abs(explanation.get(i)) - index.basisCount() - 1;
            if (k >= 0) {
                out.set(k);
            }
        }
        return out;
    }
}
