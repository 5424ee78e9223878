package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A corpus of bad inputs across every command: each must end with its exit code (2 for bad
 * usage, bad input, a refused output or an input beyond the limits; 1 for a certificate the
 * verifier rejects), a message that names the offending file, option, line or member, no stack
 * trace and no Java exception name, and nothing written where it was refused. That bad input
 * gets a clear message naming the item, and never a stack trace, is common practice for command
 * line tools (and a developers' rule of this project).
 */
class BadInputCorpusTest {
    @TempDir
    static Path dir;

    /** A matroid file of the Fano plane. */
    private static final String FANO = "certificates/inputs/fano.json";
    /** Its certificate. */
    private static final String FANO_CERT = "certificates/fano.cert.json";
    private static final String CORNER = "families/corner.json";

    @BeforeAll
    static void fixtures() throws IOException {
        write("notjson.json", "{\"rank\": 3,\n  ]");
        write("big.json", "{\"rank\":32,\"elements\":64,\"nonbases\":[]}");
        write("outside.json", "{\"rank\":2,\"elements\":3,\"bases\":[[0,1],[0,7]]}");
        write("exchange.json", "{\"rank\":2,\"elements\":4,\"bases\":[[0,1],[2,3]]}");
        write("wrongtype.json", "{\"rank\":\"three\",\"elements\":3,\"bases\":[[0,1,2]]}");
        write("colour.json", "{\"rank\":1,\"elements\":1,\"bases\":[[0]],\"colour\":\"red\"}");
        write("existing.json", "{}");
        write("badfamily.json", "{\"name\":\"x\",\"colour\":1}");
        write("fano.cert.json", Files.readString(Path.of(FANO_CERT)));
        write("corner.json", Files.readString(Path.of(CORNER)));
        Files.copy(Path.of(FANO), dir.resolve("fano.json"));
        Files.createDirectories(dir.resolve("exported"));
        write("exported/fano.cert.cnf", "p cnf 0 0\n");
        Files.createDirectories(dir.resolve("noshard"));
        CliRun shard = CliRun.of("family", "run", CORNER, "--n", "3..4", "--shard", "0/2", "--out", path("shard0"));
        assertEquals(0, shard.exit(), shard.err());
    }

    private static void write(String name, String content) throws IOException {
        Files.writeString(dir.resolve(name), content);
    }

    private static String path(String name) {
        return dir.resolve(name).toString();
    }

    /**
     * One case: the arguments ("@name" stands for the file name in the fixture directory), the
     * exit code, and text the message must contain.
     */
    private static Arguments bad(int exit, String names, String args) {
        String[] parts = Arrays.stream(args.split(" ")).map(a -> a.startsWith("@") ? path(a.substring(1)) : a)
                .toArray(String[]::new);
        return Arguments.of(args, exit, names, parts);
    }

    static Stream<Arguments> corpus() {
        return Stream.of(
                // orient: files that are missing, not JSON, too large, or not a matroid
                bad(2, "missing.json: cannot read the file: no such file", "orient @missing.json"),
                bad(2, "notjson.json: not valid JSON: line 2", "orient @notjson.json"),
                bad(2, "big.json: too large", "orient @big.json"),
                bad(2, "it is a directory", "orient @noshard"),
                bad(2, "outside.json: bases[1]", "orient @outside.json"),
                bad(2, "exchange.json: the bases do not form a matroid: Basis exchange fails", "orient @exchange.json"),
                bad(2, "wrongtype.json: field \"rank\"", "orient @wrongtype.json"),
                bad(2, "colour.json: unknown field \"colour\"", "orient @colour.json"),
                bad(2, "--conflicts", "orient " + FANO + " --conflicts lots"),
                bad(2, "Missing required parameter: 'FILE'", "orient"),
                bad(2, "--witness-signs chooses the form of the witness file: it needs --witness-out",
                        "orient " + FANO + " --witness-signs"),
                bad(2, "fano.json: is also an input", "orient @fano.json --witness-out @fano.json"),
                bad(2, "fano.json: is also an input", "orient " + FANO + " --start @fano.json --witness-out @fano.json"),
                bad(2, "existing.json: the file already exists; give --force", "orient " + FANO
                        + " --witness-out @existing.json"),
                // reduce: outputs that would destroy data or cannot be written, bad constructions
                bad(2, "fano.json: is also an input", "reduce @fano.json --out @fano.json"),
                bad(2, "does not exist", "reduce " + FANO + " --out @nodir/x.cert.json"),
                // refused before the 16-cube's reduction (tens of seconds) starts
                bad(2, "nodir", "reduce --cube 16 --hyperplane 1,1,1,1,1,1,1,1,1,1,1,1,1,1,1,1=1 --pull 1111111111111111 "
                        + "--out @nodir/c16.json"),
                bad(2, "existing.json: the file already exists; give --force", "reduce " + FANO + " --out @existing.json"),
                bad(2, "noshard: is a directory", "reduce " + FANO + " --out @noshard"),
                bad(2, "big.json: too large", "reduce @big.json --out @new.cert.json"),
                bad(2, "17", "reduce --cube 17 --hyperplane 1=1 --pull 1 --out @c17.json"),
                bad(2, "--pull", "reduce --cube 3 --hyperplane 1,1,1=1 --out @c3.json"),
                bad(2, "112", "reduce --cube 3 --hyperplane 1,1,1=1 --pull 112 --out @c3.json"),
                bad(2, "both were given", "reduce " + FANO + " --cube 3 --out @c3.json"),
                bad(2, "sideways", "reduce " + FANO + " --strategy sideways --out @c3.json"),
                bad(2, "same file", "reduce " + FANO + " --out @w.json --witness-out @w.json"),
                // verify: a certificate that cannot be read is a failed check, named by file
                bad(1, "missing.cert.json: REJECTED", "verify @missing.cert.json"),
                bad(1, "notjson.json: REJECTED", "verify @notjson.json"),
                bad(2, "Missing required parameter", "verify"),
                // explain
                bad(2, "--max-steps", "explain " + FANO_CERT + " --max-steps 0"),
                bad(2, "fano.cert.json: is also an input", "explain @fano.cert.json --out @fano.cert.json"),
                bad(2, "same file", "explain " + FANO_CERT + " --out @e.txt --certificate-out @e.txt"),
                bad(1, "notjson.json: REJECTED", "explain @notjson.json"),
                // export
                bad(2, "existing.json/out: cannot be created", "export " + FANO_CERT + " --out-dir @existing.json/out"),
                bad(2, "fano.cert.cnf: the file already exists; give --force", "export " + FANO_CERT + " --out-dir @exported"),
                bad(2, "notjson.json", "export @notjson.json --out-dir @noshard"),
                // cube
                bad(2, "17", "cube 17"),
                bad(2, "0", "cube 0"),
                bad(2, "--save", "cube 6 --hyperplane 1,1,1,1,1,1=1 --pull 111111 --save @c6.json"),
                bad(2, "--pull needs --hyperplane", "cube 3 --pull 111"),
                bad(2, "--field", "cube 3 --field 4"),
                bad(2, "existing.json: the file already exists", "cube 3 --hyperplane 1,1,1=1 --pull 111 --save @existing.json"),
                // family
                bad(2, "missing.json: cannot read the file", "family run @missing.json --n 3 --out @fam"),
                bad(2, "3..99", "family run " + CORNER + " --n 3..99 --out @fam"),
                bad(2, "--n", "family run " + CORNER + " --n three --out @fam"),
                bad(2, "--shard", "family run " + CORNER + " --n 3 --shard 3/3 --out @fam"),
                bad(2, "existing.json: is a file, not a directory", "family run " + CORNER + " --n 3 --out @existing.json"),
                bad(2, "corner.json: is also an input", "family run @corner.json --n 3 --out @corner.json"),
                bad(2, "badfamily.json", "family run @badfamily.json --n 3 --out @fam"),
                bad(2, "--threads", "family run " + CORNER + " --n 3 --threads 0 --out @fam"),
                bad(2, "--runs", "family explore " + CORNER + " --n 3 --runs 0 --out @fam"),
                bad(2, "notjson.json", "family predict " + CORNER + " --n 3 --prediction @notjson.json --out @fam"),
                bad(2, "notjson.json: is also an input", "family predict " + CORNER + " --n 3 --prediction @notjson.json "
                        + "--out @notjson.json"),
                bad(2, "Missing subcommand", "family"),
                bad(2, "table.json records a run of family \"corner\" with seed 0 and strategy contract-first, not "
                        + "this one; its files would be replaced: give --force",
                        "family run " + CORNER + " --n 3..4 --seed 1 --out @shard0"),
                // family-merge
                bad(2, "noshard" + java.io.File.separator + "table.json", "family-merge " + CORNER + " @noshard --out @merged"),
                bad(2, "shard 1/2 of n = 3..4 is missing", "family-merge " + CORNER + " @shard0 --out @merged"),
                bad(2, "shard 0/2 is given twice", "family-merge " + CORNER + " @shard0 @shard0 --out @merged"),
                bad(2, "table.json: is also an input", "family-merge " + CORNER + " @shard0 --out @shard0"),
                bad(2, "badfamily.json", "family-merge @badfamily.json @shard0 --out @merged"),
                // report
                bad(2, "fano.cert.json: is also an input", "report @fano.cert.json --out @fano.cert.json"),
                bad(2, "unknown format \"pdf\"", "report " + FANO_CERT + " --format pdf --out @r.pdf"),
                bad(2, "nodir", "report --family @nodir --out @r.md"),
                bad(2, "notjson.json", "report @notjson.json --out @r.md"),
                bad(2, "existing.json: the file already exists", "report " + FANO_CERT + " --out @existing.json"),
                // bench
                bad(2, "--max-n is 18", "bench --max-n 18"),
                bad(2, "--max-n", "bench --max-n 2"),
                bad(2, "--conflicts", "bench --conflicts x"),
                bad(2, "no such certificate file", "bench --certificates nowhere.cert.json"),
                bad(2, "a directory, not a certificate file", "bench --certificates families"),
                // sweep
                bad(2, "--n", "sweep --n 3..99 --out @sweep"),
                bad(2, "--threads must be between 1 and 64", "sweep --n 3 --threads 1000 --out @sweep"),
                bad(2, "existing.json: is a file, not a directory", "sweep --n 3 --out @existing.json"),
                bad(2, "noshard", "sweep-merge @noshard --out @sweepmerged"),
                // no such command
                bad(2, "frobnicate", "frobnicate"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void isRefusedPlainly(String description, int exit, String names, String[] args) {
        CliRun run = CliRun.of(args);
        String all = run.out() + run.err();
        assertEquals(exit, run.exit(), all);
        assertTrue(all.contains(names), "the message names the offending item (" + names + "): " + all);
        assertFalse(all.contains("Exception"), "no Java exception name: " + all);
        assertFalse(all.contains("\tat "), "no stack trace: " + all);
        assertFalse(all.contains(".chirocore."), "no temporary file name: " + all);
    }

    @Test
    void theCorpusCoversEveryCommandWithAtLeastFortyCases() {
        assertTrue(corpus().count() >= 40);
        for (String command : new String[] {"orient", "reduce", "verify", "explain", "export", "cube", "family",
                "family-merge", "report", "bench", "sweep", "sweep-merge"}) {
            assertTrue(corpus().anyMatch(a -> ((String) a.get()[0]).startsWith(command + " ")), command);
        }
    }

    @Test
    void nothingIsWrittenWhereAnOutputWasRefused() throws IOException {
        String before = Files.readString(dir.resolve("existing.json"));
        CliRun.of("reduce", FANO, "--out", path("existing.json"));
        CliRun.of("report", FANO_CERT, "--out", path("existing.json"));
        assertEquals(before, Files.readString(dir.resolve("existing.json")));
        assertFalse(Files.exists(dir.resolve("c6.json")));
        assertFalse(Files.exists(dir.resolve("merged")));
        // verified except its given matroid's provenance, which needs --input (exit 4): nothing failed
        assertEquals(ExitCodes.INCOMPLETE, CliRun.of("verify", path("fano.cert.json")).exit(), "the input survived its refused overwrite");
    }

    @Test
    void forceReplacesAnExistingOutputButNeverAnInput() throws IOException {
        Path out = dir.resolve("forced.md");
        Files.writeString(out, "old");
        CliRun run = CliRun.of("report", FANO_CERT, "--out", out.toString(), "--force");
        assertEquals(0, run.exit(), run.err());
        assertTrue(Files.readString(out).startsWith("#"), "replaced by the report");
        assertEquals(2, CliRun.of("report", path("fano.cert.json"), "--out", path("fano.cert.json"), "--force").exit());
    }
}
