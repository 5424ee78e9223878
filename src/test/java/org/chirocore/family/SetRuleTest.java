package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The set rules of rule-based predictions (docs/families.md). */
class SetRuleTest {
    @Test
    void generatorsWeightSetsAndSingleVertices() {
        assertEquals(List.of("10000", "01000"), SetRule.parse("unit k for k in 1..n-3").labels(5));
        assertEquals(List.of("1000", "1100", "1110"),
                SetRule.parse("1 repeated k, 0 repeated n-k for k in 1..n-1").labels(4));
        assertEquals(List.of("001", "010", "100"), SetRule.parse("all of weight 1").labels(3));
        assertEquals(List.of("110"), SetRule.parse("weight 2").labels(3));
        assertEquals(List.of("00111"), SetRule.parse("0 repeated n-(n-1)/2-1, 1 repeated (n-1)/2+1").labels(5));
        assertEquals(List.of(), SetRule.parse("unit k for k in 4..n").labels(3));
    }

    @Test
    void errorsNameTheRuleAndK() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SetRule.parse("unit k for k in 1..n+1").labels(3));
        assertTrue(e.getMessage().startsWith("at k = 4: "), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SetRule.parse("unit k for k in 1").labels(3));
        assertTrue(e.getMessage().contains("is not a generator"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SetRule.parse("all of weight n+1").labels(3));
        assertTrue(e.getMessage().contains("asks for weight 4"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SetRule.parse("2 repeated k for k in 1..2"));
        assertTrue(e.getMessage().contains("is not a vertex rule"), e.getMessage());
    }
}
