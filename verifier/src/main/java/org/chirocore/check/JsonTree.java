package org.chirocore.check;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The verifier's own JSON: a strict RFC 8259 reader (UTF-8, no duplicate member names, no unpaired
 * surrogates, nesting at most {@value #MAX_DEPTH} deep) and the canonical writer whose output a
 * certificate's hash is taken of (docs/certificate-format.md, "Canonical text"). Numbers keep the
 * text they were written with; plain integers are held as longs, whose decimal text is that text.
 */
final class JsonTree {
    /** Deepest nesting of arrays and objects accepted, so that hostile input cannot overflow the stack. */
    static final int MAX_DEPTH = 512;

    private JsonTree() {
    }

    /** The input is not JSON; the message gives the line and column. */
    static final class Malformed extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Malformed(String message) {
            super(message);
        }
    }

    /** The JSON has the wrong shape; the message names the member. */
    static final class Mistyped extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Mistyped(String message) {
            super(message);
        }
    }

    /** A JSON value, with typed access that names {@code what} on a mismatch. */
    sealed interface Value permits Obj, Arr, Str, Int, Num, Bool, Null {
        /** How a message names this kind of value. */
        String kind();

        default Obj asObject(String what) {
            return as(Obj.class, what, "an object");
        }

        default Arr asArray(String what) {
            return as(Arr.class, what, "an array");
        }

        default String asString(String what) {
            return as(Str.class, what, "a string").value();
        }

        default boolean asBoolean(String what) {
            return as(Bool.class, what, "a boolean").value();
        }

        /** This value as a long: only numbers written as plain integers count, never {@code 3.0} or {@code 3e0}. */
        default long asLong(String what) {
            return as(Int.class, what, "an integer").value();
        }

        default int asInt(String what) {
            long v = asLong(what);
            if (v != (int) v) {
                throw new Mistyped(what + " must be an integer between " + Integer.MIN_VALUE + " and " + Integer.MAX_VALUE + ", found " + v);
            }
            return (int) v;
        }

        private <T> T as(Class<T> type, String what, String expected) {
            if (type.isInstance(this)) {
                return type.cast(this);
            }
            throw new Mistyped(what + " must be " + expected + ", found " + kind());
        }
    }

    /** An object: members in file order, names distinct. */
    record Obj(Map<String, Value> members) implements Value {
        Obj {
            members = Collections.unmodifiableMap(new LinkedHashMap<>(members));
        }

        @Override
        public String kind() {
            return "an object";
        }

        boolean has(String name) {
            return members.containsKey(name);
        }

        Optional<Value> find(String name) {
            return Optional.ofNullable(members.get(name));
        }

        Value require(String name) {
            Value v = members.get(name);
            if (v == null) {
                throw new Mistyped("field \"" + Escaping.printable(name) + "\" is missing");
            }
            return v;
        }

        /** Refuses members not named in {@code allowed}. */
        void requireOnly(List<String> allowed) {
            for (String name : members.keySet()) {
                if (!allowed.contains(name)) {
                    throw new Mistyped("unknown field \"" + Escaping.printable(name) + "\"; allowed are " + allowed);
                }
            }
        }

        int requireInt(String name) {
            return require(name).asInt(field(name));
        }

        long requireLong(String name) {
            return require(name).asLong(field(name));
        }

        String requireString(String name) {
            return require(name).asString(field(name));
        }

        boolean requireBoolean(String name) {
            return require(name).asBoolean(field(name));
        }

        Obj requireObject(String name) {
            return require(name).asObject(field(name));
        }

        Arr requireArray(String name) {
            return require(name).asArray(field(name));
        }

        private static String field(String name) {
            return "field \"" + name + "\"";
        }
    }

    /** An array. */
    record Arr(List<Value> elements) implements Value {
        Arr {
            elements = List.copyOf(elements);
        }

        @Override
        public String kind() {
            return "an array";
        }

        int size() {
            return elements.size();
        }

        Value get(int i) {
            return elements.get(i);
        }
    }

    /** A string. */
    record Str(String value) implements Value {
        @Override
        public String kind() {
            return "a string";
        }
    }

    /** A number written as a plain integer that fits a long (not "-0"): its text is its decimal value. */
    record Int(long value) implements Value {
        @Override
        public String kind() {
            return "the integer " + value;
        }
    }

    /** Any other number, kept as written. */
    record Num(String text) implements Value {
        @Override
        public String kind() {
            return "the number " + (text.length() > 40 ? text.substring(0, 20) + "… (" + text.length() + " characters)" : text);
        }
    }

    /** A boolean. */
    record Bool(boolean value) implements Value {
        @Override
        public String kind() {
            return "a boolean";
        }
    }

    /** null. */
    record Null() implements Value {
        @Override
        public String kind() {
            return "null";
        }
    }

    /** Parses strict UTF-8 JSON (a leading byte order mark is skipped). */
    static Value parse(byte[] utf8) {
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(utf8)).toString();
        } catch (CharacterCodingException e) {
            throw new Malformed("the input is not valid UTF-8");
        }
        Parser p = new Parser(text.startsWith("\uFEFF") ? text.substring(1) : text);
        p.whitespace();
        Value v = p.value(0);
        p.whitespace();
        if (p.pos < p.text.length()) {
            throw p.error("expected the end of the input after the JSON value");
        }
        return v;
    }

    private static final class Parser {
        private final String text;
        private int pos;

        Parser(String text) {
            this.text = text;
        }

        Value value(int depth) {
            if (depth > MAX_DEPTH) {
                throw error("arrays and objects are nested more than " + MAX_DEPTH + " deep");
            }
            if (pos >= text.length()) {
                throw error("expected a JSON value but found the end of the input");
            }
            char c = text.charAt(pos);
            if (c == '{') {
                return object(depth);
            } else if (c == '[') {
                return array(depth);
            } else if (c == '"') {
                return new Str(string());
            } else if (c == '-' || (c >= '0' && c <= '9')) {
                return number();
            }
            for (String word : List.of("true", "false", "null")) {
                if (text.startsWith(word, pos)) {
                    pos += word.length();
                    return word.equals("null") ? new Null() : new Bool(word.equals("true"));
                }
            }
            throw error("expected a JSON value");
        }

        private Obj object(int depth) {
            pos++;
            Map<String, Value> members = new LinkedHashMap<>();
            whitespace();
            if (take('}')) {
                return new Obj(members);
            }
            do {
                whitespace();
                if (pos >= text.length() || text.charAt(pos) != '"') {
                    throw error("expected a member name in double quotes");
                }
                int at = pos;
                String name = string();
                whitespace();
                expect(':');
                whitespace();
                if (members.put(name, value(depth + 1)) != null) {
                    pos = at;
                    throw error("the member name \"" + Escaping.printable(name) + "\" is repeated");
                }
                whitespace();
            } while (take(','));
            expect('}');
            return new Obj(members);
        }

        private Arr array(int depth) {
            pos++;
            List<Value> elements = new ArrayList<>();
            whitespace();
            if (take(']')) {
                return new Arr(elements);
            }
            do {
                whitespace();
                elements.add(value(depth + 1));
                whitespace();
            } while (take(','));
            expect(']');
            return new Arr(elements);
        }

        private String string() {
            pos++;
            StringBuilder s = new StringBuilder();
            while (true) {
                if (pos >= text.length()) {
                    throw error("the string is not closed");
                }
                char c = text.charAt(pos++);
                if (c == '"') {
                    break;
                } else if (c < 0x20) {
                    pos--;
                    throw error("a control character must be escaped inside a string");
                } else if (c != '\\') {
                    s.append(c);
                } else if (pos >= text.length()) {
                    throw error("the string is not closed");
                } else {
                    char e = text.charAt(pos++);
                    switch (e) {
                        case '"', '\\', '/' -> s.append(e);
                        case 'b' -> s.append('\b');
                        case 'f' -> s.append('\f');
                        case 'n' -> s.append('\n');
                        case 'r' -> s.append('\r');
                        case 't' -> s.append('\t');
                        case 'u' -> s.append(hex4());
                        default -> {
                            pos--;
                            throw error("unknown escape \\" + Escaping.printable(String.valueOf(e)));
                        }
                    }
                }
            }
            for (int i = 0; i < s.length(); i++) {
                char c = s.charAt(i);
                if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                    i++;
                } else if (Character.isSurrogate(c)) {
                    throw error("the string holds an unpaired surrogate");
                }
            }
            return s.toString();
        }

        private char hex4() {
            if (pos + 4 > text.length() || !text.substring(pos, pos + 4).matches("[0-9a-fA-F]{4}")) {
                throw error("\\u must be followed by four hex digits");
            }
            pos += 4;
            return (char) Integer.parseInt(text.substring(pos - 4, pos), 16);
        }

        private Value number() {
            int start = pos;
            take('-');
            if (!take('0')) {
                digits();
            }
            boolean integer = true;
            if (take('.')) {
                digits();
                integer = false;
            }
            if (pos < text.length() && (text.charAt(pos) == 'e' || text.charAt(pos) == 'E')) {
                pos++;
                if (!take('+')) {
                    take('-');
                }
                digits();
                integer = false;
            }
            String t = text.substring(start, pos);
            if (integer && !t.equals("-0") && t.length() <= 19) {
                try {
                    return new Int(Long.parseLong(t));
                } catch (NumberFormatException e) {
                    // beyond a long: kept as text, refused wherever an integer is expected
                }
            }
            return new Num(t);
        }

        private void digits() {
            int start = pos;
            while (pos < text.length() && text.charAt(pos) >= '0' && text.charAt(pos) <= '9') {
                pos++;
            }
            if (pos == start) {
                throw error("expected a digit");
            }
        }

        void whitespace() {
            while (pos < text.length() && (text.charAt(pos) == ' ' || text.charAt(pos) == '\n' || text.charAt(pos) == '\r'
                    || text.charAt(pos) == '\t')) {
                pos++;
            }
        }

        private boolean take(char c) {
            if (pos < text.length() && text.charAt(pos) == c) {
                pos++;
                return true;
            }
            return false;
        }

        private void expect(char c) {
            if (!take(c)) {
                throw error("expected '" + c + "'");
            }
        }

        Malformed error(String detail) {
            int line = 1;
            int column = 1;
            for (int i = 0; i < pos && i < text.length(); i++) {
                line += text.charAt(i) == '\n' ? 1 : 0;
                column = text.charAt(i) == '\n' ? 1 : column + 1;
            }
            String found = pos >= text.length() ? "the end of the input" : "'" + Escaping.printable(String.valueOf(text.charAt(pos))) + "'";
            return new Malformed("line " + line + ", column " + column + ": " + detail + " (found " + found + ")");
        }
    }

    /**
     * The canonical text of a value: members in file order, two-space indentation, an array that
     * holds no array or object on one line with ", " between items, strings with exactly the RFC 8259
     * escapes for '"', '\' and U+0000..U+001F (backslash-b, -f, -n, -r, -t, else backslash-u and four hex digits), numbers as written.
     */
    static String canonical(Value v) {
        StringBuilder out = new StringBuilder();
        write(v, 0, out);
        return out.toString();
    }

    private static void write(Value value, int level, StringBuilder out) {
        if (value instanceof Obj o) {
            if (o.members().isEmpty()) {
                out.append("{}");
                return;
            }
            out.append("{\n");
            int i = 0;
            for (Map.Entry<String, Value> m : o.members().entrySet()) {
                out.append("  ".repeat(level + 1));
                quote(m.getKey(), out);
                out.append(": ");
                write(m.getValue(), level + 1, out);
                out.append(++i < o.members().size() ? ",\n" : "\n");
            }
            out.append("  ".repeat(level)).append('}');
        } else if (value instanceof Arr a) {
            boolean flat = a.elements().stream().noneMatch(e -> e instanceof Obj || e instanceof Arr);
            out.append(flat ? "[" : "[\n");
            for (int i = 0; i < a.size(); i++) {
                if (!flat) {
                    out.append("  ".repeat(level + 1));
                }
                write(a.get(i), level + 1, out);
                out.append(i + 1 == a.size() ? "" : flat ? ", " : ",\n");
            }
            out.append(flat ? "]" : "\n" + "  ".repeat(level) + "]");
        } else if (value instanceof Str s) {
            quote(s.value(), out);
        } else if (value instanceof Int n) {
            out.append(n.value());
        } else if (value instanceof Num n) {
            out.append(n.text());
        } else if (value instanceof Bool b) {
            out.append(b.value());
        } else {
            out.append("null");
        }
    }

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
                default -> out.append(c < 0x20 ? String.format("\\u%04x", (int) c) : String.valueOf(c));
            }
        }
        out.append('"');
    }
}
