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
    private final int perX;

    public LazySatDecider(Budget budget) {
        this(budget, OrientationSession.RELATIONS_PER_X);
    }

    private LazySatDecider(Budget budget, int perX) {
        this.budget = budget;
        this.perX = perX;
    }

    /**
     * A decider whose lazy loop adds at most 2 violated relations per (r−2)-set X and round (the
     * default is 50): made for large matroids expected to be non-orientable, where the loop
     * otherwise carries many relations the contradiction does not need (the tipless spike of rank
     * 9: 61,760 relations in all against 312,678 with the default; docs/families.md). Its orientable
     * answers may differ in their witness from the default decider's, never in the verdict.
     */
    public static LazySatDecider sparse(Budget budget) {
        return new LazySatDecider(budget, OrientationSession.FINDER_RELATIONS_PER_X);
    }

    @Override
    public Orientability decide(Matroid m) {
        BasisIndex index = BasisIndex.of(m);
        OrientationSession session = new OrientationSession(index, false, budget, perX);
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
