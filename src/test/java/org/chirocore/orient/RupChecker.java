package org.chirocore.orient;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A minimal forward DRAT checker for tests, independent of sat4j: every added clause must be a
 * reverse-unit-propagation (RUP) consequence of the input clauses and the lemmas so far, minus
 * deletions, and the proof must derive the empty clause. Plain unit propagation over occurrence
 * lists, no watched literals and no RAT: slow but short enough to read, which is what a test
 * oracle needs. Costs O(proof steps × total literals) in the worst case.
 */
final class RupChecker {
    private final int variables;
    private final List<int[]> clauses = new ArrayList<>();
    private final List<Boolean> alive = new ArrayList<>();
    /** For each literal (index lit + variables), the clauses containing it. */
    private final List<List<Integer>> occurrences = new ArrayList<>();
    /** Live clauses by their sorted literals, for deletions. */
    private final Map<String, List<Integer>> byKey = new HashMap<>();

    private RupChecker(int variables) {
        this.variables = variables;
        for (int i = 0; i <= 2 * variables; i++) {
            occurrences.add(new ArrayList<>());
        }
    }

    /**
     * Whether {@code drat} refutes {@code cnf}; the message of the exception names the first step
     * that fails.
     *
     * @throws AssertionError on the first lemma that is not RUP or when no empty clause is derived
     */
    static void check(int variables, List<int[]> cnf, String drat) {
        RupChecker c = new RupChecker(variables);
        cnf.forEach(c::add);
        int line = 0;
        for (String step : drat.split("\n")) {
            line++;
            boolean delete = step.startsWith("d ");
            String[] tokens = (delete ? step.substring(2) : step).trim().split(" +");
            int[] lits = Arrays.stream(tokens).mapToInt(Integer::parseInt).toArray();
            if (lits[lits.length - 1] != 0) {
                throw new AssertionError("DRAT line " + line + " does not end with 0: " + step);
            }
            int[] clause = Arrays.copyOf(lits, lits.length - 1);
            if (delete) {
                c.delete(clause);
                continue;
            }
            if (!c.rup(clause)) {
                throw new AssertionError("DRAT line " + line + " is not a RUP lemma: " + step);
            }
            if (clause.length == 0) {
                return;
            }
            c.add(clause);
        }
        throw new AssertionError("The DRAT proof never derives the empty clause.");
    }

    private static String key(int[] clause) {
        int[] s = clause.clone();
        Arrays.sort(s);
        return Arrays.toString(s);
    }

    private void add(int[] clause) {
        int id = clauses.size();
        clauses.add(clause);
        alive.add(true);
        for (int lit : clause) {
            occurrences.get(lit + variables).add(id);
        }
        byKey.computeIfAbsent(key(clause), k -> new ArrayList<>()).add(id);
    }

    private void delete(int[] clause) {
        List<Integer> ids = byKey.get(key(clause));
        if (ids == null || ids.isEmpty()) {
            throw new AssertionError("Deletion of a clause that is not present: " + Arrays.toString(clause));
        }
        alive.set(ids.remove(ids.size() - 1), false);
    }

    /** Whether assigning every literal of {@code clause} false and propagating gives a conflict. */
    private boolean rup(int[] clause) {
        byte[] value = new byte[variables + 1];
        List<Integer> queue = new ArrayList<>();
        for (int lit : clause) {
            if (!assign(value, -lit, queue)) {
                return true;
            }
        }
        // Units of the formula start the propagation too.
        for (int id = 0; id < clauses.size(); id++) {
            if (alive.get(id) && clauses.get(id).length == 1 && !assign(value, clauses.get(id)[0], queue)) {
                return true;
            }
        }
        for (int head = 0; head < queue.size(); head++) {
            int falsified = -queue.get(head);
            for (int id : occurrences.get(falsified + variables)) {
                if (!alive.get(id)) {
                    continue;
                }
                int unassigned = 0;
                int last = 0;
                boolean satisfied = false;
                for (int lit : clauses.get(id)) {
                    int v = value[Math.abs(lit)] * Integer.signum(lit);
                    if (v > 0) {
                        satisfied = true;
                        break;
                    }
                    if (v == 0) {
                        unassigned++;
                        last = lit;
                    }
                }
                if (satisfied) {
                    continue;
                }
                if (unassigned == 0) {
                    return true;
                }
                if (unassigned == 1 && !assign(value, last, queue)) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Makes {@code lit} true; false when it is already false (a conflict). */
    private static boolean assign(byte[] value, int lit, List<Integer> queue) {
        int v = value[Math.abs(lit)] * Integer.signum(lit);
        if (v < 0) {
            return false;
        }
        if (v == 0) {
            value[Math.abs(lit)] = (byte) Integer.signum(lit);
            queue.add(lit);
        }
        return true;
    }
}
