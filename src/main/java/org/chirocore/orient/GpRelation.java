package org.chirocore.orient;

import org.chirocore.matroid.ElementSet;

/**
 * A 3-term Grassmann–Plücker relation (X; a, b, c, d) of a rank-r chirotope: X an (r−2)-set and
 * a < b < c < d outside X. Its terms are χ(x,a,b)·χ(x,c,d), −χ(x,a,c)·χ(x,b,d) and
 * χ(x,a,d)·χ(x,b,c) with x the sorted tuple of X; the relation holds when the terms are all 0 or
 * include both +1 and −1 ([BLSWZ, §3.5–3.6]). Sorting a, b, c, d loses nothing: permuting them
 * permutes the terms up to a common sign (common practice).
 *
 * @param x the set X
 */
public record GpRelation(ElementSet x, int a, int b, int c, int d) {
    public GpRelation {
        if (!(a < b && b < c && c < d)) {
            throw new IllegalArgumentException("A relation needs a < b < c < d, got " + a + ", " + b + ", " + c + ", "
                    + d + ".");
        }
        if (x.contains(a) || x.contains(b) || x.contains(c) || x.contains(d)) {
            throw new IllegalArgumentException("The elements a, b, c, d of a relation must lie outside X.");
        }
    }

    /** All elements the relation mentions, X ∪ {a, b, c, d}. */
    public ElementSet support() {
        return x.union(ElementSet.of(a, b, c, d));
    }

    @Override
    public String toString() {
        return "(X=" + x + "; " + a + ", " + b + ", " + c + ", " + d + ")";
    }
}
