package org.chirocore.orient;

import java.util.Arrays;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;

/**
 * Re-decides a matroid's orientability on its own clauses, without element selectors, and
 * records a proof when it has no chirotope: the normalisation units, the relations the lazy loop
 * actually added (in the order added) and sat4j's learned and deleted clauses as DRAT, closed by
 * the empty clause. Selectors are left out because a certificate's CNF has none: every logged
 * lemma is then a consequence of exactly the listed clauses. Costs one lazy-loop decision (see
 * {@link OrientationSession}) plus the proof text, which grows with the solver's conflicts.
 */
public final class RefutationSearch {
    private final Budget budget;

    public RefutationSearch(Budget budget) {
        this.budget = budget;
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
        DratLog log = new DratLog();
        OrientationSession session = new OrientationSession(index, budget, log);
        ElementSet all = ElementSet.range(m.size());
        OrientationSession.Outcome outcome = session.solve(all);
        if (outcome instanceof OrientationSession.Satisfiable s) {
            return new Orientable(WitnessCheck.checked(m, index.chirotope(s.signs(), all)));
        }
        if (outcome instanceof OrientationSession.OutOfBudget o) {
            return new OutOfBudget(o.reason());
        }
        log.empty();
        Refutation.Stats stats = new Refutation.Stats(session.stats(), log.lemmas(), log.deletions());
        return new Refuted(new Refutation(Arrays.stream(Normalisation.fixedVariables(index)).boxed().toList(),
                session.addedRelations(), log.text(), stats));
    }
}
