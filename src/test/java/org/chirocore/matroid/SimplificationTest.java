package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Loops and parallel classes as in Oxley, Matroid Theory, 2nd ed., §1.7. */
class SimplificationTest {

    @Test
    void dropsLoopsAndKeepsTheFirstElementOfEachParallelClass() {
        List<long[]> columns = List.of(
                new long[] {1, 0, 0}, new long[] {0, 0, 0}, new long[] {2, 0, 0}, new long[] {0, 1, 0},
                new long[] {0, -3, 0}, new long[] {1, 1, 1}, new long[] {0, 0, 0});
        MatrixMatroid m = new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(7));
        // 1 and 6 are loops; 2 is parallel to 0 and 4 to 3.
        assertArrayEquals(new int[] {0, 3, 5}, Simplification.representatives(m));
    }

    @Test
    void projectingTheCubeFromSeveralVerticesCreatesParallelClasses() {
        // After contracting 111, v and w are parallel exactly when 111, v, w are collinear; no three
        // vertices of a cube are collinear (common practice), so nothing is parallel.
        AffineCube cube = AffineCube.real(3);
        Matroid contracted = new Minor(cube, new int[] {cube.indexOf("111")}, new int[0]);
        assertEquals(7, Simplification.representatives(contracted).length);
        // After contracting 000 and 111, v and its antipode are parallel: the four form a rectangle,
        // (1,v) + (1,1-v) = (1,0) + (1,1), a 4-element circuit. 6 vertices in 3 classes.
        Matroid twice = new Minor(cube, new int[] {cube.indexOf("000"), cube.indexOf("111")}, new int[0]);
        assertEquals(3, Simplification.representatives(twice).length);
    }
}
