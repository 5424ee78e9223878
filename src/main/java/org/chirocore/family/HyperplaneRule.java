package org.chirocore.family;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.HyperplaneSpec;

/**
 * How a family names its hyperplane H at every n: an equation a·x = b whose coefficients and
 * offset are expressions, or the set of cube vertices of one Hamming weight. {@link #spec} only
 * evaluates the rule; whether the result is a hyperplane of the n-cube is decided when the
 * construction is built. Immutable; {@link #spec} costs O(n) for an equation and O(n·2^n) for a
 * weight.
 */
public sealed interface HyperplaneRule {

    /**
     * H's description at cube dimension n.
     *
     * @throws IllegalArgumentException when the rule gives nothing sensible at n (a wrong number
     *     of coefficients, a weight outside 0..n, a value that overflows an int)
     */
    HyperplaneSpec spec(int n);

    /**
     * H = {x : a·x = b}, with a_i = {@code coefficient} at coordinate i = 1..n and b = {@code offset},
     * e.g. {@code "normal": "1", "offset": "1"} for x1 + … + xn = 1.
     */
    record Formula(Expression coefficient, Expression offset) implements HyperplaneRule {
        @Override
        public HyperplaneSpec spec(int n) {
            List<Integer> normal = new ArrayList<>();
            for (int i = 1; i <= n; i++) {
                normal.add(coefficient.intValue(n, i));
            }
            return new HyperplaneSpec.ByEquation(normal, offset.intValue(n, 0));
        }
    }

    /**
     * H = {x : a·x = b} with the coefficients listed one by one (each an expression in n); the
     * list must have n entries at every n of the range, so it suits a family over one n.
     */
    record Listed(List<Expression> coefficients, Expression offset) implements HyperplaneRule {
        public Listed {
            coefficients = List.copyOf(coefficients);
        }

        @Override
        public HyperplaneSpec spec(int n) {
            if (coefficients.size() != n) {
                throw new IllegalArgumentException("the normal lists " + coefficients.size()
                        + " coefficients, but the cube has dimension " + n + ".");
            }
            return new HyperplaneSpec.ByEquation(coefficients.stream().map(a -> a.intValue(n, 0)).toList(),
                    offset.intValue(n, 0));
        }
    }

    /** H = the cube vertices with exactly {@code weight} coordinates equal to 1 ({@code "vertices": "weight 1"}). */
    record Weight(Expression weight) implements HyperplaneRule {
        @Override
        public HyperplaneSpec spec(int n) {
            int k = weight.intValue(n, 0);
            if (k < 0 || k > n) {
                throw new IllegalArgumentException("the weight " + k + " is outside 0.." + n + ".");
            }
            List<String> labels = new ArrayList<>();
            for (int v = 0; v < 1 << n; v++) {
                if (Integer.bitCount(v) == k) {
                    String bits = Integer.toBinaryString(v);
                    labels.add("0".repeat(n - bits.length()) + bits);
                }
            }
            return new HyperplaneSpec.ByVertices(labels);
        }
    }
}
