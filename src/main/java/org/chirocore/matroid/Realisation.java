package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A realisation over Q: an r × n integer matrix of rank r, one column per element. The signs of
 * its maximal minors, χ(B) = sign det(columns B), form a chirotope whose support is the set of
 * bases of the column matroid (Björner, Las Vergnas, Sturmfels, White, Ziegler, <i>Oriented
 * Matroids</i>, 2nd ed., §1.2 and §3.5, from memory: the oriented matroid of a real vector
 * configuration), so a realisation is a compact orientation witness: r·n integers instead of one
 * sign per basis. Immutable.
 */
public final class Realisation {
    private final MatrixMatroid matrix;
    private final long[][] columns;

    private Realisation(MatrixMatroid matrix) {
        this.matrix = matrix;
        this.columns = new long[matrix.size()][];
        for (int j = 0; j < columns.length; j++) {
            columns[j] = matrix.column(j);
        }
    }

    /**
     * The realisation given by a matrix over Q: the matrix itself when its number of rows is its
     * rank, else its restriction to the first maximal set of linearly independent rows (every other
     * row is a combination of those, so the column matroid is unchanged). Empty over GF(p), where
     * determinant signs mean nothing.
     */
    public static Optional<Realisation> of(MatrixMatroid m) {
        if (!m.field().isRational()) {
            return Optional.empty();
        }
        if (m.rows() == m.rank()) {
            return Optional.of(new Realisation(m));
        }
        // Rows as the columns of the transpose: a maximal independent set of them, greedily.
        List<long[]> rows = new ArrayList<>();
        for (int i = 0; i < m.rows(); i++) {
            long[] row = new long[m.size()];
            for (int j = 0; j < row.length; j++) {
                row[j] = m.column(j)[i];
            }
            rows.add(row);
        }
        MatrixMatroid transpose = new MatrixMatroid(Field.RATIONALS, rows, MatrixMatroid.indexLabels(rows.size()));
        int[] kept = new int[0];
        for (int i = 0; i < rows.size() && kept.length < m.rank(); i++) {
            int[] with = ElementSets.with(kept, i);
            if (transpose.isIndependent(with)) {
                kept = with;
            }
        }
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < m.size(); j++) {
            long[] c = new long[kept.length];
            for (int i = 0; i < kept.length; i++) {
                c[i] = rows.get(kept[i])[j];
            }
            columns.add(c);
        }
        return Optional.of(new Realisation(new MatrixMatroid(Field.RATIONALS, columns, m.labels())));
    }

    /** The matrix, over Q, with exactly {@link #rank()} rows. */
    public MatrixMatroid matrix() {
        return matrix;
    }

    /** Copies of the columns, one per element, each with {@link #rank()} entries. */
    public List<long[]> columns() {
        List<long[]> out = new ArrayList<>();
        for (long[] c : columns) {
            out.add(c.clone());
        }
        return out;
    }

    public List<String> labels() {
        return matrix.labels();
    }

    public int rank() {
        return matrix.rank();
    }

    public int size() {
        return matrix.size();
    }

    /** Receives one r-subset (increasing, reused between calls) and its sign. */
    public interface SignVisitor {
        /** @return whether to go on */
        boolean visit(int[] subset, int sign);
    }

    /**
     * Visits every r-subset of the columns in lexicographic order with the sign (−1, 0, +1) of its
     * determinant, until the visitor says stop. Cost: C(n, r) visits and at most C(n, r−1)·r·n
     * long operations for the shared eliminations (see {@link MaximalMinors}).
     */
    public void forEachSign(SignVisitor visitor) {
        new MaximalMinors(columns, rank()).walk(visitor);
    }
}
