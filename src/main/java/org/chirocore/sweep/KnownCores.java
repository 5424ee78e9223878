package org.chirocore.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.Duality;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Matroid;

/**
 * Names for cores that are well-known excluded minors of orientability, recognised by an
 * isomorphism that is found and checked, never by counts alone: the Fano plane F7 = PG(2, 2)
 * (the seven nonzero vectors of GF(2)^3), its dual F7*, the binary affine cube AG(3, 2), and the
 * ternary affine plane AG(2, 3) minus a point (its automorphism group is transitive, so which
 * point does not matter).
 * Cost: one isomorphism search per catalogue entry of the same size and rank.
 */
final class KnownCores {
    private static final Map<String, ExplicitMatroid> CATALOGUE = catalogue();

    private KnownCores() {
    }

    /** The name of {@code core} when it is isomorphic to a catalogue entry. */
    static Optional<String> name(ExplicitMatroid core) {
        for (Map.Entry<String, ExplicitMatroid> e : CATALOGUE.entrySet()) {
            Matroid known = e.getValue();
            if (known.size() == core.size() && known.rank() == core.rank()
                    && new HyperplaneIsomorphismInspector(core, known).find().isPresent()) {
                return Optional.of(e.getKey());
            }
        }
        return Optional.empty();
    }

    private static Map<String, ExplicitMatroid> catalogue() {
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int v = 1; v < 8; v++) {
            columns.add(new long[] {v & 1, (v >> 1) & 1, (v >> 2) & 1});
            labels.add(Integer.toString(v));
        }
        ExplicitMatroid fano = ExplicitMatroid.of(new MatrixMatroid(Field.gf(2), columns, labels));
        List<long[]> plane = new ArrayList<>();
        List<String> planeLabels = new ArrayList<>();
        for (int x = 0; x < 3; x++) {
            for (int y = 0; y < 3; y++) {
                if (x + y > 0) {
                    plane.add(new long[] {1, x, y});
                    planeLabels.add(x + "" + y);
                }
            }
        }
        return Map.of("F7", fano, "F7*", Duality.dual(fano),
                "AG(3,2)", ExplicitMatroid.of(AffineCube.of(3, Field.gf(2))),
                "AG(2,3)\\e", ExplicitMatroid.of(new MatrixMatroid(Field.gf(3), plane, planeLabels)));
    }
}
