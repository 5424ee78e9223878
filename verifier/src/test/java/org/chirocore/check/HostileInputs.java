package org.chirocore.check;

import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPOutputStream;

/**
 * A benchmark of hostile inputs: writes certificates and proofs of about 10 MB each that were
 * built to make a verifier work for hours or exhaust its heap, verifies each, and prints one line
 * per case with its size, the verifier's time and its verdict. Run it in a JVM with a 1 GB heap
 * ({@code HostileInputTest} does); every case must end in a FAIL line, and no stack trace.
 *
 * <pre>java -Xmx1g -cp CLASSPATH org.chirocore.check.HostileInputs DIR</pre>
 */
public final class HostileInputs {
    private HostileInputs() {
    }

    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args[0]);
        List<Path> cases = new ArrayList<>();
        cases.add(nonMatroid(dir));
        cases.add(uniformWithPlusWitnesses(dir));
        cases.add(quadraticDeletions(dir));
        cases.add(gzipBomb(dir));
        for (Path c : cases) {
            long start = System.nanoTime();
            VerificationReport v = CertificateVerifier.verify(c);
            long ms = (System.nanoTime() - start) / 1_000_000;
            // the hash of the content is left wrong on purpose: the checks after it run all the same
            List<String> fails = v.checks().stream().filter(k -> k.status() == VerificationReport.Status.FAIL && !k.name().equals(CertificateVerifier.HASH))
                    .map(k -> k.name() + ": " + (k.detail().length() > 120 ? k.detail().substring(0, 120) + "…" : k.detail())).toList();
            System.out.println(c.getFileName() + " " + totalBytes(c) + " bytes, " + ms + " ms, " + v.word() + "; FAIL after the hash: "
                    + (fails.isEmpty() ? "none" : String.join(" | ", fails)));
        }
    }

    private static long totalBytes(Path certificate) throws IOException {
        long bytes = Files.size(certificate);
        try (var others = Files.list(certificate.getParent())) {
            for (Path p : others.filter(p -> p.getFileName().toString().startsWith(stem(certificate) + ".")).toList()) {
                bytes += p.equals(certificate) ? 0 : Files.size(p);
            }
        }
        return bytes;
    }

    private static String stem(Path p) {
        return p.getFileName().toString().replace(".cert.json", "");
    }

    /** A certificate's text around the given core, normalisation, relations, proof member and witnesses. */
    private static void certificate(Writer out, int n, int rank, List<long[]> bases, String proof, String witness)
            throws IOException {
        out.write("{\"format\": \"chirocore-certificate\", \"version\": 1, \"tool\": \"hostile\", \"sha256\": \"" + "0".repeat(64)
                + "\", \"content\": {\"statement\": \"minor-minimal non-orientable\", \"core\": {\"rank\": " + rank + ", \"labels\": [");
        for (int e = 0; e < n; e++) {
            out.write((e > 0 ? ", " : "") + "\"e" + e + "\"");
        }
        out.write("], \"bases\": [");
        boolean first = true;
        for (long[] b : bases) {
            out.write(first ? "[" : ", [");
            first = false;
            for (int i = 0; i < b.length; i++) {
                out.write((i > 0 ? ", " : "") + b[i]);
            }
            out.write("]");
        }
        out.write("]}, \"provenance\": {\"given\": {\"sha256\": \"" + "0".repeat(64) + "\", \"elements\": " + n + ", \"rank\": " + rank
                + "}, \"path\": {\"contracted\": [], \"deleted\": []}}, \"nonOrientability\": {\"normalised\": [[");
        for (int i = 0; i < rank; i++) {
            out.write((i > 0 ? ", " : "") + i);
        }
        out.write("]], \"relations\": [], " + proof + "}, \"minimality\": [");
        for (int e = 0; e < n; e++) {
            out.write((e > 0 ? ", " : "") + "{\"element\": \"e" + e + "\", \"deletion\": \"" + witness + "\", \"contraction\": \"" + witness + "\"}");
        }
        out.write("]}, \"run\": {}}\n");
    }

    /** The r-subsets of {0..n−1} in lexicographic order. */
    private static List<long[]> subsets(int n, int r) {
        List<long[]> out = new ArrayList<>();
        long[] c = new long[r];
        for (int i = 0; i < r; i++) {
            c[i] = i;
        }
        while (true) {
            out.add(c.clone());
            int i = r - 1;
            while (i >= 0 && c[i] == n - r + i) {
                i--;
            }
            if (i < 0) {
                return out;
            }
            c[i]++;
            for (int j = i + 1; j < r; j++) {
                c[j] = c[j - 1] + 1;
            }
        }
    }

    /** All 5-subsets of 38 elements but two that differ in one element (501 940 sets, no matroid): once 12 minutes of pair checks. */
    private static Path nonMatroid(Path dir) throws IOException {
        List<long[]> bases = subsets(38, 5);
        bases.remove(1);
        bases.remove(0);
        Path file = dir.resolve("non-matroid.cert.json");
        try (Writer out = Files.newBufferedWriter(file)) {
            certificate(out, 38, 5, bases, "\"drat\": \"0\\n\"", "+");
        }
        return file;
    }

    /** U(4, 40) with all-plus witnesses of the right lengths: every minor is a uniform matroid, so the witness check would run long. */
    private static Path uniformWithPlusWitnesses(Path dir) throws IOException {
        Path file = dir.resolve("uniform-witnesses.cert.json");
        try (Writer out = Files.newBufferedWriter(file)) {
            // core\e has C(39, 4) bases; a contraction witness of the wrong length is never reached
            certificate(out, 40, 4, subsets(40, 4), "\"drat\": \"0\\n\"", "+".repeat(82_251));
        }
        return file;
    }

    /**
     * The n = 3 corner certificate (certificates/corner-n3.cert.json) with a proof file of 9 MB:
     * 300 000 copies of the lemma (1 −2 −3), each RUP because basis 1, [0, 1, 2], is the first
     * normalised basis and so a unit clause; then 600 000 deletions of (−2 −3), a clause never
     * added, each searched among those copies: 1.8·10^11 steps without a limit.
     */
    private static Path quadraticDeletions(Path dir) throws IOException {
        String corner = Files.readString(Path.of("certificates/corner-n3.cert.json"));
        if (!corner.contains("\"normalised\": [\n        [0, 1, 2],")) {
            throw new IllegalStateException("corner-n3 no longer normalises basis [0, 1, 2] first");
        }
        Path file = dir.resolve("deletions.cert.json");
        Files.writeString(file, corner.replaceFirst("\"drat\": \"(?:[^\"\\\\]|\\\\.)*\"",
                "\"dratFile\": \"deletions.drat\", \"dratSha256\": \"" + "0".repeat(64) + "\""));
        try (Writer out = Files.newBufferedWriter(dir.resolve("deletions.drat"))) {
            for (int i = 0; i < 300_000; i++) {
                out.write("1 -2 -3 0\n");
            }
            for (int i = 0; i < 600_000; i++) {
                out.write("d -2 -3 0\n");
            }
            out.write("0\n");
        }
        return file;
    }

    /** The same certificate with a gzip proof file of a few hundred KB that inflates to more than the proof limit of blank lines. */
    private static Path gzipBomb(Path dir) throws IOException {
        String corner = Files.readString(Path.of("certificates/corner-n3.cert.json"));
        Path file = dir.resolve("bomb.cert.json");
        Files.writeString(file, corner.replaceFirst("\"drat\": \"(?:[^\"\\\\]|\\\\.)*\"",
                "\"dratFile\": \"bomb.drat.gz\", \"dratSha256\": \"" + "0".repeat(64) + "\""));
        byte[] newlines = "\n".repeat(1 << 20).getBytes(StandardCharsets.US_ASCII);
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(dir.resolve("bomb.drat.gz")), 1 << 16)) {
            for (int i = 0; i <= VerifierLimits.MAX_PROOF_BYTES >> 20; i++) {
                out.write(newlines);
            }
        }
        return file;
    }
}
