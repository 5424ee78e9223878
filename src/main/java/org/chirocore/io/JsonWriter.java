package org.chirocore.io;

import java.util.Iterator;
import java.util.Map;

/**
 * Deterministic pretty-printer behind {@link Json#toText()}: 2-space indent, members in
 * insertion order, arrays without nested arrays or objects on one line (bases and sign lists stay
 * compact), non-ASCII characters written as themselves, control characters escaped.
 */
final class JsonWriter {
    private static final String INDENT = "  ";

    private JsonWriter() {
    }

    static String write(Json value) {
        StringBuilder out = new StringBuilder();
        write(value, 0, out);
        return out.toString();
    }

    private static void write(Json value, int level, StringBuilder out) {
        if (value instanceof Json.Obj o) {
            writeObject(o, level, out);
        } else if (value instanceof Json.Arr a) {
            writeArray(a, level, out);
        } else if (value instanceof Json.Str s) {
            quote(s.value(), out);
        } else if (value instanceof Json.Num n) {
            out.append(n.text());
        } else if (value instanceof Json.Bool b) {
            out.append(b.value());
        } else {
            out.append("null");
        }
    }

    private static void writeObject(Json.Obj o, int level, StringBuilder out) {
        if (o.members().isEmpty()) {
            out.append("{}");
            return;
        }
        out.append("{\n");
        Iterator<Map.Entry<String, Json>> it = o.members().entrySet().iterator();
        while (it.hasNext()) {
            Map.Entry<String, Json> member = it.next();
            indent(level + 1, out);
            quote(member.getKey(), out);
            out.append(": ");
            write(member.getValue(), level + 1, out);
            out.append(it.hasNext() ? ",\n" : "\n");
        }
        indent(level, out);
        out.append('}');
    }

    private static void writeArray(Json.Arr a, int level, StringBuilder out) {
        boolean flat = a.elements().stream().noneMatch(e -> e instanceof Json.Obj || e instanceof Json.Arr);
        if (flat) {
            out.append('[');
            for (int i = 0; i < a.size(); i++) {
                if (i > 0) {
                    out.append(", ");
                }
                write(a.get(i), level, out);
            }
            out.append(']');
            return;
        }
        out.append("[\n");
        for (int i = 0; i < a.size(); i++) {
            indent(level + 1, out);
            write(a.get(i), level + 1, out);
            out.append(i + 1 < a.size() ? ",\n" : "\n");
        }
        indent(level, out);
        out.append(']');
    }

    private static void indent(int level, StringBuilder out) {
        out.append(INDENT.repeat(level));
    }

    /** Escapes exactly what RFC 8259 requires: the quote, the backslash and U+0000..U+001F. */
    private static void quote(String s, StringBuilder out) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> {
                    if (c < 0x20) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }
}
