package org.chirocore.check;

import java.util.List;

/**
 * A formula in conjunctive normal form, DIMACS style: variables 1..{@code variables}, literals ±v,
 * clause i (1-based) is {@code clauses.get(i − 1)}, which is also its clause id in LRAT.
 */
public record Cnf(int variables, List<int[]> clauses) {
    public Cnf {
        clauses = List.copyOf(clauses);
    }
}
