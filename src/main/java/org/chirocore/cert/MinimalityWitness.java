package org.chirocore.cert;

import java.util.List;

import org.chirocore.matroid.Realisation;

/**
 * The orientations proving that removing one element of a core leaves an orientable matroid.
 *
 * @param element the label of e
 * @param deletion the witness of core\e
 * @param contraction the witness of core/e
 */
public record MinimalityWitness(String element, Form deletion, Form contraction) {

    /** How one single-element minor is shown orientable; the certificate writes each form its own way. */
    public sealed interface Form permits Signs, Transported, Matrix {
        /** The name of the kind, as {@code reduce} counts it: "signs", "transported" or "matrix". */
        String kind();
    }

    /**
     * A chirotope of the minor, checked against every 3-term relation.
     *
     * @param signs one sign ('+' or '-') per basis of the minor, in its canonical order
     */
    public record Signs(String signs) implements Form {
        public Signs {
            if (!signs.matches("[+-]*")) {
                throw new IllegalArgumentException("Witness signs must be '+' and '-' only.");
            }
        }

        @Override
        public String kind() {
            return "signs";
        }
    }

    /**
     * Witness by symmetry: the witness of the same kind at element {@code image} (given by its
     * signs), relabelled by the automorphism σ of the core with {@code under.get(i)} = σ(i) and
     * σ(image) = this entry's element (docs/certificate-format.md, {@code minimality}).
     */
    public record Transported(String image, List<Integer> under) implements Form {
        public Transported {
            under = List.copyOf(under);
        }

        @Override
        public String kind() {
            return "transported";
        }
    }

    /**
     * A realisation of the minor over Q: an integer matrix with as many rows as the minor's rank and
     * one column per element of the minor, in its element order, whose non-zero maximal minors are
     * exactly on the minor's bases (checked).
     *
     * @param realisation the matrix, on the minor's labels
     */
    public record Matrix(Realisation realisation) implements Form {
        /** The columns, one per element of the minor, each with one entry per row. */
        public List<long[]> columns() {
            return realisation.columns();
        }

        @Override
        public String kind() {
            return "matrix";
        }
    }

    /** The number of this entry's two witnesses of the given kind. */
    public int count(String kind) {
        return (deletion.kind().equals(kind) ? 1 : 0) + (contraction.kind().equals(kind) ? 1 : 0);
    }
}
