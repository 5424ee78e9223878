package org.chirocore.orient;

import org.sat4j.core.LiteralsUtils;
import org.sat4j.specs.IConstr;
import org.sat4j.specs.ISolverService;
import org.sat4j.specs.SearchListenerAdapter;

/**
 * Collects a DRAT proof from sat4j's search events, in the standard text form: a learned clause
 * as {@code l1 l2 ... 0}, a deleted learned clause as {@code d l1 ... 0}. Every clause sat4j
 * learns by conflict analysis is a reverse-unit-propagation consequence of the clauses it had
 * at that moment; since the lazy loop only ever adds clauses, that stays true for the final
 * CNF, so the lemmas of all rounds are kept in order. The empty clause is not written here:
 * sat4j reports unsatisfiability (or a contradiction while adding clauses) without learning
 * it, and {@link RefutationSearch} appends it. Costs O(1) per literal logged.
 */
final class DratLog extends SearchListenerAdapter<ISolverService> {
    private static final long serialVersionUID = 1L;

    private final StringBuilder text = new StringBuilder();
    private long lemmas;
    private long deletions;

    @Override
    public void learn(IConstr c) {
        lemmas++;
        append(c);
    }

    @Override
    public void learnUnit(int p) {
        // sat4j hands units over in DIMACS form already.
        lemmas++;
        text.append(p).append(" 0\n");
    }

    @Override
    public void delete(IConstr c) {
        // sat4j deletes only learned clauses (its clause-database reductions), never input ones.
        deletions++;
        text.append("d ");
        append(c);
    }

    private void append(IConstr c) {
        for (int i = 0; i < c.size(); i++) {
            text.append(LiteralsUtils.toDimacs(c.get(i))).append(' ');
        }
        text.append("0\n");
    }

    /** Appends the empty clause, the last step of a refutation. */
    void empty() {
        lemmas++;
        text.append("0\n");
    }

    String text() {
        return text.toString();
    }

    long lemmas() {
        return lemmas;
    }

    long deletions() {
        return deletions;
    }
}
