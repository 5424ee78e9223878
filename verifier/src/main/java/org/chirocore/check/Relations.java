package org.chirocore.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * 3-term Grassmann–Plücker relations ([BLSWZ, §3.5–3.6]; docs/mathematics.md §2–3) on a basis table: their
 * terms, their clauses under the certificate encoding, and their evaluation on a sign vector.
 */
final class Relations {
    private Relations() {
    }

    /**
     * A term s·χ(B1)·χ(B2): the canonical positions of B1 and B2 (−1 when not a basis) and s = ±1.
     */
    record Term(int first, int second, int sign) {
        boolean nonZero() {
            return first >= 0 && second >= 0;
        }
    }

    /** The three terms of (X; a, b, c, d), a < b < c < d outside X, in the spec's order. */
    static Term[] terms(BasisTable t, int[] x, int a, int b, int c, int d) {
        return new Term[] {term(t, x, a, b, c, d, 1), term(t, x, a, c, b, d, -1), term(t, x, a, d, b, c, 1)};
    }

    private static Term term(BasisTable t, int[] x, int p, int q, int u, int v, int outerSign) {
        int sign = outerSign * sigma(x, p, q) * sigma(x, u, v);
        return new Term(t.positionOf(BasisTable.with(x, p, q)), t.positionOf(BasisTable.with(x, u, v)), sign);
    }

    /** σ = (−1)^{#(X above p) + #(X above q)}, the sign of the permutation sorting (x, p, q). */
    static int sigma(int[] x, int p, int q) {
        int above = 0;
        for (int e : x) {
            above += (e > p ? 1 : 0) + (e > q ? 1 : 0);
        }
        return (above & 1) == 0 ? 1 : -1;
    }

    /** The non-zero terms among {@code terms}. */
    static List<Term> nonZero(Term[] terms) {
        List<Term> out = new ArrayList<>();
        for (Term term : terms) {
            if (term.nonZero()) {
                out.add(term);
            }
        }
        return out;
    }

    /**
     * The clauses of a relation with 0, 2 or 3 non-zero terms, exactly as the spec lists them
     * (variables are positions + 1; a clause excludes one assignment of the "negative" bits).
     */
    static List<int[]> clauses(List<Term> terms) {
        List<int[]> out = new ArrayList<>();
        int[] vars = new int[2 * terms.size()];
        for (int i = 0; i < terms.size(); i++) {
            vars[2 * i] = terms.get(i).first() + 1;
            vars[2 * i + 1] = terms.get(i).second() + 1;
        }
        if (terms.size() == 2) {
            // opposite terms: the parity of the four bits must be 1 xor [s = −1] xor [s' = −1]
            int required = 1 ^ negative(terms.get(0)) ^ negative(terms.get(1));
            for (int bits = 0; bits < 16; bits++) {
                if ((Integer.bitCount(bits) & 1) != required) {
                    out.add(excluding(vars, bits));
                }
            }
        } else if (terms.size() == 3) {
            for (int pattern = 0; pattern < 2; pattern++) {
                for (int free = 0; free < 8; free++) {
                    int bits = 0;
                    for (int i = 0; i < 3; i++) {
                        int first = (free >> (2 - i)) & 1;
                        // term i is +1 iff first xor second = [s = −1]; pattern 1 asks for −1
                        int second = first ^ negative(terms.get(i)) ^ pattern;
                        bits |= first << (5 - 2 * i) | second << (4 - 2 * i);
                    }
                    out.add(excluding(vars, bits));
                }
            }
        }
        return out;
    }

    private static int negative(Term t) {
        return t.sign() < 0 ? 1 : 0;
    }

    /** The clause false exactly under the bit assignment {@code bits} (first variable most significant): +v for bit 1. */
    private static int[] excluding(int[] vars, int bits) {
        int[] clause = new int[vars.length];
        for (int i = 0; i < vars.length; i++) {
            clause[i] = ((bits >> (vars.length - 1 - i)) & 1) == 1 ? vars[i] : -vars[i];
        }
        return clause;
    }

    /**
     * The first 3-term relation of the matroid with bases {@code t} that the signs violate, or empty.
     * Only relations with a non-zero term can fail, and such a relation has a term on X ∪ {p, q} and
     * X ∪ {u, v}, both bases; so X runs over the bases minus two elements and {u, v} over pairs
     * outside that basis. Cost O(|bases| · r² · (n − r)² · log |bases|).
     *
     * @param signs +1 / −1 per basis position
     */
    static Optional<String> violated(BasisTable t, int[] signs) {
        for (int k = 0; k < t.count(); k++) {
            int[] basis = t.basis(k);
            int[] outside = new int[t.size - basis.length];
            for (int e = 0, at = 0; e < t.size; e++) {
                if (!BasisTable.contains(basis, e)) {
                    outside[at++] = e;
                }
            }
            for (int p = 0; p < basis.length; p++) {
                for (int q = p + 1; q < basis.length; q++) {
                    Optional<String> bad = violatedWith(t, signs, BasisTable.without(basis, p, q), basis[p], basis[q], outside);
                    if (bad.isPresent()) {
                        return bad;
                    }
                }
            }
        }
        return Optional.empty();
    }

    /**
     * An upper bound on the relations {@link #violated} evaluates on a matroid of this shape:
     * bases · C(rank, 2) · C(size − rank, 2).
     */
    static long evaluations(BasisTable.Shape minor) {
        return minor.bases() * pairs(minor.rank()) * pairs(minor.size() - minor.rank());
    }

    private static long pairs(int k) {
        return k < 2 ? 1 : (long) k * (k - 1) / 2;
    }

    /** The relations (X; {p, q, u, v} sorted) for the pairs u < v of {@code outside}. */
    private static Optional<String> violatedWith(BasisTable t, int[] signs, int[] x, int p, int q, int[] outside) {
        for (int i = 0; i < outside.length; i++) {
            for (int j = i + 1; j < outside.length; j++) {
                int[] e = {p, q, outside[i], outside[j]};
                Arrays.sort(e);
                if (!holds(terms(t, x, e[0], e[1], e[2], e[3]), signs)) {
                    return Optional.of("relation (X = " + BasisTable.set(x) + "; " + e[0] + ", " + e[1] + ", " + e[2]
                            + ", " + e[3] + ") fails");
                }
            }
        }
        return Optional.empty();
    }

    /** Whether the terms' values are all 0 or include both +1 and −1. */
    private static boolean holds(Term[] terms, int[] signs) {
        boolean plus = false;
        boolean minus = false;
        for (Term term : nonZero(terms)) {
            int value = term.sign() * signs[term.first()] * signs[term.second()];
            plus |= value > 0;
            minus |= value < 0;
        }
        return plus == minus;
    }
}
