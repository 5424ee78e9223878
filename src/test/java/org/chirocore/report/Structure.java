package org.chirocore.report;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Small structural checkers for generated HTML and LaTeX: each returns the first problem as a
 * sentence, or the empty string when there is none.
 */
final class Structure {
    private static final Pattern TAG = Pattern.compile("<(/?)([a-zA-Z][a-zA-Z0-9-]*)([^<>]*?)(/?)>");
    private static final Set<String> VOID = Set.of("meta", "br", "hr", "img", "link", "input");
    private static final Pattern ENVIRONMENT = Pattern.compile("\\\\(begin|end)\\{([a-z*]+)\\}");

    private Structure() {
    }

    /**
     * Whether every HTML tag is closed in order: start tags push, end tags pop their match, void
     * elements and {@code />} close themselves; text outside tags must hold no stray {@code <}.
     */
    static String htmlProblem(String html) {
        String body = html.startsWith("<!DOCTYPE html>") ? html.substring("<!DOCTYPE html>".length()) : null;
        if (body == null) {
            return "no doctype";
        }
        Deque<String> open = new ArrayDeque<>();
        Matcher m = TAG.matcher(body);
        int last = 0;
        while (m.find()) {
            if (body.substring(last, m.start()).contains("<") || body.substring(last, m.start()).contains(">")) {
                return "a stray angle bracket before offset " + m.start();
            }
            last = m.end();
            String name = m.group(2).toLowerCase();
            if (!m.group(1).isEmpty()) {
                if (open.isEmpty() || !open.peek().equals(name)) {
                    return "</" + name + "> closes " + (open.isEmpty() ? "nothing" : "<" + open.peek() + ">");
                }
                open.pop();
            } else if (m.group(4).isEmpty() && !VOID.contains(name)) {
                open.push(name);
            }
        }
        if (body.substring(last).contains("<")) {
            return "a stray angle bracket at the end";
        }
        return open.isEmpty() ? "" : "<" + open.peek() + "> is never closed";
    }

    /**
     * Whether a LaTeX fragment is balanced: outside comments and verbatim blocks, braces balance
     * (escaped braces aside), every {@code \begin} has its {@code \end} in order, and none of
     * {@code _ # ^} appears unescaped outside math mode ({@code $...$}) or a {@code $} is unpaired.
     */
    static String latexProblem(String tex) {
        StringBuilder code = new StringBuilder();
        boolean verbatim = false;
        for (String line : tex.split("\n", -1)) {
            if (line.equals("\\begin{verbatim}")) {
                verbatim = true;
            } else if (line.equals("\\end{verbatim}")) {
                verbatim = false;
            } else if (!verbatim) {
                code.append(withoutComment(line)).append('\n');
            }
        }
        if (verbatim) {
            return "a verbatim block is never closed";
        }
        String text = code.toString();
        int depth = 0;
        boolean math = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\\') {
                i++;
            } else if (c == '$') {
                math = !math;
            } else if (math && (c == '_' || c == '^')) {
                continue;
            } else if (c == '{') {
                depth++;
            } else if (c == '}' && --depth < 0) {
                return "an unmatched } at offset " + i;
            } else if ("_#$^".indexOf(c) >= 0) {
                return "an unescaped " + c + " at offset " + i + ": " + text.substring(Math.max(0, i - 30), i + 1);
            }
        }
        if (depth != 0) {
            return depth + " unclosed {";
        }
        if (math) {
            return "a $ opens math mode that is never closed";
        }
        Deque<String> open = new ArrayDeque<>();
        Matcher m = ENVIRONMENT.matcher(text);
        while (m.find()) {
            if (m.group(1).equals("begin")) {
                open.push(m.group(2));
            } else if (open.isEmpty() || !open.pop().equals(m.group(2))) {
                return "\\end{" + m.group(2) + "} does not match";
            }
        }
        return open.isEmpty() ? "" : "\\begin{" + open.peek() + "} is never ended";
    }

    private static String withoutComment(String line) {
        for (int i = 0; i < line.length(); i++) {
            if (line.charAt(i) == '\\') {
                i++;
            } else if (line.charAt(i) == '%') {
                return line.substring(0, i);
            }
        }
        return line;
    }
}
