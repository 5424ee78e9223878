package org.chirocore.check;

import java.util.ArrayList;
import java.util.List;

/** Splitting DRAT and LRAT text into numbered lines of integers, with messages that name the line. */
final class ProofLines {
    private ProofLines() {
    }

    /** A proof step that is wrong; the message names its line. */
    static final class ProofError extends Exception {
        private static final long serialVersionUID = 1L;

        ProofError(int line, String message) {
            super("line " + line + ": " + message);
        }
    }

    /** One non-blank line: its 1-based number, whether it starts with "d", and its integers. */
    record Line(int number, boolean deletion, long[] numbers) {
    }

    /**
     * The non-blank lines of {@code text}. A deletion is marked by a "d" as token number
     * {@code deletionAt} (0 in DRAT, where it may also be glued to the first literal; 1 in LRAT), which
     * is dropped from the numbers.
     */
    static List<Line> parse(String text, int deletionAt) throws ProofError {
        List<Line> out = new ArrayList<>();
        int number = 0;
        for (String raw : text.split("\n", -1)) {
            number++;
            String line = raw.strip();
            if (line.isEmpty()) {
                continue;
            }
            List<String> tokens = new ArrayList<>(List.of(line.split("\\s+")));
            boolean deletion = tokens.size() > deletionAt && tokens.get(deletionAt).startsWith("d");
            if (deletion && tokens.get(deletionAt).equals("d")) {
                tokens.remove(deletionAt);
            } else if (deletion) {
                tokens.set(deletionAt, tokens.get(deletionAt).substring(1));
            }
            long[] numbers = new long[tokens.size()];
            for (int i = 0; i < numbers.length; i++) {
                numbers[i] = integer(number, tokens.get(i));
            }
            out.add(new Line(number, deletion, numbers));
        }
        return out;
    }

    private static long integer(int line, String token) throws ProofError {
        if (!token.matches("-?[0-9]{1,10}")) {
            throw new ProofError(line, "\"" + (token.length() > 20 ? token.substring(0, 20) + "…" : token)
                    + "\" is not an integer of at most 10 digits");
        }
        return Long.parseLong(token);
    }

    /** The literals {@code numbers[from..]} up to the closing 0, each within ±variables. */
    static int[] literals(Line line, int from, int variables) throws ProofError {
        int end = terminator(line, from);
        int[] lits = new int[end - from];
        for (int i = from; i < end; i++) {
            long lit = line.numbers()[i];
            if (Math.abs(lit) > variables) {
                throw new ProofError(line.number(), "literal " + lit + " names no variable of the CNF (1.." + variables + ")");
            }
            lits[i - from] = (int) lit;
        }
        return lits;
    }

    /** The index of the first 0 at or after {@code from}. */
    static int terminator(Line line, int from) throws ProofError {
        for (int i = from; i < line.numbers().length; i++) {
            if (line.numbers()[i] == 0) {
                return i;
            }
        }
        throw new ProofError(line.number(), "missing the closing 0");
    }

    /** {@code lits} without repeated literals, first occurrences kept in order; a tautology is an error. */
    static int[] distinct(Line line, int[] lits) throws ProofError {
        List<Integer> out = new ArrayList<>();
        for (int lit : lits) {
            if (out.contains(-lit)) {
                throw new ProofError(line.number(), "the clause contains both " + lit + " and " + -lit);
            }
            if (!out.contains(lit)) {
                out.add(lit);
            }
        }
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Whether {@code clause} contains {@code lit}. */
    static boolean contains(int[] clause, int lit) {
        for (int l : clause) {
            if (l == lit) {
                return true;
            }
        }
        return false;
    }
}
