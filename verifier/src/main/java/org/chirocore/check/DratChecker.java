package org.chirocore.check;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.chirocore.check.ProofLines.Line;
import org.chirocore.check.ProofLines.ProofError;

/**
 * Forward DRAT checking (Wetzler, Heule, Hunt, "DRAT-trim", SAT 2014): each added lemma must be
 * RUP (assigning its negation and unit-propagating reaches a conflict) or, failing that, RAT on its
 * first literal p (every resolvent with a clause containing −p is RUP); the proof must add the
 * empty clause. Unit propagation uses two watched literals per clause and a trail that is undone
 * after each check, so a lemma costs the propagation it triggers, not a rescan of the formula; a
 * RAT check visits the clauses containing −p through per-literal occurrence lists. The proof is
 * read as a stream of lines; memory and work are bounded by {@link Limits#MAX_PROOF_LITERALS} and
 * {@link Limits#MAX_PROPAGATION_STEPS}, and a proof beyond them is rejected.
 *
 * <p>Deletions ("d …") are applied, except the deletion of a clause that is currently the reason of
 * a top-level assignment, which is ignored (as drat-trim does), and of a clause not present, which
 * is ignored too; ignoring a deletion only keeps more clauses and is therefore sound. Lines after the
 * empty clause are not read. Lemmas may only use the CNF's variables; tautologies are rejected.

 */
public final class DratChecker {
    /**
     * The outcome of a DRAT or LRAT check ({@link LratChecker} returns it too): {@code failure} is
     * empty when the proof is valid; {@code summary} counts what was done.
     */
    public record Outcome(boolean valid, String failure, String summary) {
    }

    private final int variables;
    /** Clause by id (1-based; index 0 unused); null once deleted. Watched literals sit at positions 0 and 1. */
    private final List<int[]> clauses = new ArrayList<>();
    private final IntList[] watches;
    /** Per literal code: the ids of the clauses containing it, deleted ones dropped lazily. */
    private final IntList[] occurrences;
    private final byte[] scratch;
    private long literals;
    private long steps;
    /** Per variable: +1 true, −1 false, 0 unassigned. */
    private final byte[] value;
    /** Per variable: the id of the clause that implied it, 0 for an assumption. */
    private final int[] reason;
    private final int[] trail;
    private int trailSize;
    private int propagated;
    /** A clause falsified at top level, once the formula is refuted by unit propagation alone; else 0. */
    private int topConflict;
    private int lemmas;
    private int deleted;
    private int ignored;

    private DratChecker(Cnf cnf) {
        variables = cnf.variables();
        // allocated on first use: most literals of a large formula are never watched
        watches = new IntList[2 * variables + 2];
        occurrences = new IntList[2 * variables + 2];
        scratch = new byte[variables + 1];
        value = new byte[variables + 1];
        reason = new int[variables + 1];
        trail = new int[variables + 1];
        clauses.add(null);
        for (int[] clause : cnf.clauses()) {
            add(clause);
        }
    }

    /**
     * Checks {@code drat} against {@code cnf}. Cost: the unit propagation of all lemmas, plus for a
     * RAT lemma the propagation of its resolvents. Never throws on bad proof text; the failure names
     * the line.
     */
    public static Outcome check(Cnf cnf, String drat) {
        try {
            return check(cnf, new StringReader(drat));
        } catch (IOException e) {
            throw new UncheckedIOException("A string reader does not fail.", e);
        }
    }

    /** As {@link #check(Cnf, String)}, reading the proof as a stream up to its empty clause. */
    static Outcome check(Cnf cnf, Reader drat) throws IOException {
        DratChecker checker = new DratChecker(cnf);
        try {
            checker.run(drat);
            return new Outcome(true, "", checker.summary());
        } catch (ProofError e) {
            return new Outcome(false, e.getMessage(), checker.summary());
        }
    }

    private String summary() {
        return lemmas + " lemmas, " + deleted + " deletions applied, " + ignored + " ignored, " + steps + " propagation steps";
    }

    private void run(Reader drat) throws ProofError, IOException {
        ProofLines lines = new ProofLines(drat, 0);
        for (Line line = lines.next(); line != null; line = lines.next()) {
            int[] lits = ProofLines.literals(line, 0, variables);
            if (lits.length != line.numbers().length - 1) {
                throw new ProofError(line.number(), "text after the closing 0");
            }
            if (steps > VerifierLimits.MAX_PROPAGATION_STEPS) {
                throw new ProofError(line.number(), "checking the proof needs more than " + VerifierLimits.MAX_PROPAGATION_STEPS
                        + " propagation steps, the verifier's limit; not checked further");
            }
            if (line.deletion()) {
                delete(ProofLines.distinct(line, lits, scratch));
            } else {
                literals += lits.length;
                if (literals > VerifierLimits.MAX_PROOF_LITERALS) {
                    throw new ProofError(line.number(), "the lemmas hold more than " + VerifierLimits.MAX_PROOF_LITERALS
                            + " literals, the verifier's limit; not checked further");
                }
                lemma(line, ProofLines.distinct(line, lits, scratch));
                if (lits.length == 0) {
                    return;
                }
            }
        }
        throw new ProofError(lines.lastLine(), "the proof ends without deriving the empty clause");
    }

    private void lemma(Line line, int[] lits) throws ProofError {
        int mark = trailSize;
        boolean rup = assumeNegation(lits) != 0;
        undo(mark);
        if (!rup && lits.length == 0) {
            throw new ProofError(line.number(), "the empty clause is not RUP: unit propagation finds no conflict");
        }
        if (!rup) {
            checkRat(line, lits);
        }
        lemmas++;
        add(lits);
    }

    private void checkRat(Line line, int[] lits) throws ProofError {
        int pivot = lits[0];
        IntList candidates = occurrences[code(-pivot)];
        int kept = 0;
        for (int i = 0; candidates != null && i < candidates.size; i++) {
            int id = candidates.data[i];
            int[] d = clauses.get(id);
            if (d == null) {
                continue; // deleted: dropped from the occurrence list
            }
            candidates.data[kept++] = id;
            steps += d.length;
            int[] resolvent = resolvent(lits, d, -pivot);
            if (resolvent == null) {
                continue;
            }
            int mark = trailSize;
            int conflict = assumeNegation(resolvent);
            if (conflict == 0) {
                undo(mark);
                throw new ProofError(line.number(), "lemma " + clauseText(lits) + " is neither RUP nor RAT on " + pivot
                        + " (the resolvent with clause " + id + ", " + clauseText(d) + ", is not RUP)");
            }
            undo(mark);
        }
        if (candidates != null) {
            candidates.size = kept;
        }
    }

    /** The resolvent of {@code lits} and {@code d} on {@code -pivot ∈ d}, or null when it is a tautology. */
    private int[] resolvent(int[] lits, int[] d, int negatedPivot) {
        int[] out = Arrays.copyOf(lits, lits.length + d.length);
        int size = lits.length;
        for (int lit : lits) {
            scratch[Math.abs(lit)] = (byte) (lit > 0 ? 1 : -1);
        }
        boolean tautology = false;
        for (int lit : d) {
            byte sign = (byte) (lit > 0 ? 1 : -1);
            if (lit == negatedPivot) {
                continue;
            }
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

    private static String clauseText(int[] lits) {
        StringBuilder s = new StringBuilder();
        for (int lit : lits) {
            s.append(lit).append(' ');
        }
        return s.append('0').toString();
    }

    private void delete(int[] lits) {
        int id = lits.length == 0 ? 0 : latestCopy(lits);
        if (id == 0) {
            ignored++;
            return;
        }
        int[] c = clauses.get(id);
        boolean isReason = c.length > 0 && value(c[0]) > 0 && reason[Math.abs(c[0])] == id;
        if (isReason || id == topConflict) {
            ignored++;
            return;
        }
        clauses.set(id, null);
        deleted++;
    }

    /**
     * The id of the most recently added live clause with the same literals as {@code lits}, or 0;
     * searched in the shortest occurrence list among its literals.
     */
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
            scratch[Math.abs(lit)] = (byte) (lit > 0 ? 1 : -1);
        }
        int found = 0;
        for (int i = shortest.size - 1; i >= 0 && found == 0; i--) {
            int[] c = clauses.get(shortest.data[i]);
            steps += lits.length;
            if (c != null && sameLiterals(c, lits.length)) {
                found = shortest.data[i];
            }
        }
        for (int lit : lits) {
            scratch[Math.abs(lit)] = 0;
        }
        return found;
    }

    /** Whether clause {@code c} has {@code size} distinct literals, all marked in {@code scratch}. */
    private boolean sameLiterals(int[] c, int size) {
        if (c.length != size) {
            return false;
        }
        for (int lit : c) {
            if (scratch[Math.abs(lit)] != (lit > 0 ? 1 : -1)) {
                return false;
            }
        }
        return true;
    }

    /** Adds a clause at top level, watches it and propagates; returns its id. */
    private int add(int[] lits) {
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
            return id;
        }
        // bring up to two literals that are not false to the front; they are the watches
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
        return id;
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
            if (value(lit) == 0) {
                assign(-lit, 0);
            }
        }
        return propagate();
    }

    /** Unit propagation over the watches from the first unpropagated trail entry; returns a falsified clause's id or 0. */
    private int propagate() {
        while (propagated < trailSize) {
            int falseLit = -trail[propagated++];
            IntList ws = watches[code(falseLit)];
            if (ws == null) {
                continue;
            }
            int kept = 0;
            steps += ws.size;
            for (int i = 0; i < ws.size; i++) {
                int id = ws.data[i];
                int[] c = clauses.get(id);
                if (c == null) {
                    continue; // deleted: dropped from this watch list
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
        value[Math.abs(lit)] = (byte) (lit > 0 ? 1 : -1);
        reason[Math.abs(lit)] = why;
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

    /** A growable int array for a watch list. */
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
