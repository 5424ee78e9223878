package org.chirocore.pipeline;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.Source;
import org.chirocore.matroid.Construction;
import org.chirocore.matroid.Matroid;

/**
 * A matroid to reduce, resolved once: the matroid, its provenance and its focus.
 *
 * @param matroid the matroid as a rank oracle
 * @param source how a certificate names it
 * @param focus labels to contract first when it is too large to enumerate; may be empty
 * @param file the matroid file a given matroid was read from, which the verifier needs to check
 *     its provenance (the digest and the path); empty for a construction, which it rebuilds
 */
public record Subject(Matroid matroid, Source source, List<String> focus, Optional<Path> file) {
    public Subject {
        focus = List.copyOf(focus);
    }

    /** A subject with no input file (a construction, or a matroid not read from a file). */
    public Subject(Matroid matroid, Source source, List<String> focus) {
        this(matroid, source, focus, Optional.empty());
    }

    /**
     * Builds {@code construction} once and takes its focus.
     *
     * @throws IllegalArgumentException when the construction is invalid (see {@link Construction#build})
     */
    public static Subject of(Construction construction) {
        Matroid m = construction.build();
        return new Subject(m, new Source.Constructed(construction), construction.focus());
    }

    /**
     * A matroid read from a file whose bytes have SHA-256 {@code sha256}; no focus.
     *
     * @throws IllegalArgumentException when the digest is not 64 lower-case hex digits
     */
    public static Subject given(Matroid matroid, String sha256) {
        return new Subject(matroid, new Source.Given(sha256, matroid.size(), matroid.rank()), List.of());
    }

    /**
     * The matroid read from {@code file}, whose bytes have SHA-256 {@code sha256}; no focus. The
     * pipeline hands {@code file} to the verifier, so the certificate's provenance is checked.
     *
     * @throws IllegalArgumentException when the digest is not 64 lower-case hex digits
     */
    public static Subject read(Matroid matroid, String sha256, Path file) {
        return new Subject(matroid, new Source.Given(sha256, matroid.size(), matroid.rank()), List.of(),
                Optional.of(file));
    }

    /** The same subject with no focus: the search then treats every element alike. */
    public Subject withoutFocus() {
        return new Subject(matroid, source, List.of(), file);
    }
}
