package org.chirocore.cert;

import java.util.List;

/**
 * How a core was obtained: the core is (the source's matroid)/C\D with the remaining elements in
 * the source's order.
 *
 * @param source the matroid reduced
 * @param contracted the labels of C
 * @param deleted the labels of D
 */
public record Provenance(Source source, List<String> contracted, List<String> deleted) {
    public Provenance {
        contracted = List.copyOf(contracted);
        deleted = List.copyOf(deleted);
    }
}
