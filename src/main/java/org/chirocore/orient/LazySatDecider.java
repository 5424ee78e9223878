package org.chirocore.orient;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.Matroid;

/**
 * Decides orientability with a SAT solver on the certificate encoding, generating 3-term
 * relations lazily (see {@link OrientationSession}): memory grows with the relations the solver
 * actually needs, not with all C(n, r−2)·C(n−r+2, 4) of them. An orientable answer carries a
 * witness that was re-checked against every relation.
 */
public final class LazySatDecider implements OrientabilityDecider {
    private final Budget budget;

    public LazySatDecider(Budget budget) {
        this.budget = budget;
    }

    @Override
    public Orientability decide(Matroid m) {
        BasisIndex index = BasisIndex.of(m);
        OrientationSession session = new OrientationSession(index, false, budget);
        ElementSet all = ElementSet.range(m.size());
        OrientationSession.Outcome outcome = session.solve(all);
        SolveStats stats = session.stats();
        if (outcome instanceof OrientationSession.Satisfiable s) {
            return new Orientability.Orientable(WitnessCheck.checked(m, index.chirotope(s.signs(), all)), stats);
        }
        if (outcome instanceof OrientationSession.Unsatisfiable) {
            return new Orientability.NonOrientable(stats);
        }
        return new Orientability.Unknown(((OrientationSession.OutOfBudget) outcome).reason(), stats);
    }
}
