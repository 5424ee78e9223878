package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Field;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FamilyDefinitionTest {
    @TempDir
    Path dir;

    /** A definition file x.json with these members and contractPulled true. */
    private Path file(String hyperplane, String pulled, String field, String range) throws IOException {
        Path f = dir.resolve("x.json");
        Files.writeString(f, "{\"name\": \"x\", \"description\": \"A test family.\", \"field\": \"" + field + "\", "
                + "\"hyperplane\": " + hyperplane + ", \"pulled\": \"" + pulled + "\", \"contractPulled\": true, "
                + "\"range\": " + range + "}");
        return f;
    }

    @ParameterizedTest(name = "{0} at n = {1}, i = {2} is {3}")
    @CsvSource(delimiter = ';', value = {
        "n - 1; 7; 0; 6", "2*i - 1; 4; 3; 5", "-(n - i) * 3 + 1; 5; 2; -8", "( n+1 )*(n-1); 4; 0; 15", "7; 9; 9; 7",
        "n - i - 1; 5; 1; 3", "(n-3)/2; 8; 0; 2", "-n/2; 5; 0; -3"})
    void expressionsEvaluateExactly(String text, int n, int i, long value) {
        assertEquals(value, Expression.parse(text, Set.of('n', 'i')).value(n, i));
    }

    @ParameterizedTest(name = "\"{0}\" is rejected")
    @CsvSource(delimiter = ';', value = {"n +; expected a number", "2 n; expected an operator", "(n; closing parenthesis",
        "i; expected a number, n", "n / ; found the end", "n % 2; found \"%\"", "; found the end"})
    void badExpressionsAreRejectedWithThePosition(String text, String message) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Expression.parse(text == null ? "" : text, Set.of('n')));
        assertTrue(e.getMessage().contains(message), e.getMessage());
    }

    @Test
    void overflowIsAnErrorNotAWrongValue() {
        Expression e = Expression.parse("n*n*n*n*n*n*n*n*n*n*n*n*n*n*n*n*n*n*n*n", Set.of('n'));
        assertThrows(ArithmeticException.class, () -> e.value(10, 0));
    }

    @ParameterizedTest(name = "\"{0}\" at n = {1} is {2}")
    @CsvSource({"all ones, 3, 111", "all zeros, 4, 0000", "weight 2, 5, 11000", "'1 repeated n-1, 0', 4, 1110",
        "1 repeated n, 2, 11", "'10 repeated 2, 1', 5, 10101"})
    void vertexRules(String rule, int n, String label) {
        assertEquals(label, VertexRule.parse(rule).label(n));
    }

    @Test
    void theCornerFileDescribesTheCornerConstruction() {
        FamilyDefinition corner = FamilyDefinition.read(Path.of("families/corner.json"));
        for (int n = 3; n <= 6; n++) {
            CubeConstruction c = corner.construction(n);
            assertEquals(CubeConstruction.corner(n).hyperplaneVertices(), c.hyperplaneVertices());
            assertEquals(CubeConstruction.corner(n).pulledVertex(), c.pulledVertex());
            assertTrue(c.contractPulled());
        }
    }

    @Test
    void anEquationFormulaInIGivesItsCoefficients() throws IOException {
        FamilyDefinition d = FamilyDefinition.read(file("{\"normal\": \"i\", \"offset\": \"n\"}", "all ones", "Q",
                "[3, 5]"));
        assertEquals(List.of("0001", "1010"), d.construction(4).hyperplaneVertices());
        assertEquals(Field.RATIONALS, d.field());
    }

    @Test
    void anUnknownVertexRuleIsNamedWithItsField() throws IOException {
        Path f = file("{\"vertices\": \"weight 1\"}", "the far corner", "Q", "[3, 5]");
        FamilyException e = assertThrows(FamilyException.class, () -> FamilyDefinition.read(f));
        assertTrue(e.getMessage().startsWith(f + ": pulled: \"the far corner\" is not a vertex rule"), e.getMessage());
    }

    @Test
    void anUnknownVertexSetRuleIsNamedWithItsField() throws IOException {
        Path f = file("{\"vertices\": \"unit vectors\"}", "all ones", "Q", "[3, 5]");
        FamilyException e = assertThrows(FamilyException.class, () -> FamilyDefinition.read(f));
        assertTrue(e.getMessage().startsWith(f + ": hyperplane.vertices: \"unit vectors\" is not a vertex-set rule"),
                e.getMessage());
    }

    @Test
    void aBadExpressionIsNamedWithItsField() throws IOException {
        Path f = file("{\"normal\": \"1\", \"offset\": \"n +* 1\"}", "all ones", "Q", "[3, 5]");
        FamilyException e = assertThrows(FamilyException.class, () -> FamilyDefinition.read(f));
        assertTrue(e.getMessage().startsWith(f + ": hyperplane.offset: \"n +* 1\" is not an expression in n: "
                + "at position 4"), e.getMessage());
    }

    @Test
    void aMisspeltMemberAndABadRangeAreRejected() throws IOException {
        Path f = dir.resolve("y.json");
        Files.writeString(f, "{\"name\": \"y\", \"description\": \"d\", \"field\": \"Q\", \"hyperplane\": "
                + "{\"vertices\": \"weight 1\"}, \"pulled\": \"all ones\", \"contractPuled\": true, \"range\": [3, 4]}");
        assertTrue(assertThrows(FamilyException.class, () -> FamilyDefinition.read(f)).getMessage()
                .contains("unknown field \"contractPuled\""));
        Path g = file("{\"vertices\": \"weight 1\"}", "all ones", "Q", "[5, 3]");
        assertTrue(assertThrows(FamilyException.class, () -> FamilyDefinition.read(g)).getMessage()
                .startsWith(g + ": range: [5, 3] is not a range"));
    }

    @Test
    void aVertexSetThatIsNotAHyperplaneAtSomeNNamesThatN() throws IOException {
        // weight 3 is the hyperplane x1 + ... + xn = 3 for n >= 4, but at n = 3 it is the single vertex 111
        Path f = file("{\"vertices\": \"weight 3\"}", "all zeros", "Q", "[3, 5]");
        FamilyDefinition d = FamilyDefinition.read(f);
        d.build(4);
        FamilyException e = assertThrows(FamilyException.class, () -> d.build(3));
        assertEquals(f + ": hyperplane at n = 3: The vertex set {111} has rank 1, but a hyperplane has rank 3.",
                e.getMessage());
    }

    @Test
    void theGf5CornerStopsBeingAHyperplaneAtSix() {
        // over GF(5) the all-ones vertex of the 6-cube has x1 + ... + x6 = 6 = 1 and lies in the closure of H
        FamilyDefinition gf5 = FamilyDefinition.read(Path.of("families/corner-gf5.json"));
        gf5.build(5);
        FamilyException e = assertThrows(FamilyException.class,
                () -> new FamilyDefinition(gf5.source(), gf5.name(), gf5.description(), gf5.field(), gf5.hyperplane(),
                        gf5.pulled(), true, 3, 6, gf5.sha256()).build(6));
        assertTrue(e.getMessage().startsWith("families/corner-gf5.json: hyperplane at n = 6: ")
                && e.getMessage().contains("111111 lies in its closure"), e.getMessage());
    }

    @Test
    void generalPositionFailureNamesTheN() throws IOException {
        // H = the facet x1 = 0 and O = 1 0 0 0: the hyperline L = {x1 = x2 = 0} together with O spans
        // the facet x2 = 0, whose vertex 1 0 0 1 lies outside L and O
        Path f = file("{\"normal\": [\"1\", \"0\", \"0\", \"0\"], \"offset\": \"0\"}", "1, 0 repeated n-1", "Q", "[4, 4]");
        FamilyException e = assertThrows(FamilyException.class, () -> FamilyDefinition.read(f).build(4));
        assertTrue(e.getMessage().startsWith(f + ": (H, O) are not in general position at n = 4: "), e.getMessage());
    }

    @Test
    void aListedNormalOfTheWrongLengthNamesTheN() throws IOException {
        Path f = file("{\"normal\": [\"1\", \"1\", \"1\"], \"offset\": \"1\"}", "all ones", "Q", "[3, 4]");
        FamilyDefinition d = FamilyDefinition.read(f);
        d.build(3);
        FamilyException e = assertThrows(FamilyException.class, () -> d.build(4));
        assertEquals(f + ": hyperplane at n = 4: the normal lists 3 coefficients, but the cube has dimension 4.",
                e.getMessage());
    }

    @Test
    void anNOutsideTheRangeIsRejected() {
        FamilyDefinition gf5 = FamilyDefinition.read(Path.of("families/corner-gf5.json"));
        assertEquals("families/corner-gf5.json: n = 6 is outside the family's range [3, 5].",
                assertThrows(FamilyException.class, () -> gf5.build(6)).getMessage());
    }
}
