package org.chirocore.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.chirocore.check.ProofLines.Line;
import org.chirocore.check.ProofLines.ProofError;

/**
 * Linear LRAT checking (Cruz-Filipe, Heule, Hunt, Kaufmann, Schneider-Kamp, "Efficient certified
 * RAT verification", CADE 2017): for each lemma, assign its negation; each hint must then be unit
 * (its one unassigned literal is assigned) until one is falsified. A RAT lemma on its first literal
 * p lists, for every clause D containing −p that the assignment does not satisfy, −id(D) and the
 * hints that refute D's resolvent. No search: the cost is linear in the total size of the hinted
 * clauses, plus one clause scan per RAT lemma. The proof must add the empty clause.
 */
public final class LratChecker {
    private final int variables;
    private final Map<Long, int[]> clauses = new TreeMap<>();
    /** Per variable: +1 true, −1 false, 0 unassigned; {@code assigned} lists the assigned literals in order. */
    private final byte[] value;
    private final List<Integer> assigned = new ArrayList<>();

    private LratChecker(Cnf cnf) {
        variables = cnf.variables();
        value = new byte[variables + 1];
        for (int i = 0; i < cnf.clauses().size(); i++) {
            clauses.put(i + 1L, cnf.clauses().get(i));
        }
    }

    /** The first fault of {@code lrat} as a proof that {@code cnf} is unsatisfiable, naming its line, or empty. */
    public static Optional<String> check(Cnf cnf, String lrat) {
        try {
            new LratChecker(cnf).run(lrat);
            return Optional.empty();
        } catch (ProofError e) {
            return Optional.of(e.getMessage());
        }
    }

    private void run(String text) throws ProofError {
        long lastId = clauses.size();
        List<Line> lines = ProofLines.parse(text, 1);
        for (Line line : lines) {
            long[] n = line.numbers();
            Line rest = new Line(line.number(), line.deletion(), Arrays.copyOfRange(n, 1, n.length));
            if (line.deletion()) {
                for (long id : Arrays.copyOfRange(rest.numbers(), 0, ProofLines.terminator(rest, 0))) {
                    clauses.remove(id);
                }
                continue;
            }
            if (n[0] <= lastId) {
                throw new ProofError(line.number(), "clause id " + n[0] + " is not above the previous id " + lastId);
            }
            lastId = n[0];
            int[] lits = ProofLines.distinct(line, ProofLines.literals(rest, 0, variables));
            int hintsEnd = ProofLines.terminator(rest, lits.length + 1);
            if (hintsEnd != rest.numbers().length - 1) {
                throw new ProofError(line.number(), "text after the closing 0 of the hints");
            }
            lemma(line.number(), lits, Arrays.copyOfRange(rest.numbers(), lits.length + 1, hintsEnd));
            clauses.put(n[0], lits);
            if (lits.length == 0) {
                return;
            }
        }
        throw new ProofError(lines.isEmpty() ? 1 : lines.get(lines.size() - 1).number(),
                "the proof ends without deriving the empty clause");
    }

    private void lemma(int line, int[] lits, long[] hints) throws ProofError {
        for (int lit : lits) {
            assign(-lit);
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

    private void checkRat(int line, int[] lits, long[] groups) throws ProofError {
        if (lits.length == 0) {
            throw new ProofError(line, "the hints of the empty clause end without a conflict");
        }
        int pivot = lits[0];
        int mark = assigned.size();
        for (Map.Entry<Long, int[]> entry : clauses.entrySet()) {
            int[] d = entry.getValue();
            if (!ProofLines.contains(d, -pivot) || satisfiedApartFrom(d, -pivot)) {
                continue;
            }
            for (int lit : d) {
                if (lit != -pivot && value(lit) == 0) {
                    assign(-lit);
                }
            }
            if (!follow(line, group(line, groups, entry.getKey()))) {
                throw new ProofError(line, "the hints for RAT clause " + entry.getKey() + " end without a conflict");
            }
            undo(mark);
        }
    }

    /** The hints after −id in {@code groups}, up to the next negative number. */
    private static long[] group(int line, long[] groups, long id) throws ProofError {
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
    private boolean follow(int line, long[] hints) throws ProofError {
        for (long id : hints) {
            int[] c = clauses.get(id);
            if (c == null) {
                throw new ProofError(line, "hint " + id + " names no live clause");
            }
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
        for (int lit : clause) {
            if (lit != except && value(lit) > 0) {
                return true;
            }
        }
        return false;
    }

    private int value(int lit) {
        int v = value[Math.abs(lit)];
        return lit > 0 ? v : -v;
    }

    private void assign(int lit) {
        value[Math.abs(lit)] = (byte) (lit > 0 ? 1 : -1);
        assigned.add(lit);
    }

    private void undo(int mark) {
        while (assigned.size() > mark) {
            value[Math.abs(assigned.remove(assigned.size() - 1))] = 0;
        }
    }
}
