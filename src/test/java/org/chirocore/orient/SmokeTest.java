package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.Field;
import org.chirocore.matroid.MatrixMatroid;
import org.junit.jupiter.api.Test;

class SmokeTest {
    @Test
    void fanoOverGf2IsNonOrientableAndOverQIsOrientable() {
        List<long[]> cols = new ArrayList<>();
        for (int v = 1; v < 8; v++) {
            cols.add(new long[] {v & 1, (v >> 1) & 1, (v >> 2) & 1});
        }
        Orientability f7 = new LazySatDecider(Budget.UNLIMITED)
                .decide(new MatrixMatroid(Field.gf(2), cols, MatrixMatroid.indexLabels(7)));
        Orientability nonFano = new LazySatDecider(Budget.UNLIMITED)
                .decide(new MatrixMatroid(Field.RATIONALS, cols, MatrixMatroid.indexLabels(7)));
        assertEquals("non-orientable", f7.verdict());
        assertEquals("orientable", nonFano.verdict());
    }
}
