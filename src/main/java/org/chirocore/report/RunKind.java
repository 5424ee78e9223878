package org.chirocore.report;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;

/**
 * A kind of run directory the report knows: how to recognise one, which of its certificates
 * belong to the run, and what the run's own record (its table) says. {@link RunReport} adds what
 * every kind shares: each certificate verified, its core named, described and drawn, and an
 * index. A new kind of run (a sweep, an enumeration) is one implementation added to
 * {@link RunReport#KINDS}.
 */
public interface RunKind {
    /** What the run is, in words, e.g. "family run". */
    String name();

    /** Whether {@code dir} is a run of this kind (its record file is there). */
    boolean recognises(Path dir);

    /** The report's title. */
    String title(Path dir);

    /**
     * The run's certificates, in the order the report lists them, each with a short caption
     * (such as "n = 5").
     */
    List<Member> certificates(Path dir);

    /**
     * What the run's own record says: settings, tables and charts.
     *
     * @param classOf the isomorphism class of a certificate's core, as a table cell: its symbol
     *     when it is in the catalogue and the certificate verifies, otherwise words saying which
     */
    List<Document.Block> summary(Path dir, Function<Path, Document.Inline> classOf);

    /**
     * A certificate of a run.
     *
     * @param caption how the report heads it, e.g. "n = 5"
     * @param file the certificate file
     */
    record Member(String caption, Path file) {
    }
}
