package org.chirocore.family;

import java.util.Set;

/**
 * Recursive descent for {@link Expression}: expression = term {("+" | "-") term}; term = factor
 * {("*" | "/") factor}; factor = integer | variable | "(" expression ")" | "-" factor. Spaces are
 * ignored between tokens.
 */
final class ExpressionParser {
    private final String text;
    private final Set<Character> variables;
    private int pos;

    ExpressionParser(String text, Set<Character> variables) {
        this.text = text;
        this.variables = Set.copyOf(variables);
    }

    Expression parseAll() {
        Expression e = expression();
        skipSpaces();
        if (pos < text.length()) {
            throw error("an operator (+, -, *, /) or the end");
        }
        return e;
    }

    private Expression expression() {
        Expression e = term();
        while (peek() == '+' || peek() == '-') {
            char op = text.charAt(pos++);
            e = new Expression.Binary(op, e, term());
        }
        return e;
    }

    private Expression term() {
        Expression e = factor();
        while (peek() == '*' || peek() == '/') {
            char op = text.charAt(pos++);
            e = new Expression.Binary(op, e, factor());
        }
        return e;
    }

    private Expression factor() {
        char c = peek();
        if (c == '-') {
            pos++;
            return new Expression.Negation(factor());
        }
        if (c == '(') {
            pos++;
            Expression inner = expression();
            if (peek() != ')') {
                throw error("a closing parenthesis");
            }
            pos++;
            return inner;
        }
        if (variables.contains(c)) {
            pos++;
            return new Expression.Variable(c);
        }
        if (c >= '0' && c <= '9') {
            int start = pos;
            while (pos < text.length() && Character.isDigit(text.charAt(pos))) {
                pos++;
            }
            try {
                return new Expression.Literal(Long.parseLong(text.substring(start, pos)));
            } catch (NumberFormatException e) {
                pos = start;
                throw error("an integer that fits 64 bits");
            }
        }
        throw error("a number, " + String.join(", ", variables.stream().sorted().map(String::valueOf).toList())
                + (variables.isEmpty() ? "" : ", ") + "\"-\" or \"(\"");
    }

    /** The next non-space character, or 0 at the end. */
    private char peek() {
        skipSpaces();
        return pos < text.length() ? text.charAt(pos) : 0;
    }

    private void skipSpaces() {
        while (pos < text.length() && text.charAt(pos) == ' ') {
            pos++;
        }
    }

    private IllegalArgumentException error(String expected) {
        String found = pos < text.length() ? "\"" + text.charAt(pos) + "\"" : "the end";
        return new IllegalArgumentException("\"" + text + "\" is not an expression in "
                + (variables.isEmpty() ? "integers" : String.join(" and ", variables.stream().sorted()
                        .map(String::valueOf).toList()))
                + ": at position " + (pos + 1) + " expected " + expected + ", found " + found + ".");
    }
}
