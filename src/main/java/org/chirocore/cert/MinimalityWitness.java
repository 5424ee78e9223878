package org.chirocore.cert;

import java.util.List;
import java.util.Optional;

/**
 * The orientations proving that removing one element of a core leaves an orientable matroid.
 *
 * @param element the label of e
 * @param deletion one sign ('+' or '-') per basis of core\e, in that minor's canonical order
 * @param contraction one sign per basis of core/e, in that minor's canonical order
 * @param transport when present, both signs are those of the entry it names relabelled by a stated
 *     automorphism, and the certificate states the transport instead of the signs
 */
public record MinimalityWitness(String element, String deletion, String contraction, Optional<Transport> transport) {
    public MinimalityWitness {
        if (!deletion.matches("[+-]*") || !contraction.matches("[+-]*")) {
            throw new IllegalArgumentException("Witness signs of element " + element + " must be '+' and '-' only.");
        }
    }

    /** An entry stated by its signs. */
    public MinimalityWitness(String element, String deletion, String contraction) {
        this(element, deletion, contraction, Optional.empty());
    }

    /**
     * Witnesses by symmetry: those of element {@code image} (an entry stated by its signs),
     * relabelled by the automorphism σ of the core with {@code under.get(i)} = σ(i) and σ(image) =
     * this entry's element.
     */
    public record Transport(String image, List<Integer> under) {
        public Transport {
            under = List.copyOf(under);
        }
    }
}
