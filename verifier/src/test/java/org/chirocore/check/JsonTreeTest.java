package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** The verifier's JSON reader is strict (RFC 8259) and its canonical text is the one docs/certificate-format.md specifies. */
class JsonTreeTest {
    static JsonTree.Value parse(String text) {
        return JsonTree.parse(text.getBytes(StandardCharsets.UTF_8));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "{\"a\": 1, \"a\": 2}|the member name \"a\" is repeated",
        "[1, 2,]|expected a JSON value",
        "01|expected the end of the input",
        "\"\\ud800\"|unpaired surrogate",
        "\"tab\there\"|a control character must be escaped",
        "[1] [2]|expected the end of the input",
        "{\"a\" 1}|expected ':'",
        "1.|expected a digit",
        "nul|expected a JSON value"})
    void malformedJsonIsRefusedWithAPosition(String text, String message) {
        JsonTree.Malformed e = assertThrows(JsonTree.Malformed.class, () -> parse(text.replace("\\t", "\t")));
        assertTrue(e.getMessage().startsWith("line 1, column ") && e.getMessage().contains(message), e.getMessage());
    }

    @Test
    void nestingIsBoundedSoTheStackCannotOverflow() {
        String deep = "[".repeat(100_000) + "]".repeat(100_000);
        assertTrue(assertThrows(JsonTree.Malformed.class, () -> parse(deep)).getMessage().contains("nested more than 512 deep"));
    }

    @Test
    void invalidUtf8IsRefused() {
        assertThrows(JsonTree.Malformed.class, () -> JsonTree.parse(new byte[] {'"', (byte) 0xc3, '"'}));
    }

    @Test
    void theCanonicalTextFollowsTheFormatPage() {
        JsonTree.Value v = parse("\uFEFF{\"b\":[1,2,[3]],\"a\":{},\"s\":\"q\\\"\\\\\\/\\u0001\\u00e9\\n\",\"n\":[1.0,-0,1e2,true,null],\"e\":[]}");
        assertEquals("""
                {
                  "b": [
                    1,
                    2,
                    [3]
                  ],
                  "a": {},
                  "s": "q\\"\\\\/\\u0001é\\n",
                  "n": [1.0, -0, 1e2, true, null],
                  "e": []
                }""", JsonTree.canonical(v));
    }

    @Test
    void integersAreExactAndTypedAccessNamesTheField() {
        JsonTree.Obj o = parse("{\"big\": 123456789012345678901, \"x\": 3.0, \"n\": 42}").asObject("top");
        assertEquals(42, o.requireInt("n"));
        assertEquals("field \"x\" must be an integer, found the number 3.0",
                assertThrows(JsonTree.Mistyped.class, () -> o.requireInt("x")).getMessage());
        assertTrue(assertThrows(JsonTree.Mistyped.class, () -> o.requireLong("big")).getMessage().contains("123456789012345678901"));
        assertEquals("field \"m\" is missing", assertThrows(JsonTree.Mistyped.class, () -> o.require("m")).getMessage());
    }
}
