package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.CertificateExport;
import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Certificates whose clausal proof is LRAT ({@code --lrat-proof}): the pipeline writes them and
 * the verifier accepts them through its LRAT checker, which shares no code with the producer's
 * conversion; the relations are those of the DRAT form; a changed hint is rejected; and export
 * gives back the LRAT text and a DRAT that the verifier's DRAT checker accepts. Subject: the
 * 8-element minor AG(2,3)\e of certificates/inputs, non-orientable and minor-minimal by its stored
 * certificate (certificates/ag23-minus-point.cert.json, a regression input without an outside
 * source; docs/mathematics.md §7).
 */
class LratProofTest {
    private static final CertificateForms LRAT = new CertificateForms(WitnessForms.SIGNS, false, true);

    @TempDir
    static Path dir;

    static Json.Obj lrat;
    static Json.Obj drat;

    @BeforeAll
    static void build() throws IOException, MatroidFileException {
        lrat = write(LRAT, "lrat.cert.json");
        drat = write(CertificateForms.DEFAULT, "drat.cert.json");
    }

    private static Json.Obj write(CertificateForms forms, String name) throws IOException, MatroidFileException {
        MatroidFiles.Hashed read = MatroidFiles.readHashed(Path.of("certificates/inputs/ag23-minus-point.json"));
        CertifiedReduction reduction = new CertifiedReduction(
                new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, forms), Progress.SILENT);
        assertInstanceOf(CertifiedReduction.Verified.class, reduction.run(Subject.given(read.matroid(), read.sha256()), dir.resolve(name)));
        return Json.parseUtf8(Files.readAllBytes(dir.resolve(name))).asObject("certificate");
    }

    private static Json.Obj proof(Json.Obj cert) {
        return (Json.Obj) TestCertificates.get(cert, "content", "nonOrientability");
    }

    @Test
    void theLratFormStatesTheSameRelationsAndIsCheckedByItsHints() {
        assertEquals(List.of("normalised", "relations", "lrat"), List.copyOf(proof(lrat).members().keySet()));
        assertEquals(proof(drat).require("relations"), proof(lrat).require("relations"));
        VerificationReport report = CertificateVerifier.verify(TestCertificates.bytes(lrat), dir, Optional.empty());
        assertTrue(report.passed(), report::toString);
        assertTrue(report.toString().contains("LRAT hints checked"), report::toString);
        long lratSteps = proof(lrat).requireString("lrat").lines().filter(l -> !l.contains(" d ")).count();
        assertEquals(lratSteps, ((Json.Obj) TestCertificates.get(lrat, "run", "lrat")).requireLong("steps"));
    }

    @Test
    void aChangedHintIsRejected() {
        String text = proof(lrat).requireString("lrat");
        String last = text.lines().reduce((a, b) -> b).orElseThrow();
        String[] t = last.split(" ");
        // the empty clause's last hint is its conflict clause; naming clause 1 instead cannot conflict
        t[t.length - 2] = t[t.length - 2].equals("1") ? "2" : "1";
        String changed = text.substring(0, text.length() - last.length() - 1) + String.join(" ", t) + "\n";
        Json.Obj tampered = TestCertificates.tamper(lrat, new Json.Str(changed), "nonOrientability", "lrat");
        assertRejected(CertificateVerifier.verify(TestCertificates.bytes(tampered), dir, Optional.empty()),
                CertificateVerifier.PROOF, "line ");
    }

    @Test
    void exportGivesTheLratAndADratWithoutHintsThatChecks() throws IOException {
        Path out = dir.resolve("export");
        CertificateExport.Exported e = CertificateExport.export(dir.resolve("lrat.cert.json"), out, true);
        assertEquals(proof(lrat).requireString("lrat"), Files.readString(e.lrat().orElseThrow()));
        List<String> cnfLines = Files.readAllLines(e.cnf());
        List<int[]> clauses = cnfLines.subList(1, cnfLines.size()).stream()
                .map(l -> l.strip().split(" ")).map(t -> java.util.Arrays.stream(t, 0, t.length - 1).mapToInt(Integer::parseInt).toArray())
                .toList();
        Cnf cnf = new Cnf(e.variables(), clauses);
        DratChecker.Outcome checked = DratChecker.check(cnf, Files.readString(e.drat()));
        assertTrue(checked.valid(), checked::failure);
        assertFalse(Files.readString(e.drat()).isEmpty());
        assertEquals(Optional.empty(), LratChecker.check(cnf, Files.readString(e.lrat().orElseThrow())));
    }
}
