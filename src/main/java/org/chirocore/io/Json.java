package org.chirocore.io;

import java.math.BigInteger;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * An immutable JSON value (RFC 8259): object, array, string, number, boolean or null.
 *
 * <p>{@link #parse(String)} is strict: no comments, no trailing commas, no duplicate keys, no
 * unpaired surrogates, nesting at most {@value JsonParser#MAX_DEPTH} deep. Numbers keep their
 * exact text, so integers of any size survive unchanged and are never routed through
 * {@code double}. {@link #toText()} is deterministic: equal values give identical text.
 *
 * <p>The {@code as…} accessors take a description of the value ("field \"rank\"",
 * "bases[3]") and throw a {@link JsonValueException} that names it when the value has the wrong
 * type or range, so readers of file formats get precise messages for free.
 */
public sealed interface Json permits Json.Obj, Json.Arr, Json.Str, Json.Num, Json.Bool, Json.Null {

    /** The JSON {@code null}. */
    Null NULL = new Null();

    /**
     * Parses one JSON text. Cost: linear in the length of the text.
     *
     * @throws JsonFormatException with line and column when the text is not valid JSON
     */
    static Json parse(String text) {
        return JsonParser.parse(text);
    }

    /**
     * Parses one JSON text encoded in UTF-8; a leading byte order mark is ignored (RFC 8259 §8.1).
     *
     * @throws JsonFormatException when the bytes are not valid UTF-8 or not valid JSON
     */
    static Json parseUtf8(byte[] utf8) {
        return JsonParser.parse(JsonParser.decodeUtf8(utf8));
    }

    /**
     * The value as pretty-printed JSON text, without a final newline: objects and arrays open one
     * member per line with a 2-space indent, except that an array holding no object or array is
     * written on one line ({@code [0, 3, 5]}). Members keep their insertion order. Cost: linear
     * in the output size.
     */
    default String toText() {
        return JsonWriter.write(this);
    }

    /** The kind of value with its article, for messages: "an object", "a string", "null", …. */
    String kind();

    /**
     * This value as an object.
     *
     * @param what the value's name in messages, e.g. {@code field "matrix"}
     * @throws JsonValueException when it is not an object
     */
    default Obj asObject(String what) {
        if (this instanceof Obj o) {
            return o;
        }
        throw wrongKind(what, "an object");
    }

    /** This value as an array; {@code what} as in {@link #asObject}. */
    default Arr asArray(String what) {
        if (this instanceof Arr a) {
            return a;
        }
        throw wrongKind(what, "an array");
    }

    /** This value as a string; {@code what} as in {@link #asObject}. */
    default String asString(String what) {
        if (this instanceof Str s) {
            return s.value();
        }
        throw wrongKind(what, "a string");
    }

    /** This value as a boolean; {@code what} as in {@link #asObject}. */
    default boolean asBoolean(String what) {
        if (this instanceof Bool b) {
            return b.value();
        }
        throw wrongKind(what, "a boolean");
    }

    /**
     * This value as an exact integer of any size. Only numbers written without fraction or
     * exponent count as integers ({@code 3}, not {@code 3.0} or {@code 3e0}), which also keeps
     * {@code 1e999999999} from being expanded.
     *
     * @throws JsonValueException when it is not such a number
     */
    default BigInteger asBigInteger(String what) {
        if (this instanceof Num n && n.isInteger()) {
            return new BigInteger(n.text());
        }
        throw wrongKind(what, "an integer");
    }

    /** This value as a long; {@code what} as in {@link #asObject}; out-of-range values are rejected, never wrapped. */
    default long asLong(String what) {
        return asIntegerIn(what, Long.MIN_VALUE, Long.MAX_VALUE);
    }

    /** This value as an int; {@code what} as in {@link #asObject}; out-of-range values are rejected, never wrapped. */
    default int asInt(String what) {
        return (int) asIntegerIn(what, Integer.MIN_VALUE, Integer.MAX_VALUE);
    }

    private long asIntegerIn(String what, long min, long max) {
        BigInteger v = asBigInteger(what);
        if (v.bitLength() >= 64 || v.longValue() < min || v.longValue() > max) {
            throw new JsonValueException(what + " must be an integer between " + min + " and " + max + ", found "
                    + Num.abbreviate(((Num) this).text()));
        }
        return v.longValue();
    }

    private JsonValueException wrongKind(String what, String expected) {
        String found = this instanceof Num n ? Num.abbreviate(n.text()) : kind();
        return new JsonValueException(what + " must be " + expected + ", found " + found);
    }

    /**
     * A JSON object: members in insertion order, names unique (the parser rejects duplicates).
     * Equality ignores member order, as RFC 8259 does; the written text keeps it.
     */
    record Obj(Map<String, Json> members) implements Json {
        public Obj {
            LinkedHashMap<String, Json> copy = new LinkedHashMap<>();
            members.forEach((name, value) -> {
                Str.checkEncodable(Objects.requireNonNull(name, "A member name is null."));
                copy.put(name, Objects.requireNonNull(value, () -> "Member \"" + name + "\" is null; use Json.NULL."));
            });
            members = Collections.unmodifiableMap(copy);
        }

        /** A builder that keeps insertion order and rejects a repeated name. */
        public static Builder builder() {
            return new Builder();
        }

        @Override
        public String kind() {
            return "an object";
        }

        /** Whether a member of this name exists. */
        public boolean has(String name) {
            return members.containsKey(name);
        }

        /** The member of this name, if any. */
        public Optional<Json> find(String name) {
            return Optional.ofNullable(members.get(name));
        }

        /**
         * The member of this name.
         *
         * @throws JsonValueException {@code field "name" is missing}
         */
        public Json require(String name) {
            Json v = members.get(name);
            if (v == null) {
                throw new JsonValueException(describe(name) + " is missing");
            }
            return v;
        }

        /** The member as an int, with messages such as {@code field "rank" must be an integer, found a string}. */
        public int requireInt(String name) {
            return require(name).asInt(describe(name));
        }

        /** The member as a long; messages as {@link #requireInt}. */
        public long requireLong(String name) {
            return require(name).asLong(describe(name));
        }

        /** The member as a string; messages as {@link #requireInt}. */
        public String requireString(String name) {
            return require(name).asString(describe(name));
        }

        /** The member as a boolean; messages as {@link #requireInt}. */
        public boolean requireBoolean(String name) {
            return require(name).asBoolean(describe(name));
        }

        /** The member as an array; messages as {@link #requireInt}. */
        public Arr requireArray(String name) {
            return require(name).asArray(describe(name));
        }

        /** The member as an object; messages as {@link #requireInt}. */
        public Obj requireObject(String name) {
            return require(name).asObject(describe(name));
        }

        /**
         * Rejects members not in {@code known}, so a misspelt optional field is reported instead
         * of silently ignored.
         *
         * @throws JsonValueException naming the first unknown member and the known ones
         */
        public void requireOnly(Collection<String> known) {
            for (String name : members.keySet()) {
                if (!known.contains(name)) {
                    throw new JsonValueException("unknown " + describe(name) + "; the known fields are "
                            + known.stream().map(Str::quote).collect(Collectors.joining(", ")));
                }
            }
        }

        /** How a member is named in messages: {@code field "name"}. */
        static String describe(String name) {
            return "field " + Str.quote(name);
        }

        /** Collects members in order; {@link #build()} may be called once per wanted object. */
        public static final class Builder {
            private final LinkedHashMap<String, Json> members = new LinkedHashMap<>();

            private Builder() {
            }

            /**
             * Adds a member.
             *
             * @throws IllegalArgumentException when the name was already added
             */
            public Builder put(String name, Json value) {
                if (members.putIfAbsent(name, Objects.requireNonNull(value)) != null) {
                    throw new IllegalArgumentException("The member " + Str.quote(name) + " was added twice.");
                }
                return this;
            }

            /** Adds an integer member. */
            public Builder put(String name, long value) {
                return put(name, Num.of(value));
            }

            /** Adds a string member. */
            public Builder put(String name, String value) {
                return put(name, new Str(value));
            }

            /** Adds a boolean member. */
            public Builder put(String name, boolean value) {
                return put(name, new Bool(value));
            }

            /** The object holding the members added so far. */
            public Obj build() {
                return new Obj(members);
            }
        }
    }

    /** A JSON array. */
    record Arr(List<Json> elements) implements Json {
        public Arr {
            elements = List.copyOf(elements);
        }

        /** The array of the given integers, e.g. a basis. */
        public static Arr ofInts(int[] values) {
            Json[] out = new Json[values.length];
            for (int i = 0; i < values.length; i++) {
                out[i] = Num.of(values[i]);
            }
            return new Arr(List.of(out));
        }

        /** The array of the given strings, e.g. element labels. */
        public static Arr ofStrings(List<String> values) {
            return new Arr(values.stream().<Json>map(Str::new).toList());
        }

        @Override
        public String kind() {
            return "an array";
        }

        /** The number of elements. */
        public int size() {
            return elements.size();
        }

        /** Element {@code i}. */
        public Json get(int i) {
            return elements.get(i);
        }
    }

    /** A JSON string; it never holds an unpaired surrogate, so it always encodes to UTF-8. */
    record Str(String value) implements Json {
        public Str {
            checkEncodable(value);
        }

        @Override
        public String kind() {
            return "a string";
        }

        /** {@code s} in double quotes, for messages. */
        static String quote(String s) {
            return "\"" + s + "\"";
        }

        static void checkEncodable(String s) {
            for (int i = 0; i < s.length(); i++) {
                char c = s.charAt(i);
                if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                    i++;
                } else if (Character.isSurrogate(c)) {
                    throw new IllegalArgumentException(String.format(
                            "A JSON string cannot hold the unpaired surrogate U+%04X (at index %d).", (int) c, i));
                }
            }
        }
    }

    /**
     * A JSON number, kept as its exact text (so {@code 1.0} and {@code 1} differ, and
     * integers of any size are exact).
     *
     * @param text a number in RFC 8259 syntax
     */
    record Num(String text) implements Json {
        private static final Pattern SYNTAX = Pattern.compile("-?(0|[1-9][0-9]*)(\\.[0-9]+)?([eE][+-]?[0-9]+)?");
        private static final Pattern INTEGER = Pattern.compile("-?(0|[1-9][0-9]*)");

        public Num {
            if (!SYNTAX.matcher(text).matches()) {
                throw new IllegalArgumentException("\"" + abbreviate(text) + "\" is not a JSON number.");
            }
        }

        /** The number with the value {@code v}. */
        public static Num of(long v) {
            return new Num(Long.toString(v));
        }

        /** The number with the value {@code v}, exactly. */
        public static Num of(BigInteger v) {
            return new Num(v.toString());
        }

        /** Whether the number is written as an integer: no fraction, no exponent. */
        public boolean isInteger() {
            return INTEGER.matcher(text).matches();
        }

        @Override
        public String kind() {
            return "a number";
        }

        /** Long numbers shortened for messages, so a megabyte of digits does not end up in a log. */
        static String abbreviate(String text) {
            return text.length() <= 40 ? text : text.substring(0, 20) + "… (" + text.length() + " characters)";
        }
    }

    /** A JSON boolean. */
    record Bool(boolean value) implements Json {
        @Override
        public String kind() {
            return "a boolean";
        }
    }

    /** The JSON null; use {@link Json#NULL}. */
    record Null() implements Json {
        @Override
        public String kind() {
            return "null";
        }
    }
}
