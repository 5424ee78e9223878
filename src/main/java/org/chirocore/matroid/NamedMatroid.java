package org.chirocore.matroid;

/**
 * A matroid with a name in the literature, as {@link Catalogue} lists it.
 *
 * @param symbol its usual symbol in plain text, e.g. {@code F7*} or {@code AG(2,3)\e}
 * @param latex the same symbol for LaTeX math mode, e.g. {@code F_7^*}
 * @param name its name in words, e.g. "the dual of the Fano plane"
 * @param source where it is described (author, title, section)
 * @param matroid the matroid itself, materialised
 */
public record NamedMatroid(String symbol, String latex, String name, String source, ExplicitMatroid matroid) {
    /** "the Fano plane F7": the name in words followed by the symbol. */
    public String title() {
        return name + " " + symbol;
    }
}
