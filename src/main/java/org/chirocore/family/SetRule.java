package org.chirocore.family;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * How a rule-based prediction names a set of cube vertices for every n (docs/families.md):
 * <ul>
 *   <li>a {@link VertexRule} gives one vertex, e.g. {@code "all zeros"}, {@code "unit n"},
 *       {@code "1, 0 repeated n-1"};</li>
 *   <li>a generator {@code "R for k in A..B"} gives the vertices of the vertex rule R for
 *       k = A, A+1, …, B, where R, A and B are expressions in n (R also in k), e.g.
 *       {@code "unit k for k in 1..n-3"} or {@code "1 repeated k, 0 repeated n-k for k in 1..n-1"};
 *       an empty range (A &gt; B) gives no vertex;</li>
 *   <li>{@code "all of weight E"} gives every vertex with exactly E coordinates 1, in increasing
 *       order of labels (the vertex rule {@code "weight E"} is the single vertex 1…10…0).</li>
 * </ul>
 * Immutable. {@link #labels} costs O(n) per vertex given, plus O(2^n) for a weight set.
 */
public sealed interface SetRule {
    /** The rule as written. */
    String text();

    /**
     * The labels of the rule's vertices at cube dimension n, in the rule's order.
     *
     * @throws IllegalArgumentException when a vertex does not fit n coordinates, or a bound or
     *     weight is out of range
     * @throws ArithmeticException when an expression overflows
     */
    List<String> labels(int n);

    /** The keyword that starts a generator's range. */
    String FOR = " for k in ";

    /** The prefix of a weight set. */
    String WEIGHT = "all of weight ";

    /**
     * Parses a set rule: a generator when the text contains {@code " for k in "}, a weight set
     * when it starts with {@code "all of weight "}, otherwise a vertex rule.
     *
     * @throws IllegalArgumentException naming the text and what is wrong with it
     */
    static SetRule parse(String text) {
        String t = text.trim();
        int at = t.lastIndexOf(FOR);
        if (at >= 0) {
            String[] bounds = t.substring(at + FOR.length()).split("\\.\\.", -1);
            if (bounds.length != 2) {
                throw new IllegalArgumentException("\"" + text + "\" is not a generator: after \"for k in\" give "
                        + "a range A..B of expressions in n.");
            }
            Set<Character> nk = Set.of('n', 'k');
            return new Generated(text, VertexRule.parse(t.substring(0, at), nk),
                    Expression.parse(bounds[0].trim(), Set.of('n')), Expression.parse(bounds[1].trim(), Set.of('n')));
        }
        if (t.startsWith(WEIGHT)) {
            return new OfWeight(text, Expression.parse(t.substring(WEIGHT.length()), Set.of('n')));
        }
        return new One(text, VertexRule.parse(t));
    }

    /** One vertex. */
    record One(String text, VertexRule vertex) implements SetRule {
        @Override
        public List<String> labels(int n) {
            return List.of(vertex.label(n));
        }
    }

    /**
     * The vertices of {@code pattern} for k = from..to.
     *
     * @param pattern a vertex rule in n and k
     * @param from the first k, an expression in n
     * @param to the last k, an expression in n
     */
    record Generated(String text, VertexRule pattern, Expression from, Expression to) implements SetRule {
        @Override
        public List<String> labels(int n) {
            long a = from.value(n, 0);
            long b = to.value(n, 0);
            if (b >= a && b - a >= 1L << n) {
                throw new IllegalArgumentException("\"" + text + "\" runs k over " + a + ".." + b + ", more values "
                        + "than the " + n + "-cube has vertices.");
            }
            List<String> labels = new ArrayList<>();
            for (long k = a; k <= b; k++) {
                try {
                    labels.add(pattern.label(n, k));
                } catch (IllegalArgumentException | ArithmeticException e) {
                    throw new IllegalArgumentException("at k = " + k + ": " + e.getMessage(), e);
                }
            }
            return labels;
        }
    }

    /**
     * Every vertex with exactly {@code weight} coordinates 1.
     *
     * @param weight an expression in n
     */
    record OfWeight(String text, Expression weight) implements SetRule {
        @Override
        public List<String> labels(int n) {
            long w = weight.value(n, 0);
            if (w < 0 || w > n) {
                throw new IllegalArgumentException("\"" + text + "\" asks for weight " + w + ", but the cube has "
                        + n + " coordinates.");
            }
            List<String> labels = new ArrayList<>();
            for (int v = 0; v < 1 << n; v++) {
                if (Integer.bitCount(v) == w) {
                    String bits = Integer.toBinaryString(v);
                    labels.add("0".repeat(n - bits.length()) + bits);
                }
            }
            return labels;
        }
    }
}
