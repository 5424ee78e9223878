package org.chirocore.search;

import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;

/**
 * A minor-minimal non-orientable minor M/C\D of an input matroid, with its proof of minimality:
 * for every element e of the core, an orientation witness of core\e and of core/e (for a loop or
 * coloop the two minors coincide and the same witness serves both).
 *
 * @param core the core, on the labels of the input's elements that remain
 * @param contracted the labels of C, in the order they were contracted
 * @param deleted the labels of D, in the order they were deleted
 * @param witnesses two per core element, deletion then contraction, in element order
 * @param settings seed, strategy and budget that produced it
 * @param stats figures of the search
 */
public record MinimalCore(ExplicitMatroid core, List<String> contracted, List<String> deleted,
        List<MinorWitness> witnesses, SearchSettings settings, SearchStats stats) {
    public MinimalCore {
        contracted = List.copyOf(contracted);
        deleted = List.copyOf(deleted);
        witnesses = List.copyOf(witnesses);
        if (witnesses.size() != 2 * core.size()) {
            throw new IllegalArgumentException("A minimal core on " + core.size() + " elements needs "
                    + 2 * core.size() + " minimality witnesses, got " + witnesses.size() + ".");
        }
    }
}
