package org.chirocore.io;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;

/**
 * A strict recursive-descent parser for RFC 8259 JSON. Recursion depth is bounded by
 * {@link #MAX_DEPTH}, so hostile input cannot overflow the stack; positions are computed only
 * when an error is reported.
 */
final class JsonParser {
    /** Deepest nesting of arrays and objects accepted. */
    static final int MAX_DEPTH = 512;
    /** Longest number literal accepted; far beyond any real integer, short enough to convert quickly. */
    static final int MAX_NUMBER_LENGTH = 10_000;

    private static final Json.Bool TRUE = new Json.Bool(true);
    private static final Json.Bool FALSE = new Json.Bool(false);

    private final String text;
    private int pos;
    private int depth;

    private JsonParser(String text) {
        this.text = text;
    }

    static Json parse(String text) {
        JsonParser p = new JsonParser(text);
        p.skipWhitespace();
        Json value = p.value();
        p.skipWhitespace();
        if (p.pos < text.length()) {
            throw p.error("expected the end of the input after the JSON value but found " + p.found());
        }
        return value;
    }

    /** Strict UTF-8 decoding: malformed bytes are an error, never a replacement character. */
    static String decodeUtf8(byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        // UTF-8 never decodes to more UTF-16 units than it has bytes.
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        String decoded = out.flip().toString();
        if (result.isError()) {
            throw new JsonParser(decoded).errorAt(decoded.length(), "the input is not valid UTF-8 (byte offset "
                    + in.position() + ")");
        }
        return decoded.startsWith("\uFEFF") ? decoded.substring(1) : decoded;
    }

    private Json value() {
        if (pos >= text.length()) {
            throw error("expected a JSON value but found the end of the input");
        }
        return switch (text.charAt(pos)) {
            case '{' -> object();
            case '[' -> array();
            case '"' -> new Json.Str(string());
            case 't' -> literal("true", TRUE);
            case 'f' -> literal("false", FALSE);
            case 'n' -> literal("null", Json.NULL);
            case '-', '0', '1', '2', '3', '4', '5', '6', '7', '8', '9' -> number();
            default -> throw error("expected a JSON value but found " + found());
        };
    }

    private Json.Obj object() {
        enter();
        pos++;
        LinkedHashMap<String, Json> members = new LinkedHashMap<>();
        skipWhitespace();
        if (at('}')) {
            pos++;
            depth--;
            return new Json.Obj(members);
        }
        String expectedKey = "a string key or '}'";
        while (true) {
            if (!at('"')) {
                throw error("expected " + expectedKey + " but found " + found());
            }
            int keyStart = pos;
            String key = string();
            if (members.containsKey(key)) {
                throw errorAt(keyStart, "duplicate key \"" + key + "\" in an object");
            }
            skipWhitespace();
            expect(':', "after the key \"" + key + "\"");
            skipWhitespace();
            members.put(key, value());
            skipWhitespace();
            if (at('}')) {
                pos++;
                depth--;
                return new Json.Obj(members);
            }
            expect(',', "or '}'");
            skipWhitespace();
            expectedKey = "a string key after ','";
        }
    }

    private Json.Arr array() {
        enter();
        pos++;
        List<Json> elements = new ArrayList<>();
        skipWhitespace();
        if (at(']')) {
            pos++;
            depth--;
            return new Json.Arr(elements);
        }
        while (true) {
            if (at(']')) {
                throw error("expected a JSON value after ',' but found ']'");
            }
            elements.add(value());
            skipWhitespace();
            if (at(']')) {
                pos++;
                depth--;
                return new Json.Arr(elements);
            }
            expect(',', "or ']'");
            skipWhitespace();
        }
    }

    private void enter() {
        if (++depth > MAX_DEPTH) {
            throw error("arrays and objects are nested more than " + MAX_DEPTH + " deep");
        }
    }

    /** Reads a string starting at the opening quote; leaves {@code pos} after the closing quote. */
    private String string() {
        int open = pos++;
        StringBuilder sb = new StringBuilder();
        while (true) {
            if (pos >= text.length()) {
                throw error("expected '\"' to close the string opened at " + position(open)
                        + " but found the end of the input");
            }
            char c = text.charAt(pos);
            if (c == '"') {
                pos++;
                return sb.toString();
            } else if (c == '\\') {
                pos++;
                escape(sb);
            } else if (c < 0x20) {
                throw error(String.format("the control character U+%04X must be escaped in a string", (int) c));
            } else if (Character.isHighSurrogate(c) && pos + 1 < text.length()
                    && Character.isLowSurrogate(text.charAt(pos + 1))) {
                sb.append(c).append(text.charAt(pos + 1));
                pos += 2;
            } else if (Character.isSurrogate(c)) {
                throw error(String.format("the unpaired surrogate U+%04X cannot appear in a string", (int) c));
            } else {
                sb.append(c);
                pos++;
            }
        }
    }

    /** Reads an escape after its backslash. */
    private void escape(StringBuilder sb) {
        if (pos >= text.length()) {
            throw error("expected an escape character after '\\' but found the end of the input");
        }
        char c = text.charAt(pos);
        switch (c) {
            case '"', '\\', '/' -> sb.append(c);
            case 'b' -> sb.append('\b');
            case 'f' -> sb.append('\f');
            case 'n' -> sb.append('\n');
            case 'r' -> sb.append('\r');
            case 't' -> sb.append('\t');
            case 'u' -> {
                int escapeStart = pos - 1;
                char unit = hex4();
                if (Character.isHighSurrogate(unit) && text.startsWith("\\u", pos + 1)) {
                    pos += 2;
                    char low = hex4();
                    if (!Character.isLowSurrogate(low)) {
                        throw errorAt(escapeStart, String.format(
                                "the escape \\u%04X is a high surrogate not followed by a low surrogate", (int) unit));
                    }
                    sb.append(unit).append(low);
                } else if (Character.isSurrogate(unit)) {
                    throw errorAt(escapeStart, String.format("the escape \\u%04X is an unpaired surrogate", (int) unit));
                } else {
                    sb.append(unit);
                }
            }
            default -> throw error("expected one of \" \\ / b f n r t u after '\\' but found " + found());
        }
        pos++;
    }

    /** Reads the 4 hex digits after the 'u' at {@code pos}; leaves {@code pos} on the last digit. */
    private char hex4() {
        int value = 0;
        for (int i = 0; i < 4; i++) {
            pos++;
            int digit = pos < text.length() ? Character.digit(text.charAt(pos), 16) : -1;
            if (digit < 0) {
                throw error("expected 4 hexadecimal digits after '\\u' but found " + found());
            }
            value = value * 16 + digit;
        }
        return (char) value;
    }

    private Json.Num number() {
        int start = pos;
        if (at('-')) {
            pos++;
        }
        if (at('0')) {
            pos++;
            if (pos < text.length() && isDigit(text.charAt(pos))) {
                throw error("a number cannot have a leading zero");
            }
        } else {
            digits("a digit");
        }
        if (at('.')) {
            pos++;
            digits("a digit after '.'");
        }
        if (at('e') || at('E')) {
            pos++;
            if (at('+') || at('-')) {
                pos++;
            }
            digits("a digit in the exponent");
        }
        if (pos - start > MAX_NUMBER_LENGTH) {
            throw errorAt(start, "a number of " + (pos - start) + " characters exceeds the limit of "
                    + MAX_NUMBER_LENGTH);
        }
        return new Json.Num(text.substring(start, pos));
    }

    private void digits(String expected) {
        if (pos >= text.length() || !isDigit(text.charAt(pos))) {
            throw error("expected " + expected + " but found " + found());
        }
        while (pos < text.length() && isDigit(text.charAt(pos))) {
            pos++;
        }
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private Json literal(String word, Json value) {
        for (int i = 0; i < word.length(); i++, pos++) {
            if (!at(word.charAt(i))) {
                throw error("expected '" + word + "' but found " + found());
            }
        }
        return value;
    }

    private void skipWhitespace() {
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (c != ' ' && c != '\t' && c != '\n' && c != '\r') {
                return;
            }
            pos++;
        }
    }

    private boolean at(char c) {
        return pos < text.length() && text.charAt(pos) == c;
    }

    private void expect(char c, String context) {
        if (!at(c)) {
            throw error("expected '" + c + "' " + context + " but found " + found());
        }
        pos++;
    }

    /** The character at {@code pos}, quoted, or "the end of the input". */
    private String found() {
        if (pos >= text.length()) {
            return "the end of the input";
        }
        int cp = text.codePointAt(pos);
        if (cp < 0x20 || cp == 0x7F || Character.isWhitespace(cp) || Character.isSurrogate((char) cp)) {
            return String.format("U+%04X", cp);
        }
        return "'" + new String(Character.toChars(cp)) + "'";
    }

    private JsonFormatException error(String detail) {
        return errorAt(pos, detail);
    }

    private JsonFormatException errorAt(int offset, String detail) {
        int[] lc = lineAndColumn(offset);
        return new JsonFormatException(lc[0], lc[1], detail);
    }

    private String position(int offset) {
        int[] lc = lineAndColumn(offset);
        return "line " + lc[0] + ", column " + lc[1];
    }

    /** Line and column (1-based, columns in code points) of {@code offset}; CR LF counts as one break. */
    private int[] lineAndColumn(int offset) {
        int line = 1;
        int column = 1;
        int i = 0;
        while (i < offset && i < text.length()) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'))) {
                line++;
                column = 1;
            } else if (c != '\r') {
                column++;
            }
            i += Character.charCount(text.codePointAt(i));
        }
        return new int[] {line, column};
    }
}
