package org.chirocore.matroid;

import java.util.List;
import java.util.Objects;

/**
 * A recipe for a matroid that a certificate can name and the independent verifier can rebuild:
 * the matroid it builds, the elements where its non-orientability is expected to sit (the
 * <em>focus</em>, contracted first when the matroid is too large to enumerate), and the members
 * of the certificate's {@code provenance.construction} that describe it.
 *
 * <p>A new construction is one implementation of this interface plus its rebuild in the
 * verifier. {@link #build()} may be expensive (it validates the recipe); callers build once per
 * run and pass the matroid on. {@link #focus()} and {@link #provenance()} are cheap after a
 * successful build.
 */
public interface Construction {

    /**
     * The matroid as a rank oracle.
     *
     * @throws IllegalArgumentException when the recipe is invalid, with a full sentence naming
     *     the offending part (subclasses such as {@link InvalidHyperplaneException} and
     *     {@link GeneralPositionException} say more)
     */
    Matroid build();

    /** Labels of the elements to contract first when the matroid is too large to enumerate; may be empty. */
    List<String> focus();

    /** The members of {@code provenance.construction}, in the order the certificate lists them. */
    List<Part> provenance();

    /**
     * One member of a construction's provenance.
     *
     * @param name the member's name
     * @param value an {@link Integer}, {@link Boolean}, {@link String} or list of strings
     */
    record Part(String name, Object value) {
        public Part {
            Objects.requireNonNull(name, "A provenance member needs a name.");
            boolean strings = value instanceof List<?> l && l.stream().allMatch(String.class::isInstance);
            if (!(value instanceof Integer || value instanceof Boolean || value instanceof String || strings)) {
                throw new IllegalArgumentException("Provenance member " + name
                        + " must be an integer, a boolean, a string or a list of strings, not " + value + ".");
            }
            value = strings ? List.copyOf((List<?>) value) : value;
        }
    }
}
