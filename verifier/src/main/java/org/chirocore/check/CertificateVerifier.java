package org.chirocore.check;

import java.io.EOFException;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.CodingErrorAction;
import java.nio.file.LinkOption;
import java.security.DigestInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;

import org.chirocore.check.ParsedCertificate.Witness;
import org.chirocore.check.VerificationReport.Check;
import org.chirocore.check.VerificationReport.Status;

/**
 * Verifies a certificate of a minor-minimal non-orientable matroid (docs/certificate-format.md),
 * running the spec's eight checks in order and regenerating everything it relies on: the CNF from
 * the listed relations, the minors' bases, the rebuilt construction. It never throws on bad input:
 * every problem becomes a FAIL line naming the first offending item, and checks that depend on a
 * failed one are reported as NOT_RUN.
 *
 * <p>Cost, for b bases of rank r on n elements: basis exchange O(b² r² log b); the DRAT check the
 * unit propagation of the proof, the LRAT check the size of its hinted clauses; a sign witness
 * O(b r² n² log b), a matrix witness C(n − 1, r') exact r' × r' rank tests (r' its rank); the
 * provenance one exact rank per r-subset of the core's ground set.
 */
public final class CertificateVerifier {
    public static final String FORMAT = "format";
    public static final String HASH = "sha256";
    public static final String CORE = "basis exchange";
    public static final String NORMALISATION = "normalisation";
    public static final String RELATIONS = "relations";
    public static final String PROOF = "clausal proof";
    public static final String MINIMALITY = "minimality witnesses";
    public static final String PROVENANCE = "provenance";
    /** The check names, in the spec's order. */
    public static final List<String> CHECKS = List.of(FORMAT, HASH, CORE, NORMALISATION, RELATIONS, PROOF, MINIMALITY, PROVENANCE);

    private CertificateVerifier() {
    }

    /** Verifies the certificate in {@code file}; a given-matroid provenance is reported as not run. */
    public static VerificationReport verify(Path file) {
        return verify(file, Optional.empty());
    }

    /** Verifies the certificate in {@code file}, reading a given matroid's file from {@code input} if present. */
    public static VerificationReport verify(Path file, Optional<Path> input) {
        Path dir = file.toAbsolutePath().getParent();
        try {
            return verify(readRegularFile(file, VerifierLimits.MAX_CERTIFICATE_BYTES), dir, input, file.toString());
        } catch (IOException e) {
            return new VerificationReport(file.toString(), notRun(List.of(new Check(FORMAT, Status.FAIL, "cannot read the file: " + e.getMessage())),
                    "the file could not be read"), 0);
        }
    }

    /**
     * The bytes of {@code file}, which must be a regular file (not a directory, FIFO or device) of
     * at most {@code max} bytes; both are checked before reading.
     */
    static byte[] readRegularFile(Path file, long max) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new IOException(Files.exists(file) ? "not a regular file" : "no such file");
        }
        if (Files.size(file) > max) {
            throw new IOException("the file has " + Files.size(file) + " bytes, more than the verifier's limit of " + max);
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] bytes = in.readNBytes((int) max + 1);
            if (bytes.length > max) {
                throw new IOException("the file grew beyond the verifier's limit of " + max + " bytes while being read");
            }
            return bytes;
        }
    }

    /**
     * Verifies a certificate given as bytes.
     *
     * @param baseDir the directory in which a {@code dratFile} or {@code lratFile} is looked up
     * @param input the matroid file of a given-matroid provenance, if any
     */
    public static VerificationReport verify(byte[] bytes, Path baseDir, Optional<Path> input) {
        return verify(bytes, baseDir, input, "(" + bytes.length + " bytes)");
    }

    private static VerificationReport verify(byte[] bytes, Path baseDir, Optional<Path> input, String source) {
        long start = System.nanoTime();
        List<Check> checks = new ArrayList<>();
        ParsedCertificate certificate;
        try {
            certificate = ParsedCertificate.read(JsonTree.parse(bytes));
        } catch (JsonTree.Malformed e) {
            checks.add(new Check(FORMAT, Status.FAIL, "not valid JSON: " + e.getMessage()));
            return new VerificationReport(source, notRun(checks, "the file is not JSON"), elapsed(start));
        } catch (JsonTree.Mistyped e) {
            checks.add(new Check(FORMAT, Status.FAIL, e.getMessage()));
            return new VerificationReport(source, notRun(checks, "the file is not a certificate of this format"), elapsed(start));
        } catch (RuntimeException | OutOfMemoryError | StackOverflowError e) {
            // a bug or exhausted resources must still give a FAIL line, never an accepted certificate
            checks.add(new Check(FORMAT, Status.FAIL, failure(e)));
            return new VerificationReport(source, notRun(checks, "the file could not be read"), elapsed(start));
        }
        checks.add(new Check(FORMAT, Status.PASS, "chirocore-certificate version 1, rank " + certificate.rank() + " on "
                + certificate.labels().size() + " elements, " + certificate.bases().size() + " bases"));
        Verification v = new Verification(certificate, baseDir, input);
        checks.add(run(HASH, v::hash));
        Check core = run(CORE, v::core);
        checks.add(core);
        if (core.status() != Status.PASS) {
            return new VerificationReport(source, notRun(checks, "the core's bases are not valid"), elapsed(start));
        }
        checks.add(run(NORMALISATION, v::normalisation));
        Check relations = run(RELATIONS, v::relations);
        checks.add(relations);
        checks.add(relations.status() == Status.PASS ? run(PROOF, v::proof)
                : new Check(PROOF, Status.NOT_RUN, "not checked because a relation is invalid"));
        checks.add(run(MINIMALITY, v::minimality));
        checks.add(run(PROVENANCE, v::provenance));
        return new VerificationReport(source, checks, elapsed(start));
    }

    private static long elapsed(long start) {
        return (System.nanoTime() - start) / 1_000_000;
    }

    /** {@code done} followed by the remaining checks as NOT_RUN. */
    private static List<Check> notRun(List<Check> done, String because) {
        List<Check> out = new ArrayList<>(done);
        for (String name : CHECKS.subList(done.size(), CHECKS.size())) {
            out.add(new Check(name, Status.NOT_RUN, "not checked because " + because));
        }
        return out;
    }

    /** A failed check; the message names the first offending item. */
    static final class Failure extends Exception {
        private static final long serialVersionUID = 1L;

        Failure(String message) {
            super(message);
        }
    }

    /** A check that cannot run without more input. */
    static final class Skipped extends Exception {
        private static final long serialVersionUID = 1L;

        Skipped(String message) {
            super(message);
        }
    }

    interface Step {
        /** Runs the check; returns what was checked. */
        String run() throws Failure, Skipped, IOException, ProvenanceCheck.Mismatch;
    }

    /** Runs one check: PASS with what was checked, FAIL with the first offence, NOT_RUN when skipped; never throws. */
    static Check run(String name, Step step) {
        try {
            return new Check(name, Status.PASS, step.run());
        } catch (Failure | ProvenanceCheck.Mismatch | JsonTree.Mistyped e) {
            return new Check(name, Status.FAIL, e.getMessage());
        } catch (Skipped e) {
            return new Check(name, Status.NOT_RUN, e.getMessage());
        } catch (JsonTree.Malformed e) {
            return new Check(name, Status.FAIL, "not valid JSON: " + e.getMessage());
        } catch (IOException e) {
            return new Check(name, Status.FAIL, "cannot read: " + e.getMessage());
        } catch (ArithmeticException e) {
            return new Check(name, Status.FAIL, "exact 64-bit arithmetic overflowed (" + e.getMessage() + "); not checked");
        } catch (RuntimeException | OutOfMemoryError | StackOverflowError e) {
            // a bug or exhausted resources must still give a FAIL line, never an accepted certificate
            return new Check(name, Status.FAIL, failure(e));
        }
    }

    /** The FAIL detail for an unexpected exception or an exhausted resource. */
    private static String failure(Throwable e) {
        if (e instanceof OutOfMemoryError) {
            return "the verifier ran out of memory (" + e.getMessage() + "); not checked";
        }
        if (e instanceof StackOverflowError) {
            return "the verifier ran out of stack; not checked";
        }
        return "internal error of the verifier: " + e;
    }

    /** The SHA-256 of {@code bytes} as 64 lower-case hex digits. */
    static String sha256(byte[] bytes) {
        return HexFormat.of().formatHex(sha256().digest(bytes));
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("Every Java platform has SHA-256.", e);
        }
    }

    /** A stream that fails with a message naming {@code what} once more than {@code max} bytes are read from it. */
    private static final class CappedInputStream extends FilterInputStream {
        private final long max;
        private final String what;
        private long count;

        CappedInputStream(InputStream in, long max, String what) {
            super(in);
            this.max = max;
            this.what = what;
        }

        @Override
        public int read() throws IOException {
            int b = super.read();
            count(b < 0 ? 0 : 1);
            return b;
        }

        @Override
        public int read(byte[] buffer, int offset, int length) throws IOException {
            int n = super.read(buffer, offset, length);
            count(Math.max(n, 0));
            return n;
        }

        private void count(int n) throws IOException {
            count += n;
            if (count > max) {
                throw new IOException(what + " has more than " + max + " bytes, the verifier's limit");
            }
        }
    }

    /** The checks of one parsed certificate; each fills in what the later ones need. */
    private static final class Verification {
        private final ParsedCertificate c;
        private final Path baseDir;
        private final Optional<Path> input;
        private final int n;
        private BasisTable core;
        /** The stated automorphisms already checked, as {@code Arrays.toString} of their images. */
        private final Set<String> checkedAutomorphisms = new HashSet<>();
        private Cnf cnf;

        Verification(ParsedCertificate c, Path baseDir, Optional<Path> input) {
            this.c = c;
            this.baseDir = baseDir;
            this.input = input;
            this.n = c.labels().size();
        }

        String hash() throws Failure {
            String actual = sha256(JsonTree.canonical(c.content()).getBytes(StandardCharsets.UTF_8));
            if (!actual.equals(c.sha256())) {
                throw new Failure("the canonical content hashes to " + actual + ", not the recorded " + c.sha256());
            }
            return actual;
        }

        /** The bases are sorted sets of size r in canonical order and satisfy basis exchange ([Ox, §1.2]). */
        String core() throws Failure {
            List<int[]> bases = new ArrayList<>();
            for (int i = 0; i < c.bases().size(); i++) {
                bases.add(set(c.bases().get(i), "basis " + (i + 1), c.rank()));
                if (i > 0 && java.util.Arrays.compare(bases.get(i - 1), bases.get(i)) >= 0) {
                    throw new Failure("basis " + (i + 1) + " " + BasisTable.set(bases.get(i)) + " does not come after basis " + i + " "
                            + BasisTable.set(bases.get(i - 1)) + " in lexicographic order (or repeats it)");
                }
            }
            core = new BasisTable(n, c.rank(), bases);
            Optional<String> defect = core.exchangeDefect();
            if (defect.isPresent()) {
                throw new Failure("basis exchange fails: " + defect.get());
            }
            return bases.size() + " distinct bases in canonical order; basis exchange holds";
        }

        /** {@code elements} (a copy), after checking it is a sorted set of distinct elements of the core, of the given size. */
        private int[] set(int[] elements, String what, int size) throws Failure {
            return RefutationCheck.set(n, elements, what, size);
        }

        /** The normalised bases are bases and the vectors (1, 1_B) are GF(2)-independent (docs/mathematics.md §4). */
        String normalisation() throws Failure {
            RefutationCheck.independent(n, RefutationCheck.normalised(core, c.normalised()));
            return c.normalised().size() + " bases fixed to +1, GF(2)-independent";
        }

        /** Every relation is well formed with 0, 2 or 3 non-zero terms; builds the spec's CNF. */
        String relations() throws Failure {
            cnf = RefutationCheck.cnf(core, RefutationCheck.normalised(core, c.normalised()), c.relations());
            return c.relations().size() + " relations; CNF of " + core.count() + " variables and " + cnf.clauses().size() + " clauses";
        }

        /**
         * The proof refutes the regenerated CNF: an LRAT proof by following its hints (linear in
         * its size), a DRAT proof by unit propagation and RAT.
         */
        String proof() throws Failure, IOException {
            DratChecker.Outcome outcome = c.proofFile().isPresent() ? proofFile(c.proofFile().get())
                    : c.lrat().isPresent() ? LratChecker.check(cnf, new StringReader(c.lrat().get()))
                    : DratChecker.check(cnf, c.drat().get());
            if (!outcome.valid()) {
                throw new Failure(outcome.failure());
            }
            return "the empty clause is derived (" + outcome.summary() + ")";
        }

        /**
         * Checks the proof in the file named by {@code dratFile} or {@code lratFile}: a regular file
         * (not a symbolic link, FIFO or device) beside the certificate, gzip-compressed when its name
         * ends in .gz, at most {@link VerifierLimits#MAX_PROOF_BYTES} bytes before and after
         * decompression, streamed through the DRAT or LRAT checker; a valid proof is then hashed to
         * its end and the hash compared.
         */
        private DratChecker.Outcome proofFile(ParsedCertificate.ProofFile proof) throws Failure, IOException {
            String name = proof.name();
            if (name.isEmpty() || name.contains("/") || name.contains("\\") || name.equals("..") || name.equals(".")) {
                throw new Failure(proof.member() + " \"" + Escaping.printable(name) + "\" must be a plain file name beside the certificate");
            }
            Path file = baseDir.resolve(name);
            if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
                throw new Failure("the proof file " + Escaping.printable(name) + (Files.isSymbolicLink(file)
                        ? " is a symbolic link; it must be a regular file beside the certificate"
                        : Files.exists(file) ? " is not a regular file" : " does not exist"));
            }
            if (Files.size(file) > VerifierLimits.MAX_PROOF_BYTES) {
                throw new Failure("the proof file " + Escaping.printable(name) + " has " + Files.size(file)
                        + " bytes, more than the verifier's limit of " + VerifierLimits.MAX_PROOF_BYTES);
            }
            MessageDigest sha = sha256();
            DratChecker.Outcome outcome;
            try (InputStream raw = Files.newInputStream(file, LinkOption.NOFOLLOW_LINKS);
                    InputStream in = new DigestInputStream(new CappedInputStream(name.endsWith(".gz") ? new GZIPInputStream(raw) : raw,
                            VerifierLimits.MAX_PROOF_BYTES, "the uncompressed " + Escaping.printable(name)), sha)) {
                Reader text = new InputStreamReader(in, StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT));
                outcome = proof.lrat() ? LratChecker.check(cnf, text) : DratChecker.check(cnf, text);
                if (!outcome.valid()) {
                    return outcome;
                }
                in.transferTo(OutputStream.nullOutputStream());
            } catch (ZipException | EOFException e) {
                // only decompression throws these: a truncated or corrupted .gz file
                throw new Failure("the proof file " + Escaping.printable(name) + " is not a complete gzip file (" + e.getMessage() + ")");
            }
            String actual = HexFormat.of().formatHex(sha.digest());
            if (!actual.equals(proof.sha256())) {
                throw new Failure("the uncompressed " + Escaping.printable(name) + " hashes to " + actual + ", not the recorded "
                        + Escaping.printable(proof.sha256()));
            }
            return outcome;
        }

        /**
         * Each witness orients its minor: a sign string has one sign per basis and satisfies every
         * 3-term relation ([BLSWZ, Thm. 3.6.2]); a transported one refers to an explicit witness of
         * the same kind through a stated automorphism (docs/verifier.md, "Witnesses by symmetry");
         * a matrix has non-zero maximal minors exactly on the bases ({@link MatrixWitness}). The
         * work of all witnesses is bounded before any is checked.
         */
        String minimality() throws Failure {
            long relations = 0;
            long determinants = 0;
            int transported = 0;
            int matrices = 0;
            for (int e = 0; e < n; e++) {
                Witness w = c.witnesses().get(e);
                for (boolean contract : new boolean[] {false, true}) {
                    JsonTree.Value witness = contract ? w.contraction() : w.deletion();
                    BasisTable.Shape minor = core.minorShape(e, contract);
                    if (witness instanceof JsonTree.Str) {
                        relations = saturatingAdd(relations, Relations.evaluations(minor));
                    } else if (isMatrix(witness)) {
                        determinants = saturatingAdd(determinants, MatrixWitness.steps(minor));
                        matrices++;
                    } else if (TransportedWitness.isTransported(witness)) {
                        transported++;
                    }
                }
            }
            if (relations > VerifierLimits.MAX_WITNESS_RELATIONS) {
                throw new Failure("the sign witnesses need " + relations + " relation evaluations, more than the verifier's limit of "
                        + VerifierLimits.MAX_WITNESS_RELATIONS + "; not checked");
            }
            if (determinants > VerifierLimits.MAX_DETERMINANT_STEPS) {
                throw new Failure("the matrix witnesses need " + determinants + " elimination steps, more than the verifier's limit of "
                        + VerifierLimits.MAX_DETERMINANT_STEPS + " (MAX_DETERMINANT_STEPS); not checked");
            }
            // per transported witness: one lookup per basis of its minor, and at most one per basis of the core for its automorphism
            long lookups = 2L * transported * core.count();
            if (lookups > VerifierLimits.MAX_TRANSPORT_LOOKUPS) {
                throw new Failure("the transported witnesses need " + lookups + " basis lookups, more than the verifier's limit of "
                        + VerifierLimits.MAX_TRANSPORT_LOOKUPS + "; not checked");
            }
            for (int e = 0; e < n; e++) {
                Witness w = c.witnesses().get(e);
                if (!w.element().equals(c.labels().get(e))) {
                    throw new Failure("minimality[" + e + "] is for element \"" + w.element() + "\", expected \"" + c.labels().get(e) + "\"");
                }
                witness(e, false, w.deletion(), "the deletion witness of " + w.element());
                witness(e, true, w.contraction(), "the contraction witness of " + w.element());
            }
            return 2 * n + " witnesses orient every single-element deletion and contraction (" + (2 * n - transported - matrices)
                    + " by signs, " + transported + " transported"
                    + (transported == 0 ? "" : " by " + checkedAutomorphisms.size() + " stated automorphisms") + ", " + matrices
                    + " by matrices)";
        }

        private static long saturatingAdd(long a, long b) {
            return a > Long.MAX_VALUE - b ? Long.MAX_VALUE : a + b;
        }

        private static boolean isMatrix(JsonTree.Value witness) {
            return witness instanceof JsonTree.Obj o && o.has("matrix");
        }

        /**
         * Checks the witness of the minor at e (core/e when {@code contraction}, else core\e),
         * dispatching on its form: a sign string, or an object naming its kind.
         */
        private void witness(int e, boolean contraction, JsonTree.Value witness, String what) throws Failure {
            BasisTable minor = contraction ? core.contraction(e) : core.deletion(e);
            if (witness instanceof JsonTree.Str s) {
                Optional<String> bad = Relations.violated(minor, signs(minor, s.value(), what));
                if (bad.isPresent()) {
                    throw new Failure(what + ": " + bad.get() + " (elements numbered in the minor)");
                }
            } else if (TransportedWitness.isTransported(witness)) {
                transported(e, contraction, minor, TransportedWitness.Stated.read((JsonTree.Obj) witness, what), what);
            } else if (isMatrix(witness)) {
                MatrixWitness.check(minor, (JsonTree.Obj) witness, what);
            } else {
                throw new Failure(what + " is an object without \"image\" or \"matrix\"; a witness is a sign string, "
                        + "{\"image\": label, \"under\": [...]} or {\"matrix\": [...]}");
            }
        }

        /**
         * A transported witness: its image f names a core element whose witness of the same kind
         * is a sign string, its permutation σ is an automorphism of the core with σ(f) = e, and the
         * relabelled signs have the minor's bases as support.
         */
        private void transported(int e, boolean contraction, BasisTable minor, TransportedWitness.Stated t, String what) throws Failure {
            int f = c.labels().indexOf(t.image());
            if (f < 0) {
                throw new Failure(what + " is transported from \"" + Escaping.printable(t.image()) + "\", which is not a core element");
            }
            Witness source = c.witnesses().get(f);
            if (!((contraction ? source.contraction() : source.deletion()) instanceof JsonTree.Str signs)) {
                throw new Failure(what + " is transported from the " + (contraction ? "contraction" : "deletion") + " witness of "
                        + Escaping.printable(t.image()) + ", which is not given by its signs (a transported witness must refer to an "
                        + "explicit one)");
            }
            if (checkedAutomorphisms.add(Arrays.toString(t.under()))) {
                TransportedWitness.checkAutomorphism(core, t.under(), what);
            }
            if (t.under()[f] != e) {
                throw new Failure(what + ": the permutation " + Arrays.toString(t.under()) + " maps its image " + f + " (\""
                        + Escaping.printable(t.image()) + "\") to " + t.under()[f] + ", not to " + e);
            }
            BasisTable from = contraction ? core.contraction(f) : core.deletion(f);
            String sourceWhat = "the " + (contraction ? "contraction" : "deletion") + " witness of " + Escaping.printable(t.image());
            TransportedWitness.transport(from, f, signs(from, signs.value(), sourceWhat), minor, e, t.under(), what);
        }

        /** The signs of a sign string, one per basis of {@code minor}: +1 for '+', −1 for '-'. */
        private static int[] signs(BasisTable minor, String signs, String what) throws Failure {
            if (signs.length() != minor.count()) {
                throw new Failure(what + " has " + signs.length() + " signs; the minor has " + minor.count() + " bases");
            }
            int[] values = new int[signs.length()];
            for (int i = 0; i < values.length; i++) {
                char s = signs.charAt(i);
                if (s != '+' && s != '-') {
                    throw new Failure(what + " has '" + s + "' at position " + i + "; only '+' and '-' are signs");
                }
                values[i] = s == '+' ? 1 : -1;
            }
            return values;
        }

        String provenance() throws ProvenanceCheck.Mismatch, Skipped, IOException {
            Optional<String> rebuilt = ProvenanceCheck.rebuild(c.provenance(), c.labels(), core, input);
            if (rebuilt.isEmpty()) {
                throw new Skipped("the provenance is well formed, but a given matroid can only be rebuilt from its file; "
                        + "run verify with --input FILE");
            }
            return rebuilt.get();
        }
    }
}
