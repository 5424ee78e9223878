package org.chirocore.orient;

import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;

/**
 * Re-decides a matroid's orientability on its own clauses, without element selectors, and
 * records a proof when it has no chirotope: the normalisation units, the relations the lazy loop
 * actually added (in the order added) and sat4j's learned and deleted clauses as DRAT, closed by
 * the empty clause. Selectors are left out because a certificate's CNF has none: every logged
 * lemma is then a consequence of exactly the listed clauses. Costs one lazy-loop decision (see
 * {@link OrientationSession}) plus the proof text, which grows with the solver's conflicts.
 *
 * <p>Trimmed: a first lazy loop without logging finds the relations, {@link RelationCore} cuts
 * them down to an unsatisfiable core, and the logged solve runs on the core's relations only (in
 * their original order; the loop would add more only if the core were satisfiable, which it is not).
 * On the tipless spikes of rank n = 6..9 the listed relations drop from 6,190, 26,147, 95,667 and
 * 312,678 to roughly a fifth to a twentieth (docs/families.md).
 */
public final class RefutationSearch {
    private final Budget budget;
    private final boolean trim;

    /** A search whose proof lists every relation the lazy loop added. */
    public RefutationSearch(Budget budget) {
        this(budget, false);
    }

    /**
     * @param trim whether the listed relations are first cut down to an unsatisfiable core
     *     ({@link RelationCore}): a smaller certificate and a faster verification, for a second
     *     lazy loop with fewer relations per round and one or two more solves
     */
    public RefutationSearch(Budget budget, boolean trim) {
        this.budget = budget;
        this.trim = trim;
    }

    /** The result of {@link #refute}. */
    public sealed interface Outcome {
    }

    /** No chirotope, with its proof. */
    public record Refuted(Refutation refutation) implements Outcome {
    }

    /** Orientable after all, with a witness that was re-checked against every relation. */
    public record Orientable(Chirotope witness) implements Outcome {
    }

    /** The budget ran out; nothing is claimed. */
    public record OutOfBudget(String reason) implements Outcome {
    }

    /**
     * Tries to refute orientability of {@code m}.
     *
     * @throws IllegalArgumentException when {@code m} is too large to enumerate (see {@link BasisIndex#of})
     */
    public Outcome refute(Matroid m) {
        BasisIndex index = BasisIndex.of(m);
        ElementSet all = ElementSet.range(m.size());
        List<GpRelation> given = List.of();
        if (trim) {
            // Find the relations without logging, cut them down, then log a proof on the core only.
            OrientationSession finder = OrientationSession.recording(index, budget, null,
                    OrientationSession.FINDER_RELATIONS_PER_X);
            OrientationSession.Outcome found = finder.solve(all);
            if (!(found instanceof OrientationSession.Unsatisfiable)) {
                return answer(m, index, found);
            }
            RelationCore.Outcome cut = new RelationCore(index, finder.addedRelations(), budget).cut();
            if (cut instanceof RelationCore.OutOfTime o) {
                return new OutOfBudget(o.reason());
            }
            given = ((RelationCore.Core) cut).relations();
        }
        DratLog log = new DratLog();
        OrientationSession session = OrientationSession.recording(index, budget, log, OrientationSession.RELATIONS_PER_X);
        session.addAll(given);
        OrientationSession.Outcome outcome = session.solve(all);
        if (!(outcome instanceof OrientationSession.Unsatisfiable)) {
            return answer(m, index, outcome);
        }
        log.empty();
        Refutation.Stats stats = new Refutation.Stats(session.stats(), log.lemmas(), log.deletions());
        return new Refuted(new Refutation(Arrays.stream(Normalisation.fixedVariables(index)).boxed().toList(),
                session.addedRelations(), log.text(), stats));
    }

    private static Outcome answer(Matroid m, BasisIndex index, OrientationSession.Outcome outcome) {
        if (outcome instanceof OrientationSession.Satisfiable s) {
            return new Orientable(WitnessCheck.checked(m, index.chirotope(s.signs(), ElementSet.range(m.size()))));
        }
        return new OutOfBudget(((OrientationSession.OutOfBudget) outcome).reason());
    }
}
