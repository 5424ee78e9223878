package org.chirocore.check;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.Optional;

import org.chirocore.check.ProofLines.Line;
import org.chirocore.check.ProofLines.ProofError;

/**
 * Linear LRAT checking (Cruz-Filipe, Heule, Hunt, Kaufmann, Schneider-Kamp, "Efficient certified
 * RAT verification", CADE 2017): for each lemma, assign its negation; each hint must then be unit
 * (its one unassigned literal is assigned) until one is falsified. A RAT lemma on its first literal
 * p lists, for every clause D containing −p that the assignment does not satisfy, −id(D) and the
 * hints that refute D's resolvent. No search: the cost is linear in the total size of the hinted
 * clauses, plus, per RAT lemma, the clauses containing −p (found through per-literal occurrence
 * lists) times the length of its hint section. The proof must add the empty clause.
 *
 * <p>Every line is {@code id literals 0 hints 0} or {@code id d ids 0}; ids of added clauses
 * increase strictly, so clauses are kept in id order and found by binary search.
 */
public final class LratChecker {
    private final int variables;
    /** Ids of the clauses ever added, increasing; {@code clauses[k]} is the clause of {@code ids[k]}, null once deleted. */
    private long[] ids = new long[16];
    private int[][] clauses = new int[16][];
    private int count;
    /** Per literal code: positions k (in {@code ids}) of the clauses containing it. */
    private final int[][] occurrences;
    private final int[] occurrenceCount;
    /** Per variable: +1 true, −1 false, 0 unassigned; {@code assigned} lists the assigned literals in order. */
    private final byte[] value;
    private final int[] assigned;
    private int assignedCount;
    private final byte[] scratch;
    private long literals;
    private long steps;
    private long lemmas;
    private long hints;

    private LratChecker(Cnf cnf) {
        variables = cnf.variables();
        value = new byte[variables + 1];
        assigned = new int[variables + 1];
        scratch = new byte[variables + 1];
        occurrences = new int[2 * variables + 2][];
        occurrenceCount = new int[2 * variables + 2];
        for (int i = 0; i < cnf.clauses().size(); i++) {
            add(i + 1L, cnf.clauses().get(i));
        }
    }

    /** The first fault of {@code lrat} as a proof that {@code cnf} is unsatisfiable, naming its line, or empty. */
    public static Optional<String> check(Cnf cnf, String lrat) {
        try {
            DratChecker.Outcome outcome = check(cnf, new StringReader(lrat));
            return outcome.valid() ? Optional.empty() : Optional.of(outcome.failure());
        } catch (IOException e) {
            throw new UncheckedIOException("A string reader does not fail.", e);
        }
    }

    /** As {@link #check(Cnf, String)}, reading the proof as a stream up to its empty clause; the outcome counts the work done. */
    static DratChecker.Outcome check(Cnf cnf, Reader lrat) throws IOException {
        LratChecker checker = new LratChecker(cnf);
        try {
            checker.run(lrat);
            return new DratChecker.Outcome(true, "", checker.summary());
        } catch (ProofError e) {
            return new DratChecker.Outcome(false, e.getMessage(), checker.summary());
        }
    }

    private String summary() {
        return "LRAT hints checked: " + lemmas + " lemmas, " + hints + " hints, " + steps + " propagation steps";
    }

    private void run(Reader text) throws ProofError, IOException {
        ProofLines lines = new ProofLines(text, 1);
        for (Line line = lines.next(); line != null; line = lines.next()) {
            if (steps > VerifierLimits.MAX_PROPAGATION_STEPS) {
                throw new ProofError(line.number(), "checking the proof needs more than " + VerifierLimits.MAX_PROPAGATION_STEPS
                        + " propagation steps, the verifier's limit; not checked further");
            }
            long[] n = line.numbers();
            Line rest = new Line(line.number(), line.deletion(), Arrays.copyOfRange(n, 1, n.length));
            if (line.deletion()) {
                int end = ProofLines.terminator(rest, 0);
                if (end != rest.numbers().length - 1) {
                    throw new ProofError(line.number(), "text after the closing 0 of the deleted ids");
                }
                for (int i = 0; i < end; i++) {
                    steps++;
                    int k = position(rest.numbers()[i]);
                    if (k >= 0) {
                        clauses[k] = null;
                    }
                }
                continue;
            }
            long lastId = count == 0 ? 0 : ids[count - 1];
            if (n[0] <= lastId) {
                throw new ProofError(line.number(), "clause id " + n[0] + " is not above the previous id " + lastId);
            }
            int litsEnd = ProofLines.terminator(rest, 0);
            int[] lits = ProofLines.distinct(line, ProofLines.literals(rest, 0, variables), scratch);
            if (litsEnd == rest.numbers().length - 1) {
                throw new ProofError(line.number(), "the hint section is missing: a lemma line is \"id literals 0 hints 0\"");
            }
            int hintsEnd = ProofLines.terminator(rest, litsEnd + 1);
            if (hintsEnd != rest.numbers().length - 1) {
                throw new ProofError(line.number(), "text after the closing 0 of the hints");
            }
            literals += lits.length;
            if (literals > VerifierLimits.MAX_PROOF_LITERALS) {
                throw new ProofError(line.number(), "the lemmas hold more than " + VerifierLimits.MAX_PROOF_LITERALS
                        + " literals, the verifier's limit; not checked further");
            }
            lemma(line.number(), lits, Arrays.copyOfRange(rest.numbers(), litsEnd + 1, hintsEnd));
            lemmas++;
            hints += hintsEnd - litsEnd - 1;
            add(n[0], lits);
            if (lits.length == 0) {
                return;
            }
        }
        throw new ProofError(lines.lastLine(), "the proof ends without deriving the empty clause");
    }

    private void add(long id, int[] lits) {
        if (count == ids.length) {
            ids = Arrays.copyOf(ids, 2 * count);
            clauses = Arrays.copyOf(clauses, 2 * count);
        }
        ids[count] = id;
        clauses[count] = lits;
        for (int lit : lits) {
            int code = code(lit);
            if (occurrences[code] == null) {
                occurrences[code] = new int[4];
            } else if (occurrenceCount[code] == occurrences[code].length) {
                occurrences[code] = Arrays.copyOf(occurrences[code], 2 * occurrenceCount[code]);
            }
            occurrences[code][occurrenceCount[code]++] = count;
        }
        count++;
    }

    /** The position of clause {@code id} among the added clauses, or −1. */
    private int position(long id) {
        int k = Arrays.binarySearch(ids, 0, count, id);
        return k < 0 ? -1 : k;
    }

    private void lemma(long line, int[] lits, long[] hints) throws ProofError {
        for (int lit : lits) {
            if (value(lit) == 0) {
                assign(-lit);
            }
        }
        int firstGroup = 0;
        while (firstGroup < hints.length && hints[firstGroup] > 0) {
            firstGroup++;
        }
        boolean refuted = follow(line, Arrays.copyOfRange(hints, 0, firstGroup));
        if (!refuted) {
            checkRat(line, lits, Arrays.copyOfRange(hints, firstGroup, hints.length));
        }
        undo(0);
    }

    private void checkRat(long line, int[] lits, long[] groups) throws ProofError {
        if (lits.length == 0) {
            throw new ProofError(line, "the hints of the empty clause end without a conflict");
        }
        int pivot = lits[0];
        int mark = assignedCount;
        int[] candidates = occurrences[code(-pivot)];
        for (int i = 0; i < occurrenceCount[code(-pivot)]; i++) {
            int k = candidates[i];
            int[] d = clauses[k];
            if (d == null || satisfiedApartFrom(d, -pivot)) {
                continue;
            }
            for (int lit : d) {
                if (lit != -pivot && value(lit) == 0) {
                    assign(-lit);
                }
            }
            if (!follow(line, group(line, groups, ids[k]))) {
                throw new ProofError(line, "the hints for RAT clause " + ids[k] + " end without a conflict");
            }
            undo(mark);
        }
    }

    /** The hints after −id in {@code groups}, up to the next negative number. */
    private long[] group(long line, long[] groups, long id) throws ProofError {
        steps += groups.length;
        for (int i = 0; i < groups.length; i++) {
            if (groups[i] == -id) {
                int end = i + 1;
                while (end < groups.length && groups[end] > 0) {
                    end++;
                }
                return Arrays.copyOfRange(groups, i + 1, end);
            }
        }
        throw new ProofError(line, "no RAT hints for clause " + id + ", which contains the negated pivot");
    }

    /** Applies the hints in order; true when one is falsified, false when they run out first. */
    private boolean follow(long line, long[] hints) throws ProofError {
        for (long id : hints) {
            int k = position(id);
            int[] c = k < 0 ? null : clauses[k];
            if (c == null) {
                throw new ProofError(line, "hint " + id + " names no live clause");
            }
            steps += c.length;
            int unassigned = 0;
            int last = 0;
            for (int lit : c) {
                if (value(lit) > 0) {
                    throw new ProofError(line, "hint " + id + " is satisfied, not unit");
                }
                if (value(lit) == 0) {
                    unassigned++;
                    last = lit;
                }
            }
            if (unassigned == 0) {
                return true;
            }
            if (unassigned > 1) {
                throw new ProofError(line, "hint " + id + " is not unit: " + unassigned + " literals are unassigned");
            }
            assign(last);
        }
        return false;
    }

    private boolean satisfiedApartFrom(int[] clause, int except) {
        steps += clause.length;
        for (int lit : clause) {
            if (lit != except && value(lit) > 0) {
                return true;
            }
        }
        return false;
    }

    private static int code(int lit) {
        return 2 * Math.abs(lit) + (lit < 0 ? 1 : 0);
    }

    private int value(int lit) {
        int v = value[Math.abs(lit)];
        return lit > 0 ? v : -v;
    }

    private void assign(int lit) {
        value[Math.abs(lit)] = (byte) (lit > 0 ? 1 : -1);
        assigned[assignedCount++] = lit;
    }

    private void undo(int mark) {
        while (assignedCount > mark) {
            value[Math.abs(assigned[--assignedCount])] = 0;
        }
    }
}
