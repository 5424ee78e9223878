package org.chirocore.family;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * How a family names one vertex of the n-cube, for every n: a pattern of 0/1 pieces, each
 * repeated a number of times given by an expression in n. The rules a definition file may use:
 * {@code "all ones"}, {@code "all zeros"}, {@code "weight E"} (the vertex whose first E
 * coordinates are 1 and the others 0), {@code "unit E"} (the unit vector e_E) and explicit patterns such as {@code "1 repeated n"} or
 * {@code "1 repeated n-1, 0"} (pieces separated by commas, each a 0/1 string optionally followed
 * by {@code repeated E}). Immutable; {@link #label} costs O(n).
 *
 * @param text the rule as written
 * @param pieces the pattern, in coordinate order
 */
public record VertexRule(String text, List<Piece> pieces) {
    public VertexRule {
        pieces = List.copyOf(pieces);
    }

    /**
     * One piece of a pattern: {@code bits} written {@code times} times.
     *
     * @param bits a non-empty 0/1 string
     * @param times an expression in n
     */
    public record Piece(String bits, Expression times) {
    }

    private static final Set<Character> N = Set.of('n');

    /**
     * Parses a vertex rule whose expressions are in n.
     *
     * @throws IllegalArgumentException naming the text when it is not one of the rules above
     */
    public static VertexRule parse(String text) {
        return parse(text, N);
    }

    /**
     * Parses a vertex rule whose expressions may use {@code variables} (n and a generator's k).
     *
     * @throws IllegalArgumentException naming the text when it is not one of the rules above
     */
    static VertexRule parse(String text, Set<Character> variables) {
        String t = text.trim();
        if (t.equals("all ones")) {
            return new VertexRule(text, List.of(new Piece("1", Expression.parse("n", variables))));
        }
        if (t.equals("all zeros")) {
            return new VertexRule(text, List.of(new Piece("0", Expression.parse("n", variables))));
        }
        if (t.startsWith("weight ")) {
            String k = t.substring("weight ".length());
            return new VertexRule(text, List.of(new Piece("1", Expression.parse(k, variables)),
                    new Piece("0", Expression.parse("n-(" + k + ")", variables))));
        }
        if (t.startsWith("unit ")) {
            String k = t.substring("unit ".length());
            return new VertexRule(text, List.of(new Piece("0", Expression.parse("(" + k + ")-1", variables)),
                    new Piece("1", Expression.parse("1", variables)),
                    new Piece("0", Expression.parse("n-(" + k + ")", variables))));
        }
        List<Piece> pieces = new ArrayList<>();
        for (String part : t.split(",")) {
            String[] words = part.trim().split(" repeated ", 2);
            String bits = words[0].trim();
            if (!bits.matches("[01]+")) {
                throw new IllegalArgumentException("\"" + text + "\" is not a vertex rule: use \"all ones\", "
                        + "\"all zeros\", \"weight E\", \"unit E\" or a pattern such as \"1 repeated n-1, 0\" "
                        + "(0/1 strings, each optionally followed by \"repeated E\").");
            }
            pieces.add(new Piece(bits, Expression.parse(words.length == 2 ? words[1] : "1", variables)));
        }
        return new VertexRule(text, pieces);
    }

    /**
     * The label of the vertex at cube dimension n.
     *
     * @throws IllegalArgumentException when a piece would be repeated a negative number of times,
     *     or the vertex does not have n coordinates
     * @throws ArithmeticException when an expression overflows
     */
    public String label(int n) {
        return label(n, 0);
    }

    /**
     * The label of the vertex at cube dimension n with the generator's variable k bound to
     * {@code k}; throws as {@link #label(int)}.
     */
    String label(int n, long k) {
        StringBuilder b = new StringBuilder();
        for (Piece p : pieces) {
            long times = p.times().value(n, Math.toIntExact(k));
            if (times < 0 || times > n || times * p.bits().length() > n) {
                throw new IllegalArgumentException("\"" + text + "\" repeats \"" + p.bits() + "\" " + times
                        + " times, which does not fit " + n + " coordinates.");
            }
            b.append(p.bits().repeat((int) times));
        }
        if (b.length() != n) {
            throw new IllegalArgumentException("\"" + text + "\" gives the vertex " + (b.isEmpty() ? "\"\"" : b)
                    + " with " + b.length() + " coordinates, but the cube has " + n + ".");
        }
        return b.toString();
    }
}
