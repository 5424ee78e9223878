package org.chirocore.cert;

import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.MinorWitness;

/**
 * What a certificate is made from: a core, the path that obtains it from its source, one
 * orientation witness per single-element deletion and contraction, and how it was found.
 * Nothing here is trusted: {@link Certificate#of} re-checks every witness.
 *
 * @param core the core
 * @param provenance its source and the path (contracted and deleted labels) from it
 * @param witnesses two per core element, any order
 * @param discovery how it was found (unhashed)
 */
public record CoreFinding(ExplicitMatroid core, Provenance provenance, List<MinorWitness> witnesses,
        Discovery discovery) {
    public CoreFinding {
        witnesses = List.copyOf(witnesses);
    }

    /** The finding of a search: {@code found}'s core, path and witnesses, reduced from {@code source}. */
    public static CoreFinding searched(MinimalCore found, Source source) {
        return new CoreFinding(found.core(), new Provenance(source, found.contracted(), found.deleted()),
                found.witnesses(), new Discovery.Searched(found.settings().seed(), found.settings().strategy(),
                        found.stats()));
    }
}
