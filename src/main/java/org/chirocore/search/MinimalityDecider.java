package org.chirocore.search;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Minor;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.OrientabilityDecider;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.OrientationSession;
import org.chirocore.orient.WitnessCheck;

/**
 * Decides whether a non-orientable matroid M is minor-minimal non-orientable by deciding every
 * single-element deletion and contraction: either all are orientable, and their re-checked
 * chirotopes are the proof, or it names the first non-orientable one. Deletions are solved in one
 * selector session on M; contractions on the contracted minor itself. The minimality pass of
 * {@link UnsatCoreSearch} is this decision. Cost: up to 2|E| orientability decisions.
 */
public final class MinimalityDecider {

    /** The outcome of the decision. */
    public sealed interface Result {
    }

    /**
     * Every single-element minor is orientable.
     *
     * @param witnesses two per element, deletion then contraction, in element order (for a loop
     *     or coloop M\e = M/e and one witness serves both, Oxley, Matroid Theory, 2nd ed., §3.1)
     */
    public record Minimal(List<MinorWitness> witnesses) implements Result {
        public Minimal {
            witnesses = List.copyOf(witnesses);
        }
    }

    /**
     * M\e is non-orientable.
     *
     * @param element the index of e in M
     * @param needed the elements of M − e whose relations the refutation of M\e used: M restricted
     *     to them is non-orientable as well
     */
    public record NonOrientableDeletion(int element, ElementSet needed) implements Result {
    }

    /**
     * M/e is non-orientable.
     *
     * @param element the index of e in M
     * @param minor M/e
     */
    public record NonOrientableContraction(int element, ExplicitMatroid minor) implements Result {
    }

    /** A budget ran out; nothing is claimed. */
    public record Unknown(String reason) implements Result {
    }

    private final OrientabilityDecider decider;
    private final Strategy strategy;
    private final Progress progress;
    private int decisions;

    /**
     * A decision procedure deciding the contractions with {@code decider}, trying contractions or deletions
     * first as {@code strategy} says, reporting each step to {@code progress}.
     */
    public MinimalityDecider(OrientabilityDecider decider, Strategy strategy, Progress progress) {
        this.decider = decider;
        this.strategy = strategy;
        this.progress = progress;
    }

    /**
     * Decides minimality of {@code m} trying elements in element order, contractions first.
     *
     * @param m a matroid already known to be non-orientable
     */
    public static Result decide(ExplicitMatroid m, Budget budget) {
        List<Integer> order = new ArrayList<>();
        for (int e = 0; e < m.size(); e++) {
            order.add(e);
        }
        return new MinimalityDecider(new LazySatDecider(budget), Strategy.CONTRACT_FIRST, Progress.SILENT)
                .decide(m, new OrientationSession(BasisIndex.of(m), true, budget), order);
    }

    /** The orientability decisions made so far by this instance. */
    public int decisions() {
        return decisions;
    }

    /**
     * Checks {@code m}, trying its elements in {@code order}; {@code session} is a selector
     * session on {@code m}.
     */
    Result decide(ExplicitMatroid m, OrientationSession session, List<Integer> order) {
        Chirotope[] deletion = new Chirotope[m.size()];
        Chirotope[] contraction = new Chirotope[m.size()];
        List<Operation> phases = strategy == Strategy.CONTRACT_FIRST
                ? List.of(Operation.CONTRACTION, Operation.DELETION)
                : List.of(Operation.DELETION, Operation.CONTRACTION);
        for (Operation op : phases) {
            for (int e : order) {
                int[] single = {e};
                ElementSet rest = ElementSet.range(m.size()).without(e);
                boolean loop = m.rank(single) == 0;
                boolean coloop = m.rank(rest.elements()) < m.rank();
                progress.report((op == Operation.DELETION ? "deleting " : "contracting ") + m.labels().get(e),
                        m.size(), m.rank(), decisions);
                if (op == Operation.DELETION && !coloop) {
                    OrientationSession.Outcome o = session.solve(rest);
                    decisions++;
                    if (o instanceof OrientationSession.OutOfBudget b) {
                        return new Unknown(b.reason());
                    }
                    if (o instanceof OrientationSession.Unsatisfiable u) {
                        return new NonOrientableDeletion(e, u.needed());
                    }
                    Chirotope w = session.index().chirotope(((OrientationSession.Satisfiable) o).signs(), rest);
                    deletion[e] = WitnessCheck.checked(new Minor(m, new int[0], single), w);
                } else if (op == Operation.CONTRACTION && !loop) {
                    ExplicitMatroid minor = ExplicitMatroid.of(new Minor(m, single, new int[0]));
                    Orientability answer = decider.decide(minor);
                    decisions++;
                    if (answer instanceof Orientability.Unknown u) {
                        return new Unknown(u.reason());
                    }
                    if (answer instanceof Orientability.NonOrientable) {
                        return new NonOrientableContraction(e, minor);
                    }
                    contraction[e] = ((Orientability.Orientable) answer).witness();
                }
            }
        }
        List<MinorWitness> witnesses = new ArrayList<>();
        for (int e = 0; e < m.size(); e++) {
            Chirotope del = deletion[e] != null ? deletion[e] : contraction[e];
            Chirotope con = contraction[e] != null ? contraction[e] : deletion[e];
            witnesses.add(new MinorWitness(m.labels().get(e), Operation.DELETION, del));
            witnesses.add(new MinorWitness(m.labels().get(e), Operation.CONTRACTION, con));
        }
        return new Minimal(witnesses);
    }
}
