package org.chirocore.family;

import java.util.Set;

/**
 * A tiny integer expression in the cube dimension {@code n} and one index variable: the coordinate
 * index {@code i} in a hyperplane's normal, or the bound variable {@code k} of a generator in a
 * prediction rule ({@link SetRule}). Non-negative integer literals, the two variables, {@code + - *}, floor division {@code /}, unary minus and parentheses,
 * with the usual precedence. Parsed by recursive descent; evaluated exactly in 64-bit integers
 * with every operation checked, so an overflow is an error, never a wrong value. Immutable.
 *
 * <p>Cost: parsing and evaluating are linear in the length of the text.
 */
public sealed interface Expression {

    /**
     * The value at cube dimension {@code n} and index {@code i} (the coordinate, 1-based, or the
     * generator's {@code k}).
     *
     * @throws ArithmeticException when an intermediate value overflows a long, or on division by zero
     */
    long value(int n, int i);

    /** A literal. */
    record Literal(long value) implements Expression {
        @Override
        public long value(int n, int i) {
            return value;
        }
    }

    /** The variable {@code n}, or the index variable ({@code i} or {@code k}). */
    record Variable(char name) implements Expression {
        @Override
        public long value(int n, int i) {
            return name == 'n' ? n : i;
        }
    }

    /** {@code left op right} for op one of {@code + - * /}; {@code /} rounds towards minus infinity. */
    record Binary(char op, Expression left, Expression right) implements Expression {
        @Override
        public long value(int n, int i) {
            long a = left.value(n, i);
            long b = right.value(n, i);
            return switch (op) {
                case '+' -> Math.addExact(a, b);
                case '-' -> Math.subtractExact(a, b);
                case '/' -> Math.floorDiv(a, b);
                default -> Math.multiplyExact(a, b);
            };
        }
    }

    /** {@code -operand}. */
    record Negation(Expression operand) implements Expression {
        @Override
        public long value(int n, int i) {
            return Math.negateExact(operand.value(n, i));
        }
    }

    /**
     * Parses {@code text}, allowing only the listed variables.
     *
     * @param variables the variable names allowed: {@code n} and at most one index variable
     * @throws IllegalArgumentException with a sentence naming the text, the position (1-based)
     *     and what was expected there
     */
    static Expression parse(String text, Set<Character> variables) {
        return new ExpressionParser(text, variables).parseAll();
    }

    /**
     * The value as an int.
     *
     * @throws ArithmeticException when the value, or an intermediate one, does not fit
     */
    default int intValue(int n, int i) {
        return Math.toIntExact(value(n, i));
    }
}
