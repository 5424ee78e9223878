package org.chirocore.orient;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.ElementSet;

/**
 * The clauses of a 3-term Grassmann–Plücker relation under the certificate encoding: variable v
 * true means χ(basis v) = +1; no auxiliary variables. A term s·χ(B1)·χ(B2) is +1 exactly when the
 * parity of "B1 is negative" and "B2 is negative" equals [s = −1]. With two non-zero terms the
 * relation says they are opposite: a parity constraint on 4 variables, 8 clauses of 4 literals.
 * With three it forbids "all +1" and "all −1": 8 clauses of 6 literals each, 16 in all.
 *
 * <p>Canonical clause order (part of the certificate format): the non-zero terms in the order
 * (a,b)(c,d), (a,c)(b,d), (a,d)(b,c); within a term its two bases in that order. For two terms,
 * the 16 assignments of the four "negative" bits are run through in binary order, first basis
 * most significant, and each one of wrong parity yields the clause excluding it. For three terms,
 * the pattern all-(+1) comes first, then all-(−1); within a pattern, the three free bits (the
 * first basis of each term) are run through in binary order, and the second basis of each term
 * is determined by the pattern. A clause excluding an assignment lists, per basis in order, the
 * literal +v if the basis was negative in it and −v if positive.
 */
public final class ClauseEncoding {
    private ClauseEncoding() {
    }

    /**
     * The clauses of {@code relation}, in canonical order; empty when all its terms vanish.
     *
     * @throws IllegalArgumentException when exactly one term is non-zero, which no matroid allows
     *     (basis exchange) and so shows that the basis list is not a matroid's
     */
    public static List<int[]> clauses(BasisIndex index, GpRelation relation) {
        List<Term> terms = terms(index, relation);
        List<int[]> vars = new ArrayList<>();
        List<Integer> negated = new ArrayList<>();
        for (Term t : terms) {
            vars.add(new int[] {t.first(), t.second()});
            negated.add(t.sign() < 0 ? 1 : 0);
        }
        List<int[]> out = new ArrayList<>();
        switch (vars.size()) {
            case 0 -> {
                return out;
            }
            case 2 -> {
                int[] v = {vars.get(0)[0], vars.get(0)[1], vars.get(1)[0], vars.get(1)[1]};
                int required = 1 ^ negated.get(0) ^ negated.get(1);
                for (int bits = 0; bits < 16; bits++) {
                    if ((Integer.bitCount(bits) & 1) != required) {
                        out.add(excluding(v, bits));
                    }
                }
            }
            case 3 -> {
                int[] v = new int[6];
                for (int t = 0; t < 3; t++) {
                    v[2 * t] = vars.get(t)[0];
                    v[2 * t + 1] = vars.get(t)[1];
                }
                for (int pattern = 0; pattern < 2; pattern++) {
                    for (int free = 0; free < 8; free++) {
                        int bits = 0;
                        for (int t = 0; t < 3; t++) {
                            int first = (free >> (2 - t)) & 1;
                            // the term is +1 iff first ^ second == negated; pattern 1 wants −1
                            int second = first ^ negated.get(t) ^ pattern;
                            bits |= first << (5 - 2 * t);
                            bits |= second << (4 - 2 * t);
                        }
                        out.add(excluding(v, bits));
                    }
                }
            }
            default -> throw new IllegalArgumentException("Relation " + relation
                    + " has exactly one non-zero term, which basis exchange rules out: the support is not a matroid.");
        }
        return out;
    }

    /**
     * A non-zero term s·χ(B1)·χ(B2) of a relation, in the form the encoding uses.
     *
     * @param sign s = ±1: the term's own sign times the signs of the permutations sorting both tuples
     * @param first the variable of B1
     * @param second the variable of B2
     */
    public record Term(int sign, int first, int second) {
    }

    /**
     * The non-zero terms of {@code relation}, in term order (a,b)(c,d), (a,c)(b,d), (a,d)(b,c);
     * a term whose two sets are not both bases is left out. Costs O(rank) per set.
     */
    public static List<Term> terms(BasisIndex index, GpRelation relation) {
        ElementSet x = relation.x();
        int[] xs = x.elements();
        int[][] pairs = {
            {relation.a(), relation.b()}, {relation.c(), relation.d()},
            {relation.a(), relation.c()}, {relation.b(), relation.d()},
            {relation.a(), relation.d()}, {relation.b(), relation.c()},
        };
        int[] termSign = {1, -1, 1};
        List<Term> out = new ArrayList<>();
        for (int t = 0; t < 3; t++) {
            int[] p = pairs[2 * t];
            int[] q = pairs[2 * t + 1];
            int v1 = index.variable(xs, p[0], p[1]);
            int v2 = index.variable(xs, q[0], q[1]);
            if (v1 != 0 && v2 != 0) {
                out.add(new Term(termSign[t] * permutationSign(x, p[0], p[1]) * permutationSign(x, q[0], q[1]), v1, v2));
            }
        }
        return out;
    }

    /**
     * The CNF of the certificate format: a unit clause [v] for each normalised variable in the
     * given order, then the clauses of each relation in order. Costs O(1) per literal.
     *
     * @throws IllegalArgumentException as {@link #clauses}
     */
    public static List<int[]> cnf(BasisIndex index, List<Integer> normalised, List<GpRelation> relations) {
        List<int[]> out = new ArrayList<>();
        for (int v : normalised) {
            out.add(new int[] {v});
        }
        for (GpRelation r : relations) {
            out.addAll(clauses(index, r));
        }
        return out;
    }

    /** The clause false exactly under the assignment whose "negative" bits are {@code bits} (first variable highest). */
    private static int[] excluding(int[] vars, int bits) {
        int[] clause = new int[vars.length];
        for (int i = 0; i < vars.length; i++) {
            boolean negative = ((bits >> (vars.length - 1 - i)) & 1) == 1;
            clause[i] = negative ? vars[i] : -vars[i];
        }
        return clause;
    }

    /**
     * The sign of the permutation sorting the tuple (x, p, q), x the sorted tuple of X and p < q
     * outside X: moving p, then q, into place passes every element of X above each of them.
     */
    static int permutationSign(ElementSet x, int p, int q) {
        return ((x.countAbove(p) + x.countAbove(q)) & 1) == 0 ? 1 : -1;
    }
}
