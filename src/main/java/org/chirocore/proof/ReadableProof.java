package org.chirocore.proof;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.GpRelation;

/**
 * A non-orientability proof a person can follow: from the normalised signs, each step either
 * forces one more basis sign through one 3-term relation, closes the current case because a
 * relation is violated, or splits on the sign of one basis. Its clausal form ({@link #lemmas})
 * is a sequence of lemmas each of which is RUP with respect to the normalisation units and the
 * clauses of {@link #relations} (children before parents, the empty clause last). Immutable.
 *
 * @param normalised the variables fixed to +1 at the start
 * @param root the derivation from the normalised signs
 */
public record ReadableProof(List<Integer> normalised, Branch root) {
    public ReadableProof {
        normalised = List.copyOf(normalised);
    }

    /**
     * One forced step: {@code relation}, given the signs known so far, forces χ(basis) = sign.
     *
     * @param relation the relation used
     * @param variable the forced basis's variable
     * @param sign +1 or −1
     */
    public record Forced(GpRelation relation, int variable, int sign) {
        public Forced {
            if (sign != 1 && sign != -1) {
                throw new IllegalArgumentException("A forced sign is +1 or -1, got " + sign + ".");
            }
        }

        /** The DIMACS literal of the step's conclusion: +variable for +1, −variable for −1. */
        public int literal() {
            return sign * variable;
        }
    }

    /** How a case ends. */
    public sealed interface Ending {
    }

    /** The case is closed: {@code relation} is violated by the signs known in it. */
    public record Closed(GpRelation relation) implements Ending {
    }

    /** The case splits on χ(variable): first the case +1, then −1. */
    public record Split(int variable, Branch plus, Branch minus) implements Ending {
    }

    /**
     * One case: the forced steps in order, then how it ends.
     *
     * @param forced the forced steps
     * @param ending the closing relation, or the split into two sub-cases
     */
    public record Branch(List<Forced> forced, Ending ending) {
        public Branch {
            forced = List.copyOf(forced);
        }

        /** The number of steps of this case and its sub-cases: forced steps, closings and splits. */
        public int steps() {
            int own = forced.size() + 1;
            return ending instanceof Split s ? own + s.plus().steps() + s.minus().steps() : own;
        }
    }

    /** The number of numbered steps of the proof. */
    public int steps() {
        return root.steps();
    }

    /** The relations the proof uses, each once, in the order of first use. */
    public List<GpRelation> relations() {
        Set<GpRelation> out = new LinkedHashSet<>();
        collect(root, out);
        return List.copyOf(out);
    }

    private static void collect(Branch b, Set<GpRelation> out) {
        b.forced().forEach(f -> out.add(f.relation()));
        if (b.ending() instanceof Closed c) {
            out.add(c.relation());
        } else {
            Split s = (Split) b.ending();
            collect(s.plus(), out);
            collect(s.minus(), out);
        }
    }

    /**
     * The proof as clauses: in a case with literals L, a forced step χ(B) = s becomes the clause
     * ¬L ∨ lit(B); after the case's sub-cases, the case itself becomes ¬L; at the root that is the
     * empty clause, which comes last. Each clause is RUP given the clauses before it.
     */
    public List<int[]> lemmas() {
        List<int[]> out = new ArrayList<>();
        emit(root, new ArrayList<>(), out);
        return out;
    }

    private static void emit(Branch b, List<Integer> caseLiterals, List<int[]> out) {
        for (Forced f : b.forced()) {
            int[] clause = negation(caseLiterals, 1);
            clause[clause.length - 1] = f.literal();
            out.add(clause);
        }
        if (b.ending() instanceof Split s) {
            caseLiterals.add(s.variable());
            emit(s.plus(), caseLiterals, out);
            caseLiterals.set(caseLiterals.size() - 1, -s.variable());
            emit(s.minus(), caseLiterals, out);
            caseLiterals.remove(caseLiterals.size() - 1);
        }
        out.add(negation(caseLiterals, 0));
    }

    /** The negated case literals, with {@code spare} free places at the end. */
    private static int[] negation(List<Integer> caseLiterals, int spare) {
        int[] clause = new int[caseLiterals.size() + spare];
        for (int i = 0; i < caseLiterals.size(); i++) {
            clause[i] = -caseLiterals.get(i);
        }
        return clause;
    }

    /**
     * The proof as numbered text, with element labels from {@code index}, which must be the index
     * of the matroid the proof was derived for.
     */
    public String text(BasisIndex index) {
        return ProofText.of(this, index);
    }

    /** {@link #lemmas} as DRAT text: one line {@code l1 ... 0} per lemma, ending with {@code 0}. */
    public String drat() {
        StringBuilder sb = new StringBuilder();
        for (int[] lemma : lemmas()) {
            for (int lit : lemma) {
                sb.append(lit).append(' ');
            }
            sb.append("0\n");
        }
        return sb.toString();
    }
}
