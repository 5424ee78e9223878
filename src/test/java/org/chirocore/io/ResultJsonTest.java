package org.chirocore.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.orient.Chirotope;
import org.chirocore.orient.Orientability;
import org.chirocore.orient.SolveStats;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ResultJsonTest {
    /** U(2,3): bases 01, 02, 12 in canonical order. */
    private static final ExplicitMatroid U23 = ExplicitMatroid.fromBases(List.of("a", "b", "c"), 2,
            List.of(new int[] {0, 1}, new int[] {0, 2}, new int[] {1, 2}));
    private static final Chirotope CHI = new Chirotope(U23.labels(), 2, U23.basisSets(), new byte[] {1, -1, 1});
    private static final SolveStats STATS = new SolveStats(3, 0, 0, 1, 0, 5);

    @Test
    void orientableVerdictCarriesTheSigns() {
        assertEquals("""
                {
                  "verdict": "orientable",
                  "elements": 3,
                  "rank": 2,
                  "bases": 3,
                  "stats": {
                    "relations": 0,
                    "clauses": 0,
                    "rounds": 1,
                    "conflicts": 0,
                    "millis": 5
                  },
                  "signs": "+-+"
                }""", ResultJson.orientability(U23, new Orientability.Orientable(CHI, STATS)).toText());
    }

    @Test
    void otherVerdicts() {
        Json.Obj non = ResultJson.orientability(U23, new Orientability.NonOrientable(STATS));
        assertEquals("non-orientable", non.requireString("verdict"));
        assertFalse(non.has("signs"));
        Json.Obj unknown = ResultJson.orientability(U23, new Orientability.Unknown("time limit of 10 s", STATS));
        assertEquals("unknown", unknown.requireString("verdict"));
        assertEquals("time limit of 10 s", unknown.requireString("reason"));
    }

    @Test
    void witnessMustBelongToTheMatroid() {
        Chirotope other = new Chirotope(List.of("x", "y", "z"), 2, U23.basisSets(), new byte[] {1, 1, 1});
        assertThrows(IllegalArgumentException.class,
                () -> ResultJson.orientability(U23, new Orientability.Orientable(other, STATS)));
    }

    @Test
    void chirotopeRoundTrips() {
        Json json = ResultJson.chirotope(CHI);
        assertEquals("""
                {
                  "labels": ["a", "b", "c"],
                  "rank": 2,
                  "bases": [
                    [0, 1],
                    [0, 2],
                    [1, 2]
                  ],
                  "signs": "+-+"
                }""", json.toText());
        assertEquals(CHI, ResultJson.readChirotope(Json.parse(json.toText())));
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        "`{\"labels\": [\"a\",\"b\",\"c\"], \"rank\": 2, \"bases\": [[0,1],[1,2],[0,2]], \"signs\": \"+++\"}`|"
            + "bases[2] does not come after bases[1] in lexicographic order",
        "`{\"labels\": [\"a\",\"b\",\"c\"], \"rank\": 2, \"bases\": [[1,0]], \"signs\": \"+\"}`|"
            + "bases[0] must list 2 increasing element indices in 0..2, found [1, 0]",
        "`{\"labels\": [\"a\",\"b\",\"c\"], \"rank\": 2, \"bases\": [[0,1,2]], \"signs\": \"+\"}`|"
            + "bases[0] has 3 elements, but the rank is 2",
        "`{\"labels\": [\"a\",\"b\",\"c\"], \"rank\": 2, \"bases\": [[0,1]], \"signs\": \"++\"}`|"
            + "field \"signs\" has 2 signs, but there are 1 bases",
        "`{\"labels\": [\"a\",\"b\",\"c\"], \"rank\": 2, \"bases\": [[0,1]], \"signs\": \"0\"}`|"
            + "field \"signs\" must hold only '+' and '-', found '0' at position 0",
    })
    void malformedChirotopesAreRejected(String text, String message) {
        assertEquals(message, assertThrows(JsonValueException.class,
                () -> ResultJson.readChirotope(Json.parse(text))).getMessage());
    }
}
