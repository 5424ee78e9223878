package org.chirocore.check;

import java.io.IOException;
import java.io.Reader;
import java.util.Arrays;

/**
 * Reads DRAT and LRAT text as a stream of numbered lines of integers, with messages that name the
 * line. The text is never held whole: one line at a time, at most {@link #MAX_NUMBERS} integers.
 */
final class ProofLines {
    /** Most integers on one proof line (a clause and its hints). */
    static final int MAX_NUMBERS = 1 << 24;

    /** A proof step that is wrong; the message names its line. */
    static final class ProofError extends Exception {
        private static final long serialVersionUID = 1L;

        ProofError(long line, String message) {
            super("line " + line + ": " + message);
        }
    }

    /** One non-blank line: its 1-based number, whether it is a deletion, and its integers. */
    record Line(long number, boolean deletion, long[] numbers) {
    }

    private final Reader in;
    private final int deletionAt;
    private long number;
    private long lastNonBlank = 1;
    private final char[] buffer = new char[1 << 16];
    private int at;
    private int length;

    /**
     * @param deletionAt the token that marks a deletion by "d": 0 in DRAT (where it may also be glued
     *     to the first literal), 1 in LRAT; it is dropped from the numbers
     */
    ProofLines(Reader in, int deletionAt) {
        this.in = in;
        this.deletionAt = deletionAt;
    }

    /** The number of the last non-blank line read, for a message about the end of the proof. */
    long lastLine() {
        return lastNonBlank;
    }

    /** The next non-blank line, or null at the end of the text. */
    Line next() throws ProofError, IOException {
        while (true) {
            int c = read();
            if (c < 0) {
                return null;
            }
            number++;
            long[] numbers = new long[8];
            int count = 0;
            int token = 0;
            boolean deletion = false;
            StringBuilder t = new StringBuilder();
            while (c >= 0 && c != '\n') {
                if (c == ' ' || c == '\t' || c == '\r') {
                    c = read();
                    continue;
                }
                t.setLength(0);
                while (c >= 0 && c != '\n' && c != ' ' && c != '\t' && c != '\r') {
                    if (t.length() <= 20) {
                        t.append((char) c);
                    }
                    c = read();
                }
                String word = t.toString();
                if (token++ == deletionAt && word.startsWith("d")) {
                    deletion = true;
                    word = word.substring(1);
                    if (word.isEmpty()) {
                        continue;
                    }
                }
                if (count == numbers.length) {
                    if (count == MAX_NUMBERS) {
                        throw new ProofError(number, "more than " + MAX_NUMBERS + " numbers on one line");
                    }
                    numbers = Arrays.copyOf(numbers, Math.min(2 * count, MAX_NUMBERS));
                }
                numbers[count++] = integer(word);
            }
            if (token > 0) {
                lastNonBlank = number;
                return new Line(number, deletion, Arrays.copyOf(numbers, count));
            }
        }
    }

    private int read() throws IOException {
        if (at == length) {
            length = in.read(buffer);
            at = 0;
            if (length <= 0) {
                length = 0;
                return -1;
            }
        }
        return buffer[at++];
    }

    private long integer(String token) throws ProofError {
        int digits = token.startsWith("-") ? token.length() - 1 : token.length();
        boolean valid = digits >= 1 && digits <= 10;
        for (int i = token.length() - digits; i < token.length() && valid; i++) {
            valid = token.charAt(i) >= '0' && token.charAt(i) <= '9';
        }
        if (!valid) {
            throw new ProofError(number, "\"" + Escaping.printable(token.length() > 20 ? token.substring(0, 20) + "…" : token)
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

    /**
     * {@code lits} without repeated literals, first occurrences kept in order; a tautology is an
     * error. {@code seen} is a scratch array indexed by variable, all zero on entry and on return.
     */
    static int[] distinct(Line line, int[] lits, byte[] seen) throws ProofError {
        int[] out = new int[lits.length];
        int count = 0;
        try {
            for (int lit : lits) {
                byte sign = (byte) (lit > 0 ? 1 : -1);
                byte before = seen[Math.abs(lit)];
                if (before == -sign) {
                    throw new ProofError(line.number(), "the clause contains both " + lit + " and " + -lit);
                }
                if (before == 0) {
                    seen[Math.abs(lit)] = sign;
                    out[count++] = lit;
                }
            }
        } finally {
            for (int lit : lits) {
                seen[Math.abs(lit)] = 0;
            }
        }
        return Arrays.copyOf(out, count);
    }
}
