package org.chirocore.pipeline;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.Certification;
import org.chirocore.cert.CoreFinding;
import org.chirocore.cert.CertificateForms;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.AtomicFiles;
import org.chirocore.io.Json;
import org.chirocore.matroid.Limits;
import org.chirocore.orient.Budget;
import org.chirocore.orient.Chirotope;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;

/**
 * The one certified pipeline: reduce a {@link Subject} to a minor-minimal non-orientable core,
 * certify the core (a proof-logging refutation of its orientability constraints plus the
 * re-checked minimality witnesses), write the certificate atomically, and verify the written
 * file with the independent checker ({@link CertificateVerifier}) before reporting success.
 * {@code reduce}, the family commands (run, explore, predict) and every other command that
 * writes a certificate go through here, so a success always means a file that verifies.
 *
 * <p>Use: {@code new CertifiedReduction(settings, progress).run(subject, out)} for the whole chain;
 * {@link #certify} when the core was found otherwise (a prediction checked directly, or a
 * representative chosen among several searches). The result is sealed: {@link Verified} (a
 * verified certificate in {@code out}), {@link Orientable} (with a checked chirotope, nothing
 * written) or {@link Unknown} (a budget ran out, nothing written, nothing claimed).
 *
 * <p>Cost: the search's, plus one orientability decision of the core with proof logging, one
 * relation scan per minimality witness, and the verifier's run over the written file.
 */
public final class CertifiedReduction {

    /** What the pipeline produced. */
    public sealed interface Outcome {
    }

    /**
     * A certificate of minor-minimal non-orientability, written and accepted by the verifier.
     * The verifier rebuilds a construction and checks the path from it; a given matroid's
     * provenance is checked against its input file when the subject names one, and is otherwise
     * listed in {@link Checked#notChecked}, never reported as passed.
     *
     * @param certificate what was certified
     * @param written the files written and the content digest
     * @param verification the verifier's acceptance of the written file
     */
    public record Verified(Certificate certificate, CertificateWriter.Written written, Checked verification)
            implements Outcome {
    }

    /**
     * The subject is orientable; no certificate was written.
     *
     * @param witness a chirotope of the subject, checked against every 3-term relation
     */
    public record Orientable(Chirotope witness) implements Outcome {
    }

    /**
     * No answer: a budget ran out during the search or the refutation; nothing was written.
     *
     * @param reason why, in words
     */
    public record Unknown(String reason) implements Outcome {
    }

    /**
     * How to reduce: the search's seed and strategy, and the budget of every orientability
     * decision and of the refutation. The focus is the subject's.
     *
     * @param seed the seed of the element order
     * @param strategy which single-element minors to try first
     * @param budget the budget of each decision and of the refutation
     * @param forms the forms of the minimality witnesses and of the refutation written
     */
    public record Settings(long seed, Strategy strategy, Budget budget, CertificateForms forms) {
        public Settings {
            if (strategy == null || budget == null || forms == null) {
                throw new IllegalArgumentException("Pipeline settings need a strategy, a budget and certificate forms.");
            }
        }

        /** Settings writing sign witnesses and every relation the refutation's loop added. */
        public Settings(long seed, Strategy strategy, Budget budget) {
            this(seed, strategy, budget, CertificateForms.DEFAULT);
        }

        /** The search settings for {@code subject}: these, with its focus. */
        public SearchSettings search(Subject subject) {
            return new SearchSettings(seed, strategy, budget, subject.focus());
        }
    }

    private final Settings settings;
    private final Progress progress;

    /** A pipeline with {@code settings}, reporting the search's progress to {@code progress}. */
    public CertifiedReduction(Settings settings, Progress progress) {
        this.settings = settings;
        this.progress = progress;
    }

    /**
     * Reduces {@code subject}, and certifies, writes and verifies its core into {@code out}.
     * The search's focus is the subject's.
     *
     * @throws IOException when the certificate cannot be written or read back
     * @throws IllegalStateException when the verifier rejects the certificate just written (a
     *     bug: the files are removed), or a witness fails its re-check
     */
    public Outcome run(Subject subject, Path out) throws IOException {
        SearchResult result = new UnsatCoreSearch(settings.search(subject), progress).reduce(subject.matroid());
        if (result instanceof SearchResult.Orientable o) {
            return new Orientable(o.witness());
        }
        if (result instanceof SearchResult.Unknown u) {
            return new Unknown(u.reason());
        }
        CoreFinding found = CoreFinding.searched(((SearchResult.Found) result).core(), subject.source());
        return certify(found, settings.budget(), out, subject.file(), settings.forms());
    }

    /**
     * Certifies {@code found}, writes the certificate to {@code out} (a large proof beside it)
     * and verifies the written file. Returns {@link Verified} or {@link Unknown} (a budget ran out,
     * or the proof lists more relations than {@link Limits#CERTIFIED_RELATIONS} or has more bytes
     * than {@link Limits#PROOF_BYTES}; nothing written).
     *
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException when the core turns out orientable, a witness fails its
     *     re-check, or the verifier rejects the file (the files are then removed)
     */
    public static Outcome certify(CoreFinding found, Budget budget, Path out) throws IOException {
        return certify(found, budget, out, Optional.empty());
    }

    /**
     * As {@link #certify(CoreFinding, Budget, Path)}, for a core of a matroid read from {@code input}:
     * the verifier then also checks the provenance against that file.
     *
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException as for {@link #certify(CoreFinding, Budget, Path)}
     */
    public static Outcome certify(CoreFinding found, Budget budget, Path out, Optional<Path> input) throws IOException {
        return certify(found, budget, out, input, CertificateForms.DEFAULT);
    }

    /**
     * As {@link #certify(CoreFinding, Budget, Path, Optional)}, with the minimality witnesses and
     * the refutation in {@code forms} (a matrix where the core's construction realises a minor,
     * with {@code WitnessForms.MATRICES}; the relations cut down to an unsatisfiable core on request).
     *
     * @throws IOException when a file cannot be written
     * @throws IllegalStateException as for {@link #certify(CoreFinding, Budget, Path)}
     */
    public static Outcome certify(CoreFinding found, Budget budget, Path out, Optional<Path> input, CertificateForms forms)
            throws IOException {
        Certification certification = Certification.of(found, budget, forms);
        if (certification instanceof Certification.OutOfBudget o) {
            return new Unknown("proving the core ran out of budget: " + o.reason());
        }
        Certificate certificate = ((Certification.Certified) certification).certificate();
        int relations = certificate.refutation().relations().size();
        if (relations > Limits.CERTIFIED_RELATIONS) {
            return new Unknown("the proof needs " + relations + " 3-term relations, more than the "
                    + Limits.CERTIFIED_RELATIONS + " a certificate may list (the verifier's limit); nothing was written");
        }
        long proofBytes = certificate.proofText().length();
        if (proofBytes > Limits.PROOF_BYTES) {
            return new Unknown("the proof has " + proofBytes + " bytes, more than the " + Limits.PROOF_BYTES
                    + " a certificate's proof may have (the verifier's limit); nothing was written");
        }
        CertificateWriter.Written written = CertificateWriter.write(certificate, out);
        return new Verified(certificate, written, verifyWritten(out, written.proofFile(), input));
    }

    /**
     * The verifier's acceptance of a written certificate.
     *
     * @param verifyMillis the verifier's wall-clock time
     * @param notChecked the names of the checks that did not run (a given matroid's provenance)
     */
    public record Checked(long verifyMillis, List<String> notChecked) {
        public Checked {
            notChecked = List.copyOf(notChecked);
        }
    }

    /**
     * Writes a certificate document assembled elsewhere (e.g. the readable-proof variant of
     * {@code explain}) to {@code out} atomically and verifies the written file.
     *
     * @throws IOException when the file cannot be written
     * @throws IllegalStateException when the verifier rejects the file (it is then removed)
     */
    public static Checked writeVerified(Json.Obj document, Path out) throws IOException {
        AtomicFiles.writeJson(out, document);
        return verifyWritten(out, Optional.empty(), Optional.empty());
    }

    /** Verifies {@code out}; on rejection removes it and its proof file and throws. */
    private static Checked verifyWritten(Path out, Optional<Path> proofFile, Optional<Path> input) throws IOException {
        VerificationReport report = CertificateVerifier.verify(out, input);
        if (!report.passed()) {
            Files.deleteIfExists(out);
            if (proofFile.isPresent()) {
                Files.deleteIfExists(proofFile.get());
            }
            throw new IllegalStateException("The verifier rejected the certificate just written to " + out + " ("
                    + firstFailure(report) + "); it was removed.");
        }
        return new Checked(report.millis(), report.checks().stream().filter(c -> c.status() == VerificationReport.Status.NOT_RUN)
                .map(VerificationReport.Check::name).toList());
    }

    private static String firstFailure(VerificationReport report) {
        return report.checks().stream().filter(c -> c.status() == VerificationReport.Status.FAIL)
                .map(c -> c.name() + ": " + c.detail()).findFirst().orElse("no check failed");
    }
}
