package org.chirocore.proof;

import java.util.List;

import org.chirocore.orient.ClauseEncoding.Term;

/**
 * What a relation's non-zero terms say under a partial sign assignment (0 = unknown): violated,
 * forcing one more sign, or neither. A relation with two terms says they are opposite; one with
 * three says they are not all equal (docs/certificate-format.md). Costs O(1).
 */
final class RelationState {
    private RelationState() {
    }

    /** The value of {@code t} under {@code signs}, or 0 when one of its bases is unknown. */
    static int value(Term t, byte[] signs) {
        return t.sign() * signs[t.first() - 1] * signs[t.second() - 1];
    }

    /** Whether every term is known and the relation fails: two equal terms, or three equal terms. */
    static boolean violated(List<Term> terms, byte[] signs) {
        int first = value(terms.get(0), signs);
        for (Term t : terms) {
            int v = value(t, signs);
            if (v == 0 || v != first) {
                return false;
            }
        }
        return first != 0;
    }

    /**
     * The literal (+v for χ = +1, −v for χ = −1) the relation forces, or 0: every term but one is
     * known and all of them equal some t, and the remaining term has exactly one unknown basis,
     * which must then make that term −t.
     */
    static int forced(List<Term> terms, byte[] signs) {
        Term open = null;
        int known = 0;
        for (Term t : terms) {
            int v = value(t, signs);
            if (v == 0) {
                if (open != null) {
                    return 0;
                }
                open = t;
            } else if (known == 0) {
                known = v;
            } else if (v != known) {
                return 0;
            }
        }
        if (open == null) {
            return 0;
        }
        int a = signs[open.first() - 1];
        int b = signs[open.second() - 1];
        if ((a == 0) == (b == 0)) {
            return 0;
        }
        int variable = a == 0 ? open.first() : open.second();
        int partner = a == 0 ? b : a;
        int sign = -known * open.sign() * partner;
        return sign * variable;
    }
}
