package org.chirocore.cert;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Turns a DRAT proof into an LRAT proof (Cruz-Filipe et al., "Efficient certified RAT verification",
 * CADE 2017) for export: for every lemma, the ids of the clauses that unit propagation uses to
 * refute it, and for a RAT lemma on its first literal p, per clause D containing −p, {@code −id(D)}
 * and the hints that refute the resolvent. CNF clause i has id i; lemmas are numbered after them.
 *
 * <p>Written plainly rather than fast: each lemma is propagated from scratch by repeated passes
 * over the live clauses, O(clauses · passes) per lemma. A deletion is applied except of a clause
 * that is the reason of a top-level assignment or falsified at top level (as the verifier and
 * drat-trim do), or of a clause not present. The verifier ({@code org.chirocore.check}) checks
 * the result independently; this class shares no code with it.
 */
public final class LratConversion {
    private final int variables;
    /** Clause by id (index 0 unused); null once deleted. */
    private final List<int[]> clauses = new ArrayList<>();
    private final StringBuilder out = new StringBuilder();

    private LratConversion(int variables, List<int[]> cnf) {
        this.variables = variables;
        clauses.add(null);
        for (int[] clause : cnf) {
            clauses.add(clause.clone());
        }
    }

    /**
     * The LRAT text of {@code drat} against {@code cnf}, up to its empty clause.
     *
     * @throws IllegalArgumentException naming the line when a lemma is neither RUP nor RAT, or the
     *     proof is malformed or ends without the empty clause
     */
    public static String convert(int variables, List<int[]> cnf, String drat) {
        LratConversion c = new LratConversion(variables, cnf);
        int number = 0;
        for (String raw : drat.split("\n", -1)) {
            number++;
            String line = raw.strip();
            if (line.isEmpty()) {
                continue;
            }
            boolean deletion = line.startsWith("d");
            int[] lits = c.literals(number, deletion ? line.substring(1).strip() : line);
            if (deletion) {
                c.delete(lits);
            } else if (c.lemma(number, lits)) {
                return c.out.toString();
            }
        }
        throw new IllegalArgumentException("The DRAT proof ends without deriving the empty clause.");
    }

    private int[] literals(int number, String text) {
        String[] tokens = text.split("\\s+");
        if (!tokens[tokens.length - 1].equals("0")) {
            throw new IllegalArgumentException("Line " + number + " of the DRAT proof does not end with 0.");
        }
        int[] lits = new int[tokens.length - 1];
        for (int i = 0; i < lits.length; i++) {
            try {
                lits[i] = Integer.parseInt(tokens[i]);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("Line " + number + " of the DRAT proof has \"" + tokens[i] + "\", not a literal.", e);
            }
            if (lits[i] == 0 || Math.abs(lits[i]) > variables) {
                throw new IllegalArgumentException("Line " + number + " of the DRAT proof names no variable of the CNF: " + lits[i] + ".");
            }
        }
        return Arrays.stream(lits).distinct().toArray();
    }

    /** Unit propagation from {@code assumed}: the trail's reasons (0 for assumptions) and a falsified clause id, or 0. */
    private record Propagation(int[] value, int[] reason, List<Integer> trail, int conflict) {
    }

    private Propagation propagate(int[] assumed) {
        int[] value = new int[variables + 1];
        int[] reason = new int[variables + 1];
        List<Integer> trail = new ArrayList<>();
        for (int lit : assumed) {
            if (value[Math.abs(lit)] == 0) {
                value[Math.abs(lit)] = Integer.signum(lit);
                trail.add(lit);
            }
        }
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int id = 1; id < clauses.size(); id++) {
                int[] c = clauses.get(id);
                if (c == null) {
                    continue;
                }
                int open = 0;
                int unit = 0;
                boolean satisfied = false;
                for (int lit : c) {
                    int v = value[Math.abs(lit)] * Integer.signum(lit);
                    satisfied |= v > 0;
                    if (v == 0) {
                        open++;
                        unit = lit;
                    }
                }
                if (satisfied) {
                    continue;
                }
                if (open == 0) {
                    return new Propagation(value, reason, trail, id);
                }
                if (open == 1) {
                    value[Math.abs(unit)] = Integer.signum(unit);
                    reason[Math.abs(unit)] = id;
                    trail.add(unit);
                    changed = true;
                }
            }
        }
        return new Propagation(value, reason, trail, 0);
    }

    /** The ids that refute the assumptions, in the order they become unit, ending with the conflict. */
    private List<Integer> hints(Propagation p) {
        boolean[] marked = new boolean[variables + 1];
        for (int lit : clauses.get(p.conflict())) {
            marked[Math.abs(lit)] = true;
        }
        List<Integer> used = new ArrayList<>();
        for (int i = p.trail().size() - 1; i >= 0; i--) {
            int v = Math.abs(p.trail().get(i));
            if (marked[v] && p.reason()[v] != 0) {
                used.add(0, p.reason()[v]);
                for (int lit : clauses.get(p.reason()[v])) {
                    marked[Math.abs(lit)] = true;
                }
            }
        }
        used.add(p.conflict());
        return used;
    }

    private static int[] negated(int[] lits) {
        return Arrays.stream(lits).map(l -> -l).toArray();
    }

    /** Writes the lemma's LRAT line and adds it; true when it is the empty clause. */
    private boolean lemma(int number, int[] lits) {
        StringBuilder hints = new StringBuilder();
        Propagation rup = propagate(negated(lits));
        if (rup.conflict() != 0) {
            hints(rup).forEach(id -> hints.append(' ').append(id));
        } else if (lits.length == 0) {
            throw new IllegalArgumentException("Line " + number + " of the DRAT proof: the empty clause is not RUP.");
        } else {
            int pivot = lits[0];
            for (int id = 1; id < clauses.size(); id++) {
                int[] d = clauses.get(id);
                if (d == null || Arrays.stream(d).noneMatch(l -> l == -pivot)) {
                    continue;
                }
                int[] resolvent = java.util.stream.IntStream.concat(Arrays.stream(lits), Arrays.stream(d).filter(l -> l != -pivot))
                        .distinct().toArray();
                int[] assumed = negated(resolvent);
                if (Arrays.stream(resolvent).anyMatch(l -> Arrays.stream(resolvent).anyMatch(m -> m == -l))) {
                    continue; // a tautological resolvent needs no hints
                }
                Propagation rat = propagate(assumed);
                if (rat.conflict() == 0) {
                    throw new IllegalArgumentException("Line " + number + " of the DRAT proof: the lemma is neither RUP nor RAT.");
                }
                hints.append(" -").append(id);
                hints(rat).forEach(h -> hints.append(' ').append(h));
            }
        }
        clauses.add(lits.clone());
        out.append(clauses.size() - 1);
        for (int lit : lits) {
            out.append(' ').append(lit);
        }
        out.append(" 0").append(hints).append(" 0\n");
        return lits.length == 0;
    }

    private void delete(int[] lits) {
        Propagation top = propagate(new int[0]);
        for (int id = clauses.size() - 1; id >= 1; id--) {
            int[] c = clauses.get(id);
            final int candidate = id;
            if (c != null && c.length == lits.length && Arrays.stream(lits).allMatch(l -> Arrays.stream(c).anyMatch(m -> m == l))) {
                boolean isReason = Arrays.stream(c).anyMatch(l -> top.reason()[Math.abs(l)] == candidate);
                if (!isReason && id != top.conflict()) {
                    clauses.set(id, null);
                    out.append(clauses.size() - 1).append(" d ").append(id).append(" 0\n");
                }
                return;
            }
        }
    }
}
