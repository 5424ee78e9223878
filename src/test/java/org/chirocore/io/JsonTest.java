package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class JsonTest {

    private static JsonFormatException parseError(String text) {
        return assertThrows(JsonFormatException.class, () -> Json.parse(text));
    }

    @Test
    void parsesEveryKindOfValue() {
        Json v = Json.parse(" {\"a\": [1, -2.5e+3, true, false, null], \"b\": {\"c\": \"x\\u00e9\\n\"}} ");
        Json expected = Json.Obj.builder()
                .put("a", new Json.Arr(List.of(Json.Num.of(1), new Json.Num("-2.5e+3"), new Json.Bool(true),
                        new Json.Bool(false), Json.NULL)))
                .put("b", Json.Obj.builder().put("c", "xé\n").build())
                .build();
        assertEquals(expected, v);
    }

    @ParameterizedTest
    @ValueSource(strings = {"0", "-0", "12", "3.25", "1e5", "1E-5", "-0.5e+10", "\"\"", "true", "null", "[]", "{}",
        "\"\\ud83d\\ude00 \\\" \\\\ \\/ \\b\\f\\n\\r\\t\"", "[[[]], {\"\": {}}]", "\"ünïcødé 😀\""})
    void roundTripsThroughText(String text) {
        Json v = Json.parse(text);
        assertEquals(v, Json.parse(v.toText()));
    }

    /** Fixed seed: random nested values survive write-then-parse unchanged. */
    @Test
    void randomValuesRoundTrip() {
        Random random = new Random(20240611L);
        for (int i = 0; i < 200; i++) {
            Json v = randomValue(random, 4);
            assertEquals(v, Json.parse(v.toText()), v.toText());
        }
    }

    private static Json randomValue(Random random, int depth) {
        int kind = random.nextInt(depth == 0 ? 4 : 6);
        switch (kind) {
            case 0:
                return Json.Num.of(BigInteger.valueOf(random.nextLong()).pow(1 + random.nextInt(3)));
            case 1:
                StringBuilder sb = new StringBuilder();
                for (int k = random.nextInt(6); k > 0; k--) {
                    sb.append((char) random.nextInt(0xD000));
                }
                return new Json.Str(sb.toString());
            case 2:
                return new Json.Bool(random.nextBoolean());
            case 3:
                return Json.NULL;
            case 4:
                Json.Obj.Builder b = Json.Obj.builder();
                for (int k = random.nextInt(4); k > 0; k--) {
                    b.put("k" + k, randomValue(random, depth - 1));
                }
                return b.build();
            default:
                Json[] elements = new Json[random.nextInt(4)];
                for (int k = 0; k < elements.length; k++) {
                    elements[k] = randomValue(random, depth - 1);
                }
                return new Json.Arr(List.of(elements));
        }
    }

    @Test
    void bigIntegersAreExact() {
        String huge = "-123456789012345678901234567890123456789012345678901234567890";
        Json v = Json.parse("[" + huge + ", 9007199254740993]");
        Json.Arr a = v.asArray("the value");
        assertEquals(new BigInteger(huge), a.get(0).asBigInteger("x"));
        // 2^53 + 1 is the first integer a double cannot hold.
        assertEquals(9007199254740993L, a.get(1).asLong("x"));
        assertEquals("[" + huge + ", 9007199254740993]", v.toText());
    }

    @Test
    void writerIsPrettyAndKeepsNumberArraysOnOneLine() {
        Json v = Json.parse("{\"rank\":3,\"bases\":[[0,1,2],[0,1,3]],\"labels\":[\"a\",\"b\"],\"e\":{},\"f\":[]}");
        String expected = """
                {
                  "rank": 3,
                  "bases": [
                    [0, 1, 2],
                    [0, 1, 3]
                  ],
                  "labels": ["a", "b"],
                  "e": {},
                  "f": []
                }""";
        assertEquals(expected, v.toText());
    }

    @Test
    void writerIsDeterministic() {
        String text = "{\"z\": 1, \"a\": [1, 2, {\"q\": null}], \"m\": \"\\u0001\"}";
        byte[] first = Json.parse(text).toText().getBytes(StandardCharsets.UTF_8);
        byte[] second = Json.parse(text).toText().getBytes(StandardCharsets.UTF_8);
        assertEquals(new String(first, StandardCharsets.UTF_8), new String(second, StandardCharsets.UTF_8));
        assertEquals("{\n  \"z\": 1,\n  \"a\": [\n    1,\n    2,\n    {\n      \"q\": null\n    }\n  ],\n"
                + "  \"m\": \"\\u0001\"\n}", Json.parse(text).toText());
    }

    @Test
    void objectEqualityIgnoresMemberOrderButTextKeepsIt() {
        Json ab = Json.parse("{\"a\": 1, \"b\": 2}");
        Json ba = Json.parse("{\"b\": 2, \"a\": 1}");
        assertEquals(ab, ba);
        assertNotEquals(ab.toText(), ba.toText());
    }

    @Test
    void numbersKeepTheirSpelling() {
        assertNotEquals(Json.parse("1"), Json.parse("1.0"));
        assertEquals("1.0", Json.parse("1.0").toText());
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        "``| line 1, column 1: expected a JSON value but found the end of the input",
        "`[1, 2}`| line 1, column 6: expected ',' or ']' but found '}'",
        "`{\"a\": 1,}`| line 1, column 9: expected a string key after ',' but found '}'",
        "`[1,]`| line 1, column 4: expected a JSON value after ',' but found ']'",
        "`{a: 1}`| line 1, column 2: expected a string key or '}' but found 'a'",
        "`{\"a\" 1}`| line 1, column 6: expected ':' after the key \"a\" but found '1'",
        "`{\"rank\": 3, \"rank\": 4}`| line 1, column 13: duplicate key \"rank\" in an object",
        "`[01]`| line 1, column 3: a number cannot have a leading zero",
        "`[1.]`| line 1, column 4: expected a digit after '.' but found ']'",
        "`-`| line 1, column 2: expected a digit but found the end of the input",
        "`+1`| line 1, column 1: expected a JSON value but found '+'",
        "`.5`| line 1, column 1: expected a JSON value but found '.'",
        "`1e`| line 1, column 3: expected a digit in the exponent but found the end of the input",
        "`tru`| line 1, column 4: expected 'true' but found the end of the input",
        "`nul1`| line 1, column 4: expected 'null' but found '1'",
        "`NaN`| line 1, column 1: expected a JSON value but found 'N'",
        "`[1] [2]`| line 1, column 5: expected the end of the input after the JSON value but found '['",
        "`// c`| line 1, column 1: expected a JSON value but found '/'",
        "`\"abc`| line 1, column 5: expected '\"' to close the string opened at line 1, column 1 but found the end of the input",
        "`\"a\\x\"`| line 1, column 4: expected one of \" \\ / b f n r t u after '\\' but found 'x'",
        "`\"\\u12g4\"`| line 1, column 6: expected 4 hexadecimal digits after '\\u' but found 'g'",
        "`\"\\ud800\"`| line 1, column 2: the escape \\uD800 is an unpaired surrogate",
        "`\"\\ud800\\u0041\"`| line 1, column 2: the escape \\uD800 is a high surrogate not followed by a low surrogate",
        "`\"\\udc00\"`| line 1, column 2: the escape \\uDC00 is an unpaired surrogate",
    })
    void malformedJsonIsReportedWithPosition(String text, String message) {
        assertEquals(message, parseError(text).getMessage());
    }

    @Test
    void errorPositionCountsLines() {
        assertEquals("line 3, column 7: expected ',' or ']' but found '}'",
                parseError("{\n  \"a\": [1,\n    2 }").getMessage());
    }

    @Test
    void rawControlCharacterInStringIsRejected() {
        JsonFormatException e = parseError("[\"a\tb\"]");
        assertEquals("line 1, column 4: the control character U+0009 must be escaped in a string", e.getMessage());
        assertEquals(1, e.line());
        assertEquals(4, e.column());
    }

    @Test
    void truncatedDocumentIsReported() {
        String full = Json.parse("{\"rank\": 3, \"bases\": [[0, 1, 2], [0, 1, 3]]}").toText();
        String truncated = full.substring(0, full.indexOf("[0, 1, 3") + 4);
        assertEquals("line 5, column 9: expected a JSON value but found the end of the input",
                parseError(truncated).getMessage());
    }

    @Test
    void columnsCountCodePointsAndCrLfIsOneLineBreak() {
        assertEquals("line 2, column 5: expected ',' or ']' but found 'x'", parseError("[\r\n\"😀\" x]").getMessage());
        assertEquals("line 3, column 1: expected ',' or ']' but found 'x'", parseError("[1\r\rx]").getMessage());
    }

    @Test
    void nestingIsLimited() {
        String ok = "[".repeat(JsonParser.MAX_DEPTH) + "]".repeat(JsonParser.MAX_DEPTH);
        assertEquals(Json.parse(ok), Json.parse(Json.parse(ok).toText()));
        String deep = "[{\"a\":".repeat(100_000);
        assertEquals("line 1, column 1537: arrays and objects are nested more than 512 deep",
                parseError(deep).getMessage());
    }

    @Test
    void absurdlyLongNumberIsRejected() {
        String digits = "9".repeat(JsonParser.MAX_NUMBER_LENGTH + 1);
        assertEquals("line 1, column 2: a number of 10001 characters exceeds the limit of 10000",
                parseError("[" + digits + "]").getMessage());
    }

    @Test
    void invalidUtf8IsRejectedAndBomIgnored() {
        byte[] bad = {'[', '1', ',', '\n', ' ', (byte) 0xC3, ']'};
        assertEquals("line 2, column 2: the input is not valid UTF-8 (byte offset 5)",
                assertThrows(JsonFormatException.class, () -> Json.parseUtf8(bad)).getMessage());
        byte[] bom = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF, '[', ']'};
        assertEquals(new Json.Arr(List.of()), Json.parseUtf8(bom));
    }

    @Test
    void accessorsNameTheFieldAndTheProblem() {
        Json.Obj o = Json.parse("{\"rank\": \"3\", \"n\": 2.0, \"big\": 12345678901234567890, \"e\": 1e2, \"ok\": 7}")
                .asObject("the value");
        assertEquals("field \"rank\" must be an integer, found a string",
                assertThrows(JsonValueException.class, () -> o.requireInt("rank")).getMessage());
        assertEquals("field \"size\" is missing",
                assertThrows(JsonValueException.class, () -> o.requireInt("size")).getMessage());
        assertEquals("field \"n\" must be an integer, found 2.0",
                assertThrows(JsonValueException.class, () -> o.requireLong("n")).getMessage());
        assertEquals("field \"e\" must be an integer, found 1e2",
                assertThrows(JsonValueException.class, () -> o.requireInt("e")).getMessage());
        assertEquals("field \"big\" must be an integer between -2147483648 and 2147483647, found 12345678901234567890",
                assertThrows(JsonValueException.class, () -> o.requireInt("big")).getMessage());
        assertEquals("field \"big\" must be an integer between -9223372036854775808 and 9223372036854775807, "
                        + "found 12345678901234567890",
                assertThrows(JsonValueException.class, () -> o.requireLong("big")).getMessage());
        assertEquals("field \"ok\" must be a string, found 7",
                assertThrows(JsonValueException.class, () -> o.requireString("ok")).getMessage());
        assertEquals("field \"ok\" must be an array, found 7",
                assertThrows(JsonValueException.class, () -> o.requireArray("ok")).getMessage());
        assertEquals("field \"rank\" must be an object, found a string",
                assertThrows(JsonValueException.class, () -> o.requireObject("rank")).getMessage());
        assertEquals("field \"rank\" must be a boolean, found a string",
                assertThrows(JsonValueException.class, () -> o.requireBoolean("rank")).getMessage());
        assertEquals(7, o.requireInt("ok"));
        assertEquals("unknown field \"n\"; the known fields are \"rank\", \"ok\"",
                assertThrows(JsonValueException.class, () -> o.requireOnly(List.of("rank", "ok"))).getMessage());
    }

    @Test
    void hugeNumbersAreAbbreviatedInMessages() {
        Json v = Json.parse("9".repeat(5000));
        assertEquals("x must be an integer between -2147483648 and 2147483647, found 99999999999999999999… "
                + "(5000 characters)", assertThrows(JsonValueException.class, () -> v.asInt("x")).getMessage());
    }

    @Test
    void invalidValuesCannotBeBuilt() {
        assertThrows(IllegalArgumentException.class, () -> new Json.Num("1.e5"));
        assertThrows(IllegalArgumentException.class, () -> new Json.Str("\ud800"));
        assertThrows(IllegalArgumentException.class, () -> Json.Obj.builder().put("a", 1).put("a", 2));
        assertThrows(NullPointerException.class, () -> new Json.Obj(java.util.Collections.singletonMap("a", null)));
        assertEquals(Map.of("a", Json.Num.of(1)), Json.Obj.builder().put("a", 1).build().members());
    }
}
