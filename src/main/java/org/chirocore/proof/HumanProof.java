package org.chirocore.proof;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.orient.BasisIndex;
import org.chirocore.orient.ClauseEncoding;
import org.chirocore.orient.ClauseEncoding.Term;
import org.chirocore.orient.GpRelation;
import org.chirocore.proof.ReadableProof.Branch;
import org.chirocore.proof.ReadableProof.Closed;
import org.chirocore.proof.ReadableProof.Forced;
import org.chirocore.proof.ReadableProof.Split;

/**
 * Derives a {@link ReadableProof} that a matroid has no chirotope, by hand-style reasoning over
 * all its 3-term Grassmann–Plücker relations: starting from the normalised signs (+1), close the
 * case as soon as a relation is violated, otherwise force one more sign through the first
 * relation that determines it; when nothing is forced, split on the unknown basis that occurs in
 * the most relations (the smallest variable among equals). Sound because the normalisation and
 * 3-term relations characterise chirotopes on a matroid ([BLSWZ, Thm. 3.6.2]).
 *
 * <p>Cost: each step scans all relations, C(n, r−2)·C(n−r+2, 4) of them, twice; the derivation
 * stops after {@code maxSteps} steps. Meant for small cores.
 */
public final class HumanProof {
    private final BasisIndex index;
    private final List<Integer> normalised;
    private final List<GpRelation> relations = new ArrayList<>();
    private final List<List<Term>> terms = new ArrayList<>();
    /** occurrences[v − 1]: the number of non-trivial relations whose terms mention basis v. */
    private final int[] occurrences;

    /**
     * A derivation for the matroid of {@code index}, from the signs of {@code normalised} fixed to +1.
     *
     * @throws IllegalArgumentException as {@link ClauseEncoding#clauses}, when the bases are not a matroid's
     */
    public HumanProof(BasisIndex index, List<Integer> normalised) {
        this.index = index;
        this.normalised = List.copyOf(normalised);
        this.occurrences = new int[index.basisCount()];
        int k = index.rank() - 2;
        int n = index.size();
        if (k < 0 || n < index.rank() + 2) {
            return;
        }
        int[] xs = ElementSets.range(k);
        do {
            ElementSet x = ElementSet.of(xs);
            int[] rest = ElementSet.range(n).minus(x).elements();
            int[] q = ElementSets.range(4);
            do {
                GpRelation r = new GpRelation(x, rest[q[0]], rest[q[1]], rest[q[2]], rest[q[3]]);
                List<Term> t = ClauseEncoding.terms(index, r);
                if (t.size() == 1) {
                    throw new IllegalArgumentException("Relation " + r
                            + " has exactly one non-zero term, which basis exchange rules out: the support is not a matroid.");
                }
                if (!t.isEmpty()) {
                    relations.add(r);
                    terms.add(t);
                    t.forEach(term -> {
                        occurrences[term.first() - 1]++;
                        occurrences[term.second() - 1]++;
                    });
                }
            } while (ElementSets.nextCombination(q, rest.length));
        } while (k > 0 && ElementSets.nextCombination(xs, n));
    }

    /** The result of {@link #derive}. */
    public sealed interface Outcome {
    }

    /** A proof within the step limit. */
    public record Derived(ReadableProof proof) implements Outcome {
    }

    /**
     * No proof within the limit.
     *
     * @param limit the step limit
     * @param reached the number of steps made when the limit was hit
     */
    public record TooLarge(int limit, int reached) implements Outcome {
        /** The sentence reported to the user. */
        public String message() {
            return "too large for a readable proof: the derivation reached " + reached + " steps, more than the limit of "
                    + limit + ".";
        }
    }

    /**
     * Derives a proof of at most {@code maxSteps} steps.
     *
     * @throws IllegalArgumentException when {@code maxSteps} is not positive, or the signs reach
     *     a full assignment satisfying every relation (the matroid is orientable)
     */
    public Outcome derive(int maxSteps) {
        if (maxSteps < 1) {
            throw new IllegalArgumentException("The step limit must be positive, got " + maxSteps + ".");
        }
        byte[] signs = new byte[index.basisCount()];
        normalised.forEach(v -> signs[v - 1] = 1);
        int[] count = {0};
        Optional<Branch> root = branch(signs, count, maxSteps);
        return root.<Outcome>map(b -> new Derived(new ReadableProof(normalised, b)))
                .orElseGet(() -> new TooLarge(maxSteps, count[0]));
    }

    /** The case with these known signs (modified), or empty when the step count passes {@code limit}. */
    private Optional<Branch> branch(byte[] signs, int[] count, int limit) {
        List<Forced> forced = new ArrayList<>();
        while (true) {
            if (++count[0] > limit) {
                return Optional.empty();
            }
            for (int i = 0; i < relations.size(); i++) {
                if (RelationState.violated(terms.get(i), signs)) {
                    return Optional.of(new Branch(forced, new Closed(relations.get(i))));
                }
            }
            Forced next = nextForced(signs);
            if (next == null) {
                break;
            }
            signs[next.variable() - 1] = (byte) next.sign();
            forced.add(next);
        }
        int split = splitVariable(signs);
        byte[] minusSigns = signs.clone();
        signs[split - 1] = 1;
        minusSigns[split - 1] = -1;
        Optional<Branch> plus = branch(signs, count, limit);
        if (plus.isEmpty()) {
            return plus;
        }
        return branch(minusSigns, count, limit).map(minus -> new Branch(forced, new Split(split, plus.get(), minus)));
    }

    private Forced nextForced(byte[] signs) {
        for (int i = 0; i < relations.size(); i++) {
            int literal = RelationState.forced(terms.get(i), signs);
            if (literal != 0) {
                return new Forced(relations.get(i), Math.abs(literal), Integer.signum(literal));
            }
        }
        return null;
    }

    private int splitVariable(byte[] signs) {
        int best = 0;
        for (int v = 1; v <= signs.length; v++) {
            if (signs[v - 1] == 0 && (best == 0 || occurrences[v - 1] > occurrences[best - 1])) {
                best = v;
            }
        }
        if (best == 0) {
            throw new IllegalArgumentException("Every basis has a sign and every 3-term relation holds: the matroid is "
                    + "orientable, so there is no proof of non-orientability.");
        }
        return best;
    }
}
