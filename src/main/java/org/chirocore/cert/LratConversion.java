package org.chirocore.cert;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Turns a DRAT proof into an LRAT proof (Cruz-Filipe, Heule, Hunt, Kaufmann, Schneider-Kamp,
 * "Efficient certified RAT verification", CADE 2017): for every lemma, the ids of the clauses that
 * unit propagation uses to refute it, in the order they become unit, and for a RAT lemma on its
 * first literal p, per live clause D containing −p, {@code −id(D)} and the hints that refute the
 * resolvent. CNF clause i has id i; the written steps are numbered on from there.
 *
 * <p>Two passes. Forward, as a DRAT checker does: clauses have two watched literals, the literals
 * implied at top level stay on the trail, and each lemma costs the propagation it triggers; its
 * hints are the reasons met walking back from the conflict through the implication graph, with the
 * lemma's own variables as assumptions. A top-level literal met on that walk is named by a unit
 * clause, added as a step of its own the first time it is needed, so that its derivation is written
 * once rather than in every lemma that uses it. Backward, as drat-trim's backward mode does
 * (Wetzler, Heule, Hunt, "DRAT-trim", SAT 2014): starting from the empty clause, a step is written
 * only when a written step names it, so the LRAT proof usually holds fewer lemmas than the DRAT
 * one. Deletions of written clauses are written too. A deletion is applied except of a clause that
 * is the reason of a top-level assignment or falsified at top level (as drat-trim does), or of a
 * clause not present.
 *
 * <p>Cost: the forward pass is a DRAT check's unit propagation; the rest is linear in the hints.
 * The verifier ({@code org.chirocore.check}) checks the result independently and shares no code
 * with this class: its DRAT checker is a separate implementation of the same forward pass.
 */
public final class LratConversion {
    private final int variables;
    private final int cnfSize;
    /** Clause by id (index 0 unused); null once deleted. Watched literals sit at positions 0 and 1. */
    private final List<int[]> clauses = new ArrayList<>();
    /**
     * Per step id − cnfSize − 1 (a step is a lemma of the proof or a unit written for a literal
     * implied at top level): its hints; a RAT lemma's groups are introduced by −id(D).
     */
    private final List<int[]> hints = new ArrayList<>();
    /** Per step id − cnfSize − 1: its literals, in the proof's order for a lemma. */
    private final List<int[]> steps = new ArrayList<>();
    /** The id of the last lemma, the empty clause, once read. */
    private int emptyClause;
    /** The deletions applied, in proof order: the deleted id, and the first step id not yet given then. */
    private final List<int[]> deletions = new ArrayList<>();
    /** Per variable assigned at top level: the id of a unit clause of its literal, once one is needed; else 0. */
    private final int[] unit;
    private final IntList[] watches;
    private final IntList[] occurrences;
    private final byte[] value;
    private final int[] reason;
    /** Per variable: its position on the trail while assigned. */
    private final int[] position;
    private final int[] trail;
    private int trailSize;
    private int propagated;
    private int topConflict;
    /** Per variable: the stamp of the last walk that visited it. */
    private final int[] seen;
    private int stamp;
    private final byte[] scratch;

    private LratConversion(int variables, List<int[]> cnf) {
        this.variables = variables;
        this.cnfSize = cnf.size();
        watches = new IntList[2 * variables + 2];
        occurrences = new IntList[2 * variables + 2];
        value = new byte[variables + 1];
        reason = new int[variables + 1];
        position = new int[variables + 1];
        trail = new int[variables + 1];
        seen = new int[variables + 1];
        unit = new int[variables + 1];
        scratch = new byte[variables + 1];
        clauses.add(null);
        for (int[] clause : cnf) {
            add(Arrays.stream(clause).distinct().toArray());
        }
    }

    /**
     * The LRAT text of {@code drat} against {@code cnf}, up to its empty clause, with only the
     * lemmas the empty clause depends on.
     *
     * @throws IllegalArgumentException naming the line when a lemma is neither RUP nor RAT, or the
     *     proof is malformed or ends without the empty clause
     */
    public static String convert(int variables, List<int[]> cnf, String drat) {
        LratConversion c = new LratConversion(variables, cnf);
        int number = 0;
        int start = 0;
        while (start < drat.length()) {
            int end = drat.indexOf('\n', start);
            end = end < 0 ? drat.length() : end;
            number++;
            String line = drat.substring(start, end).strip();
            start = end + 1;
            if (line.isEmpty()) {
                continue;
            }
            boolean deletion = line.startsWith("d");
            int[] lits = c.literals(number, deletion ? line.substring(1).strip() : line);
            if (deletion) {
                c.delete(lits);
            } else if (c.lemma(number, lits)) {
                return c.text();
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
        int[] distinct = Arrays.stream(lits).distinct().toArray();
        int opposite = 0;
        for (int lit : distinct) {
            opposite = opposite == 0 && scratch[Math.abs(lit)] == -Integer.signum(lit) ? lit : opposite;
            scratch[Math.abs(lit)] = (byte) Integer.signum(lit);
        }
        for (int lit : distinct) {
            scratch[Math.abs(lit)] = 0;
        }
        if (opposite != 0) {
            throw new IllegalArgumentException("Line " + number + " of the DRAT proof is a tautology (" + opposite + " and " + -opposite + ").");
        }
        return distinct;
    }

    /** Finds the lemma's hints, adds it; true when it is the empty clause. */
    private boolean lemma(int number, int[] lits) {
        int top = trailSize;
        int conflict = assumeNegation(lits);
        int[] found;
        if (conflict != 0) {
            found = antecedents(conflict, lits, top);
            undo(top);
        } else {
            undo(top);
            if (lits.length == 0) {
                throw new IllegalArgumentException("Line " + number + " of the DRAT proof: the empty clause is not RUP.");
            }
            found = ratHints(number, lits);
        }
        hints.add(found);
        steps.add(lits);
        emptyClause = clauses.size();
        add(lits);
        return lits.length == 0;
    }

    /** For a RAT lemma on lits[0]: per live clause D with −p whose resolvent is no tautology, −id(D) and the resolvent's hints. */
    private int[] ratHints(int number, int[] lits) {
        int pivot = lits[0];
        IntList candidates = occurrences[code(-pivot)];
        IntList out = new IntList();
        for (int i = 0; candidates != null && i < candidates.size; i++) {
            int id = candidates.data[i];
            int[] d = clauses.get(id);
            if (d == null) {
                continue;
            }
            int[] resolvent = resolvent(lits, d, -pivot);
            if (resolvent == null) {
                continue;
            }
            int top = trailSize;
            int conflict = assumeNegation(resolvent);
            if (conflict == 0) {
                undo(top);
                throw new IllegalArgumentException("Line " + number + " of the DRAT proof: the lemma is neither RUP nor RAT on "
                        + pivot + " (the resolvent with clause " + id + " is not RUP).");
            }
            out.add(-id);
            for (int h : antecedents(conflict, resolvent, top)) {
                out.add(h);
            }
            undo(top);
        }
        return Arrays.copyOf(out.data, out.size);
    }

    /** The resolvent of {@code lits} and {@code d} on {@code negatedPivot ∈ d}, or null when it is a tautology. */
    private int[] resolvent(int[] lits, int[] d, int negatedPivot) {
        int[] out = Arrays.copyOf(lits, lits.length + d.length);
        int size = lits.length;
        for (int lit : lits) {
            scratch[Math.abs(lit)] = (byte) Integer.signum(lit);
        }
        boolean tautology = false;
        for (int lit : d) {
            if (lit == negatedPivot) {
                continue;
            }
            byte sign = (byte) Integer.signum(lit);
            if (scratch[Math.abs(lit)] == -sign) {
                tautology = true;
            } else if (scratch[Math.abs(lit)] == 0) {
                scratch[Math.abs(lit)] = sign;
                out[size++] = lit;
            }
        }
        for (int i = 0; i < size; i++) {
            scratch[Math.abs(out[i])] = 0;
        }
        return tautology ? null : Arrays.copyOf(out, size);
    }

    /**
     * The hints refuting the negation of {@code assumed}: walking back through the reasons from
     * the conflict clause, a variable of {@code assumed} (assigned by the negation) is not expanded,
     * and a variable assigned at top level (trail positions below {@code top}) is not expanded
     * either but named by a unit clause of its literal ({@link #units}). The units come first, then
     * the reasons of the other implied variables in trail order, then {@code conflict}. The units
     * keep each hint list to the lemma's own propagation instead of repeating the top-level
     * derivations, which the LRAT checker does not remember from one lemma to the next.
     */
    private int[] antecedents(int conflict, int[] assumed, int top) {
        stamp++;
        for (int lit : assumed) {
            seen[Math.abs(lit)] = stamp;
        }
        IntList topLevel = new IntList();
        IntList used = new IntList();
        IntList stack = new IntList();
        stack.add(conflict);
        while (stack.size > 0) {
            int id = stack.data[--stack.size];
            for (int lit : clauses.get(id)) {
                int v = Math.abs(lit);
                if (seen[v] != stamp && reason[v] != 0) {
                    seen[v] = stamp;
                    if (position[v] < top) {
                        topLevel.add(v);
                    } else {
                        used.add(v);
                        stack.add(reason[v]);
                    }
                }
            }
        }
        IntList out = units(topLevel);
        for (int h : reasonsInTrailOrder(used)) {
            out.add(h);
        }
        out.add(conflict);
        return Arrays.copyOf(out.data, out.size);
    }

    /** The reasons of {@code vars}, ordered by their variables' trail positions. */
    private int[] reasonsInTrailOrder(IntList vars) {
        long[] byPosition = new long[vars.size];
        for (int i = 0; i < vars.size; i++) {
            byPosition[i] = (long) position[vars.data[i]] << 32 | reason[vars.data[i]];
        }
        Arrays.sort(byPosition);
        int[] out = new int[vars.size];
        for (int i = 0; i < vars.size; i++) {
            out[i] = (int) byPosition[i];
        }
        return out;
    }

    /**
     * The ids of unit clauses for the top-level literals of {@code vars}. A literal whose reason is
     * a unit clause is named by it; for another, a unit step is added whose hints are the units of
     * its reason's other literals (all earlier on the trail), then the reason. Each is made once.
     */
    private IntList units(IntList vars) {
        IntList missing = new IntList();
        IntList stack = new IntList();
        for (int i = 0; i < vars.size; i++) {
            stack.add(vars.data[i]);
        }
        stamp++;
        while (stack.size > 0) {
            int v = stack.data[--stack.size];
            if (unit[v] != 0 || seen[v] == stamp) {
                continue;
            }
            seen[v] = stamp;
            int[] r = clauses.get(reason[v]);
            if (r.length == 1) {
                unit[v] = reason[v];
                continue;
            }
            missing.add(v);
            for (int lit : r) {
                if (Math.abs(lit) != v) {
                    stack.add(Math.abs(lit));
                }
            }
        }
        int[] order = reasonsInTrailOrder(missing);
        for (int r : order) {
            int[] c = clauses.get(r);
            int v = 0;
            IntList h = new IntList();
            for (int lit : c) {
                if (value(lit) > 0) {
                    v = Math.abs(lit);
                } else {
                    h.add(unit[Math.abs(lit)]);
                }
            }
            h.add(r);
            hints.add(Arrays.copyOf(h.data, h.size));
            steps.add(new int[] {value[v] > 0 ? v : -v});
            unit[v] = clauses.size();
            clauses.add(steps.get(steps.size() - 1));
        }
        IntList out = new IntList();
        for (int i = 0; i < vars.size; i++) {
            out.add(unit[vars.data[i]]);
        }
        return out;
    }

    /**
     * The steps the empty clause depends on, renumbered cnfSize + 1, cnfSize + 2, … in order, with
     * their hints, and the deletions of written clauses.
     */
    private String text() {
        int count = steps.size();
        boolean[] kept = new boolean[count];
        kept[emptyClause - cnfSize - 1] = true;
        for (int k = count - 1; k >= 0; k--) {
            if (kept[k]) {
                for (int h : hints.get(k)) {
                    if (Math.abs(h) > cnfSize) {
                        kept[Math.abs(h) - cnfSize - 1] = true;
                    }
                }
            }
        }
        int[] renumbered = new int[count];
        int next = cnfSize;
        for (int k = 0; k < count; k++) {
            renumbered[k] = kept[k] ? ++next : 0;
        }
        StringBuilder out = new StringBuilder();
        int deletion = 0;
        int lastId = cnfSize;
        for (int k = 0; k < count; k++) {
            StringBuilder ids = new StringBuilder();
            for (; deletion < deletions.size() && deletions.get(deletion)[1] <= cnfSize + 1 + k; deletion++) {
                int id = renumbered(deletions.get(deletion)[0], renumbered);
                if (id != 0) {
                    ids.append(' ').append(id);
                }
            }
            if (!ids.isEmpty()) {
                out.append(lastId).append(" d").append(ids).append(" 0\n");
            }
            if (!kept[k]) {
                continue;
            }
            lastId = renumbered[k];
            out.append(lastId);
            for (int lit : steps.get(k)) {
                out.append(' ').append(lit);
            }
            out.append(" 0");
            for (int h : hints.get(k)) {
                out.append(' ').append(Integer.signum(h) * renumbered(Math.abs(h), renumbered));
            }
            out.append(" 0\n");
        }
        return out.toString();
    }

    /** The written id of clause {@code id}: a CNF clause keeps its id; a step not written has none (0). */
    private int renumbered(int id, int[] renumbered) {
        return id <= cnfSize ? id : renumbered[id - cnfSize - 1];
    }

    private void delete(int[] lits) {
        int id = lits.length == 0 ? 0 : latestCopy(lits);
        if (id == 0) {
            return;
        }
        int[] c = clauses.get(id);
        boolean isReason = c.length > 0 && value(c[0]) > 0 && reason[Math.abs(c[0])] == id;
        if (isReason || id == topConflict) {
            return;
        }
        clauses.set(id, null);
        deletions.add(new int[] {id, clauses.size()});
    }

    /** The id of the most recently added live clause with exactly the literals {@code lits}, or 0. */
    private int latestCopy(int[] lits) {
        IntList shortest = null;
        for (int lit : lits) {
            IntList list = occurrences[code(lit)];
            if (list == null) {
                return 0;
            }
            shortest = shortest == null || list.size < shortest.size ? list : shortest;
        }
        for (int lit : lits) {
            scratch[Math.abs(lit)] = (byte) Integer.signum(lit);
        }
        int found = 0;
        for (int i = shortest.size - 1; i >= 0 && found == 0; i--) {
            int[] c = clauses.get(shortest.data[i]);
            if (c != null && c.length == lits.length && Arrays.stream(c).allMatch(l -> scratch[Math.abs(l)] == Integer.signum(l))) {
                found = shortest.data[i];
            }
        }
        for (int lit : lits) {
            scratch[Math.abs(lit)] = 0;
        }
        return found;
    }

    /** Adds a clause at top level, watches it and propagates. */
    private void add(int[] lits) {
        int[] c = lits.clone();
        int id = clauses.size();
        clauses.add(c);
        for (int lit : c) {
            if (occurrences[code(lit)] == null) {
                occurrences[code(lit)] = new IntList();
            }
            occurrences[code(lit)].add(id);
        }
        if (topConflict != 0 || c.length == 0) {
            return;
        }
        int front = 0;
        for (int k = 0; k < c.length && front < 2; k++) {
            if (value(c[k]) >= 0) {
                int t = c[front];
                c[front++] = c[k];
                c[k] = t;
            }
        }
        if (c.length >= 2) {
            watch(c[0], id);
            watch(c[1], id);
        }
        if (value(c[0]) < 0) {
            topConflict = id;
        } else if (value(c[0]) == 0 && (c.length == 1 || value(c[1]) < 0)) {
            assign(c[0], id);
            topConflict = propagate();
        }
    }

    /** Assigns the negation of {@code lits} and propagates; returns a falsified clause's id or 0. The caller undoes. */
    private int assumeNegation(int[] lits) {
        if (topConflict != 0) {
            return topConflict;
        }
        for (int lit : lits) {
            if (value(lit) > 0) {
                // true at top level: its reason clause is falsified by the negation
                return reason[Math.abs(lit)];
            }
        }
        for (int lit : lits) {
            if (value(lit) == 0) {
                assign(-lit, 0);
            }
        }
        return propagate();
    }

    private int propagate() {
        while (propagated < trailSize) {
            int falseLit = -trail[propagated++];
            IntList ws = watches[code(falseLit)];
            if (ws == null) {
                continue;
            }
            int kept = 0;
            for (int i = 0; i < ws.size; i++) {
                int id = ws.data[i];
                int[] c = clauses.get(id);
                if (c == null) {
                    continue;
                }
                if (c[0] == falseLit) {
                    c[0] = c[1];
                    c[1] = falseLit;
                }
                int replacement = value(c[0]) > 0 ? -1 : nonFalseFrom2(c);
                if (replacement >= 0) {
                    c[1] = c[replacement];
                    c[replacement] = falseLit;
                    watch(c[1], id);
                    continue;
                }
                ws.data[kept++] = id;
                if (value(c[0]) < 0) {
                    System.arraycopy(ws.data, i + 1, ws.data, kept, ws.size - i - 1);
                    ws.size = kept + ws.size - i - 1;
                    return id;
                }
                if (value(c[0]) == 0) {
                    assign(c[0], id);
                }
            }
            ws.size = kept;
        }
        return 0;
    }

    private int nonFalseFrom2(int[] c) {
        for (int k = 2; k < c.length; k++) {
            if (value(c[k]) >= 0) {
                return k;
            }
        }
        return -1;
    }

    private int value(int lit) {
        int v = value[Math.abs(lit)];
        return lit > 0 ? v : -v;
    }

    private void assign(int lit, int why) {
        value[Math.abs(lit)] = (byte) Integer.signum(lit);
        reason[Math.abs(lit)] = why;
        position[Math.abs(lit)] = trailSize;
        trail[trailSize++] = lit;
    }

    private void undo(int mark) {
        while (trailSize > mark) {
            int v = Math.abs(trail[--trailSize]);
            value[v] = 0;
            reason[v] = 0;
        }
        propagated = Math.min(propagated, mark);
    }

    private void watch(int lit, int id) {
        if (watches[code(lit)] == null) {
            watches[code(lit)] = new IntList();
        }
        watches[code(lit)].add(id);
    }

    private static int code(int lit) {
        return 2 * Math.abs(lit) + (lit < 0 ? 1 : 0);
    }

    /** A growable int array. */
    private static final class IntList {
        int[] data = new int[4];
        int size;

        void add(int x) {
            if (size == data.length) {
                data = Arrays.copyOf(data, 2 * size);
            }
            data[size++] = x;
        }
    }
}
