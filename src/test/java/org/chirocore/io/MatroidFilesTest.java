package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.MatrixMatroid;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MatroidFilesTest {
    /** The 7 nonzero vectors of GF(2)^3, as columns. */
    private static final String SEVEN_VECTORS = "[[1,0,0],[0,1,0],[0,0,1],[1,1,0],[1,0,1],[0,1,1],[1,1,1]]";

    private static String matrixFile(String field, int rank) {
        return "{\"rank\": " + rank + ", \"matrix\": {\"field\": \"" + field + "\", \"columns\": " + SEVEN_VECTORS
                + "}}";
    }

    private static String error(String text) {
        return assertThrows(MatroidFileException.class, () -> MatroidFiles.parse(text, "f7.json")).getMessage();
    }

    /**
     * Fano plane F7 = PG(2,2): C(7,3) − 7 lines = 28 bases ([Ox, §1.5]). Over Q the same vectors
     * give the non-Fano matroid: the line {(1,1,0),(1,0,1),(0,1,1)} is no longer dependent, so
     * 6 three-point lines and 35 − 6 = 29 bases ([Ox, Appendix]).
     */
    @ParameterizedTest
    @CsvSource({"GF(2), 28", "Q, 29", "GF(3), 29"})
    void sevenVectorsOverDifferentFields(String field, int bases) throws MatroidFileException {
        Matroid m = MatroidFiles.parse(matrixFile(field, 3), "f7.json");
        MatrixMatroid mm = assertInstanceOf(MatrixMatroid.class, m);
        assertEquals(Field.parse(field), mm.field());
        assertEquals(List.of("0", "1", "2", "3", "4", "5", "6"), m.labels());
        assertEquals(bases, ExplicitMatroid.of(m).basisCount());
    }

    @Test
    void readsBasesWithLabels() throws MatroidFileException {
        Matroid m = MatroidFiles.parse("""
                {"rank": 2, "labels": ["a", "b", "c"], "comment": "U(2,3)",
                 "bases": [[1, 0], [0, 2], [2, 1]]}""", "u23.json");
        assertEquals(ExplicitMatroid.fromBases(List.of("a", "b", "c"), 2,
                List.of(new int[] {0, 1}, new int[] {0, 2}, new int[] {1, 2})), m);
    }

    /** The two F7 examples of docs/matroid-format.md: the non-bases are the lines of the matrix. */
    @Test
    void nonBasesFileEqualsMatrixFile() throws MatroidFileException {
        ExplicitMatroid m = (ExplicitMatroid) MatroidFiles.parse("""
                {"rank": 3, "elements": 7,
                 "nonbases": [[0, 1, 3], [0, 2, 4], [0, 5, 6], [1, 2, 5], [1, 4, 6], [2, 3, 6], [3, 4, 5]]}""",
                "f7.json");
        assertEquals(28, m.basisCount());
        assertEquals(ExplicitMatroid.of(MatroidFiles.parse(matrixFile("GF(2)", 3), "f7.json")), m);
    }

    @Test
    void explicitMatroidRoundTrips() throws MatroidFileException {
        ExplicitMatroid f7 = ExplicitMatroid.of(MatroidFiles.parse(matrixFile("GF(2)", 3), "f7.json"))
                .relabel(List.of("a", "b", "c", "d", "e", "f", "g"));
        String text = MatroidFiles.toJson(f7).toText();
        assertEquals(f7, MatroidFiles.parse(text, "again.json"));
        assertTrue(text.contains("\n    [0, 1, 2],\n"), text);
    }

    @Test
    void matrixMatroidRoundTrips() throws MatroidFileException {
        MatrixMatroid m = (MatrixMatroid) MatroidFiles.parse(matrixFile("Q", 3), "nonfano.json");
        MatrixMatroid again = (MatrixMatroid) MatroidFiles.parse(MatroidFiles.toJson(m).toText(), "again.json");
        assertEquals(ExplicitMatroid.of(m), ExplicitMatroid.of(again));
        assertEquals(Field.RATIONALS, again.field());
        assertArrayEquals(m.column(6), again.column(6));
    }

    @Test
    void writtenFilesAreIdenticalAndReadBack(@TempDir Path dir) throws IOException, MatroidFileException {
        ExplicitMatroid f7 = ExplicitMatroid.of(MatroidFiles.parse(matrixFile("GF(2)", 3), "f7.json"));
        Path first = dir.resolve("a.json");
        Path second = dir.resolve("b.json");
        MatroidFiles.write(first, f7);
        MatroidFiles.write(second, ExplicitMatroid.of(MatroidFiles.read(first)));
        assertArrayEquals(Files.readAllBytes(first), Files.readAllBytes(second));
        assertEquals(f7, MatroidFiles.read(second));
    }

    @Test
    void fileErrorsNameThePath(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("f7.json");
        Files.writeString(file, "{\"rank\": 3,\n    ]", StandardCharsets.UTF_8);
        MatroidFileException e = assertThrows(MatroidFileException.class, () -> MatroidFiles.read(file));
        assertEquals(file + ": not valid JSON: line 2, column 5: expected a string key after ',' but found ']'",
                e.getMessage());
        assertEquals(file.toString(), e.source());
        Path missing = dir.resolve("none.json");
        // Plain words, no exception class name (common practice for messages to people).
        assertEquals(missing + ": cannot read the file: no such file or directory",
                assertThrows(MatroidFileException.class, () -> MatroidFiles.read(missing)).getMessage());
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        // malformed and truncated JSON
        "`{\"rank\": 3 \"bases\": []}`|f7.json: not valid JSON: line 1, column 12: expected ',' or '}' but found '\"'",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0, 1,`|"
            + "f7.json: not valid JSON: line 1, column 44: expected a JSON value but found the end of the input",
        "`{\"rank\": 2, \"rank\": 2}`|f7.json: not valid JSON: line 1, column 13: duplicate key \"rank\" in an object",
        // shape
        "`[1, 2]`|f7.json: the top-level value must be an object, found an array",
        "`{\"elements\": 3, \"bases\": [[0]]}`|f7.json: field \"rank\" is missing",
        "`{\"rank\": \"2\", \"elements\": 3, \"bases\": [[0, 1]]}`|"
            + "f7.json: field \"rank\" must be an integer, found a string",
        "`{\"rank\": 99999999999, \"elements\": 3, \"bases\": [[0, 1]]}`|"
            + "f7.json: field \"rank\" must be an integer between -2147483648 and 2147483647, found 99999999999",
        "`{\"rank\": -1, \"elements\": 3, \"bases\": [[0, 1]]}`|f7.json: field \"rank\" must be at least 0, found -1",
        "`{\"rank\": 2, \"elements\": 3, \"base\": [[0, 1]]}`|f7.json: unknown field \"base\"; the known fields are "
            + "\"rank\", \"labels\", \"elements\", \"comment\", \"bases\", \"nonbases\", \"matrix\"",
        "`{\"rank\": 2, \"elements\": 3}`|"
            + "f7.json: expected exactly one of \"bases\", \"nonbases\", \"matrix\", but found none",
        "`{\"rank\": 3, \"bases\": [[0, 1, 2]], \"matrix\": {\"field\": \"Q\", \"columns\": []}}`|"
            + "f7.json: expected exactly one of \"bases\", \"nonbases\", \"matrix\", but found \"bases\" and \"matrix\"",
        "`{\"rank\": 2, \"bases\": [[0, 1]]}`|"
            + "f7.json: field \"elements\" is missing; it is required with \"bases\" when there are no \"labels\"",
        "`{\"rank\": 2, \"elements\": 4, \"labels\": [\"a\", \"b\", \"c\"], \"bases\": [[0, 1]]}`|"
            + "f7.json: field \"elements\" is 4, but there are 3 labels",
        "`{\"rank\": 2, \"labels\": [\"a\", \"b\", \"a\"], \"bases\": [[0, 1]]}`|"
            + "f7.json: labels[2] repeats the label \"a\" of labels[0]",
        "`{\"rank\": 2, \"labels\": [\"a\", 7], \"bases\": [[0, 1]]}`|f7.json: labels[1] must be a string, found 7",
        "`{\"rank\": 4, \"elements\": 3, \"bases\": [[0, 1, 2, 3]]}`|"
            + "f7.json: field \"rank\" is 4, but there are only 3 elements",
        "`{\"rank\": 1, \"elements\": 1025, \"bases\": [[0]]}`|"
            + "f7.json: a matroid given by \"bases\" has at most 1024 elements, but there are 1025",
        // bases
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2],[0,1,3],[0,1,4],[0,1,9]]}`|"
            + "f7.json: bases[3] names element 9, but there are only 7 elements (0..6)",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,-1,2]]}`|"
            + "f7.json: bases[0] names element -1, but element indices start at 0",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2],[2,3,2]]}`|f7.json: bases[1] repeats element 2",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2],[3,4]]}`|f7.json: bases[1] has 2 elements, but the rank is 3",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2],[2,1,0]]}`|f7.json: bases[1] is the same set as bases[0]",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2], 5]}`|f7.json: bases[1] must be an array, found 5",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,\"2\"]]}`|f7.json: bases[0][2] must be an integer, found a string",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": [[0,1,2.0]]}`|f7.json: bases[0][2] must be an integer, found 2.0",
        "`{\"rank\": 3, \"elements\": 7, \"bases\": []}`|"
            + "f7.json: the bases do not form a matroid: The basis list is empty; a matroid has at least one basis.",
        "`{\"rank\": 2, \"elements\": 4, \"bases\": [[0, 1], [2, 3]]}`|f7.json: the bases do not form a matroid: "
            + "Basis exchange fails: from basis [0, 1] remove element 0; no element of basis [2, 3] completes it to a basis.",
        "`{\"rank\": 1, \"elements\": 1, \"nonbases\": [[0]]}`|f7.json: the non-bases do not define a matroid: "
            + "The basis list is empty; a matroid has at least one basis.",
        "`{\"rank\": 1, \"elements\": 2, \"nonbases\": [[2]]}`|"
            + "f7.json: nonbases[0] names element 2, but there are only 2 elements (0..1)",
        // matrix
        "`{\"rank\": 2, \"matrix\": {\"field\": \"Q\", \"columns\": [[1, 0], [0, 1], [1, 1]]}, \"labels\": [\"a\"]}`|"
            + "f7.json: the matrix has 3 columns, but there are 1 labels",
        "`{\"rank\": 2, \"elements\": 2, \"matrix\": {\"field\": \"Q\", \"columns\": [[1, 0], [0, 1], [1, 1]]}}`|"
            + "f7.json: the matrix has 3 columns, but field \"elements\" is 2",
        "`{\"rank\": 2, \"matrix\": {\"field\": \"GF(4)\", \"columns\": [[1, 0]]}}`|"
            + "f7.json: in \"matrix\": A field characteristic must be 0 or a prime, not 4.",
        "`{\"rank\": 2, \"matrix\": {\"columns\": [[1, 0]]}}`|f7.json: in \"matrix\": field \"field\" is missing",
        "`{\"rank\": 2, \"matrix\": {\"field\": \"Q\", \"rows\": 2, \"columns\": [[1, 0]]}}`|"
            + "f7.json: in \"matrix\": unknown field \"rows\"; the known fields are \"field\", \"columns\"",
        "`{\"rank\": 2, \"matrix\": {\"field\": \"Q\", \"columns\": [[1, 0], [0, 1, 0]]}}`|"
            + "f7.json: in \"matrix\": columns[1] has 3 entries, but columns[0] has 2",
        "`{\"rank\": 1, \"matrix\": {\"field\": \"Q\", \"columns\": [[1, 9223372036854775808]]}}`|f7.json: in \"matrix\": "
            + "columns[0][1] must be an integer between -9223372036854775808 and 9223372036854775807, "
            + "found 9223372036854775808",
        "`{\"rank\": 3, \"matrix\": {\"field\": \"Q\", \"columns\": [[1, 0, 0], [0, 1, 0], [1, 1, 0]]}}`|"
            + "f7.json: field \"rank\" is 3, but the matrix has rank 2 over Q",
        "`{\"rank\": 3, \"matrix\": {\"field\": \"GF(2)\", \"columns\": [[1, 1, 0], [0, 1, 1], [1, 0, 1]]}}`|"
            + "f7.json: field \"rank\" is 3, but the matrix has rank 2 over GF(2)",
    })
    void errorsNameTheFileTheItemAndWhatWasExpected(String text, String message) {
        assertEquals(message, error(text));
    }

    @Test
    void absurdlyDeepOrHugeInputIsRejected() {
        assertEquals("f7.json: not valid JSON: line 1, column 533: arrays and objects are nested more than 512 deep",
                error("{\"rank\": 1, \"bases\": " + "[".repeat(10_000)));
        assertTrue(error("{\"rank\": " + "7".repeat(50) + ", \"elements\": 1, \"bases\": [[0]]}")
                .startsWith("f7.json: field \"rank\" must be an integer between -2147483648 and 2147483647, found "
                        + "77777777777777777777… (50 characters)"));
    }
}
