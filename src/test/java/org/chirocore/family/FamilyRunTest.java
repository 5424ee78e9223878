package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.io.Json;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Runs of the corner family (families/corner.json) for small n. */
class FamilyRunTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));

    @TempDir
    Path dir;

    private static FamilyTable run(Path dir, int from, int to, int threads) throws IOException {
        return new FamilyRun(CORNER, dir, new FamilyRun.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED, threads),
                FamilyRun.Listener.SILENT).run(from, to);
    }

    private static MemberResult.Certified certified(FamilyTable table, int row) {
        return (MemberResult.Certified) table.rows().get(row).member();
    }

    @Test
    void threeToFiveGivesVerifiedCertificatesAndATableOfThreeRows() throws IOException {
        FamilyTable table = run(dir, 3, 5, 1);
        assertEquals(3, table.rows().size());
        for (int n = 3; n <= 5; n++) {
            MemberResult.Certified c = certified(table, n - 3);
            assertEquals(n, c.n());
            assertEquals("verified", c.status());
            assertFalse(c.reused());
            assertTrue(CertificateVerifier.verify(dir.resolve(FamilyRun.certificateName(n))).passed());
            // the corner construction contracts O: 2^n − 1 elements of rank n
            assertEquals((1 << n) - 1, c.elements());
            assertEquals(n, c.rank());
        }
        Json.Obj json = Json.parse(Files.readString(dir.resolve(FamilyRun.TABLE_JSON))).asObject("table");
        assertEquals(3, json.requireArray("members").size());
        String md = Files.readString(dir.resolve(FamilyRun.TABLE_MD));
        assertTrue(md.contains("## n = 5") && md.contains("non-bases by weights: "), md);
    }

    @Test
    void theCoreAtThreeIsTheFanoPlane() throws IOException {
        // F7, the Fano plane PG(2, 2): Oxley, Matroid Theory, 2nd ed., Example 1.5.7 and Appendix
        FamilyTable table = run(dir, 3, 3, 1);
        assertTrue(new HyperplaneIsomorphismInspector(certified(table, 0).facts().core(), NamedMatroids.fano()).find()
                .isPresent());
        // the Fano plane has 7 lines of 3 points, so 7 of its 3-sets are non-bases
        CoreDescription d = table.rows().get(0).description().orElseThrow();
        assertEquals(7, d.nonBasesByWeights().values().stream().mapToInt(Integer::intValue).sum());
        assertTrue(table.toMarkdown().contains("- isomorphism class: the Fano plane F7\n"), "named in the table");
    }

    @Test
    void aResumedRunReusesTheCertificatesItFinds() throws IOException {
        run(dir, 3, 4, 1);
        Path three = dir.resolve(FamilyRun.certificateName(3));
        Path four = dir.resolve(FamilyRun.certificateName(4));
        FileTime old = FileTime.fromMillis(1_000_000_000_000L);
        Files.setLastModifiedTime(three, old);
        Files.setLastModifiedTime(four, old);
        FamilyTable table = run(dir, 3, 5, 1);
        assertTrue(certified(table, 0).reused());
        assertTrue(certified(table, 1).reused());
        assertFalse(certified(table, 2).reused());
        assertEquals(old, Files.getLastModifiedTime(three));
        assertEquals(old, Files.getLastModifiedTime(four));
        assertEquals(3, table.rows().size());
    }

    @Test
    void anInterruptedWriteAndACorruptCertificateDoNotCorruptTheResult() throws IOException {
        Path reference = Files.createDirectory(dir.resolve("reference"));
        run(reference, 3, 4, 1);
        Path resumed = Files.createDirectory(dir.resolve("resumed"));
        // what a kill during AtomicFiles.write leaves: a half-written temporary file beside the target
        String whole = Files.readString(reference.resolve(FamilyRun.certificateName(3)));
        Files.writeString(resumed.resolve(".n=3.cert.json.k2x9.tmp"), whole.substring(0, whole.length() / 2));
        // and a truncated certificate under the final name (a copy made by hand, say)
        Files.writeString(resumed.resolve(FamilyRun.certificateName(4)), whole.substring(0, 100));
        FamilyTable table = run(resumed, 3, 4, 1);
        assertFalse(certified(table, 1).reused());
        for (int n = 3; n <= 4; n++) {
            assertEquals(content(reference, n), content(resumed, n));
            assertTrue(CertificateVerifier.verify(resumed.resolve(FamilyRun.certificateName(n))).passed());
        }
    }

    @Test
    void twoThreadsGiveTheSameCertificatesAsOne() throws IOException {
        Path one = Files.createDirectory(dir.resolve("one"));
        Path two = Files.createDirectory(dir.resolve("two"));
        run(one, 3, 5, 1);
        run(two, 3, 5, 2);
        for (int n = 3; n <= 5; n++) {
            assertEquals(content(one, n), content(two, n));
        }
    }

    @Test
    void coreDescriptionsGroupByWeight() throws IOException {
        FamilyTable table = run(dir, 3, 3, 1);
        CoreDescription d = table.rows().get(0).description().orElseThrow();
        // the contracted 3-cube: O = 111 is gone, the other 7 vertices remain
        assertEquals(List.of("000"), d.verticesByWeight().get(0));
        assertEquals(List.of("001", "010", "100"), d.verticesByWeight().get(1));
        assertEquals(List.of("011", "101", "110"), d.verticesByWeight().get(2));
        assertEquals(1, d.nonBasesByWeights().get(List.of(1, 1, 1)));
    }

    /** The hashed content of the certificate at n (the run figures differ from run to run). */
    private static Json content(Path dir, int n) throws IOException {
        return Json.parse(Files.readString(dir.resolve(FamilyRun.certificateName(n)))).asObject("certificate")
                .require("content");
    }
}
