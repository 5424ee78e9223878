package org.chirocore.cert;

/**
 * The orientations proving that removing one element of a core leaves an orientable matroid.
 *
 * @param element the label of e
 * @param deletion one sign ('+' or '-') per basis of core\e, in that minor's canonical order
 * @param contraction one sign per basis of core/e, in that minor's canonical order
 */
public record MinimalityWitness(String element, String deletion, String contraction) {
    public MinimalityWitness {
        if (!deletion.matches("[+-]*") || !contraction.matches("[+-]*")) {
            throw new IllegalArgumentException("Witness signs of element " + element + " must be '+' and '-' only.");
        }
    }
}
