package org.chirocore.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.io.Json;
import org.chirocore.io.MatroidFileException;
import org.chirocore.io.MatroidFiles;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Behaviour unchanged: every stored certificate (certificates/, families/corner/) is regenerated
 * through {@link CertifiedReduction} with the settings it records (seed 0, contract-first; see
 * certificates/make.sh and families/corner/table.json) and its hashed content must be
 * byte-identical, which the equal content digest states. The small ones run by default, the
 * larger cubes (n = 7..16, from a few seconds to about 15 s of CPU each) under the {@code slow} tag.
 */
class StoredCertificatesRegenerateTest {
    private static final CertifiedReduction PIPELINE = new CertifiedReduction(
            new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT);

    @TempDir
    Path dir;

    static Stream<Arguments> given() {
        return Stream.of("fano", "fano-dual", "ag32", "ag23-minus-point", "fano-in-70").map(Arguments::of);
    }

    static Stream<Arguments> smallCorners() {
        return Stream.of(3, 4, 5, 6).map(Arguments::of);
    }

    static Stream<Arguments> largeCorners() {
        return Stream.of(7, 8).map(Arguments::of);
    }

    static Stream<Arguments> smallFamilyMembers() {
        return Stream.of(3, 4, 5, 6).map(Arguments::of);
    }

    static Stream<Arguments> largeFamilyMembers() {
        return Stream.of(7, 8, 9, 10, 11, 12, 13, 14, 15, 16).map(Arguments::of);
    }

    @ParameterizedTest(name = "certificates/{0}.cert.json")
    @MethodSource("given")
    void givenMatroidCertificateIsReproduced(String name) throws IOException, MatroidFileException {
        MatroidFiles.Hashed read = MatroidFiles.readHashed(Path.of("certificates/inputs/" + name + ".json"));
        assertReproduced(Subject.given(read.matroid(), read.sha256()), Path.of("certificates/" + name + ".cert.json"));
    }

    @ParameterizedTest(name = "certificates/corner-n{0}.cert.json")
    @MethodSource("smallCorners")
    void cornerCertificateIsReproduced(int n) throws IOException {
        assertReproduced(Subject.of(CubeConstruction.corner(n)), Path.of("certificates/corner-n" + n + ".cert.json"));
    }

    @Tag("slow")
    @ParameterizedTest(name = "certificates/corner-n{0}.cert.json")
    @MethodSource("largeCorners")
    void largeCornerCertificateIsReproduced(int n) throws IOException {
        cornerCertificateIsReproduced(n);
    }

    @ParameterizedTest(name = "families/corner/n={0}.cert.json")
    @MethodSource("smallFamilyMembers")
    void familyMemberCertificateIsReproduced(int n) throws IOException {
        FamilyDefinition corner = FamilyDefinition.read(Path.of("families/corner.json"));
        assertReproduced(corner.build(n).subject(), Path.of("families/corner/n=" + n + ".cert.json"));
    }

    @Tag("slow")
    @ParameterizedTest(name = "families/corner/n={0}.cert.json")
    @MethodSource("largeFamilyMembers")
    void largeFamilyMemberCertificateIsReproduced(int n) throws IOException {
        familyMemberCertificateIsReproduced(n);
    }

    private void assertReproduced(Subject subject, Path stored) throws IOException {
        CertifiedReduction.Verified v = assertInstanceOf(CertifiedReduction.Verified.class,
                PIPELINE.run(subject, dir.resolve("regenerated.json")));
        Json.Obj old = Json.parseUtf8(Files.readAllBytes(stored)).asObject("stored certificate");
        assertEquals(old.requireString("sha256"), v.written().sha256(), stored + ": regenerated content differs");
    }
}
