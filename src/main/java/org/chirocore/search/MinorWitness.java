package org.chirocore.search;

import org.chirocore.orient.Chirotope;

/**
 * Proof that one single-element minor of a core is orientable: a chirotope of M\e or M/e that was
 * re-checked against every 3-term Grassmann–Plücker relation of that minor.
 *
 * @param element the label of e
 * @param operation deletion or contraction of e
 * @param witness a chirotope of the minor, on the minor's own labels and bases
 */
public record MinorWitness(String element, Operation operation, Chirotope witness) {
}
