package org.chirocore.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.io.Json;
import org.chirocore.orient.Budget;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Sharded runs of the corner family and their merge. */
class FamilyMergeTest {
    private static final FamilyDefinition CORNER = FamilyDefinition.read(Path.of("families/corner.json"));

    @TempDir
    Path dir;

    private FamilyTable run(String name, long seed, int from, int to, Shard shard) throws IOException {
        return new FamilyRun(CORNER, dir.resolve(name), new FamilyRun.Settings(seed, Strategy.CONTRACT_FIRST,
                Budget.UNLIMITED, 1), FamilyRun.Listener.SILENT).run(from, to, shard);
    }

    /** The table's JSON without what legitimately differs between runs: times and reuse. */
    private static String withoutTimings(Json.Obj table) {
        return table.toText().replaceAll("\"millis\":\\s*\\{[^}]*\\}", "").replaceAll("\"reused\":\\s*(true|false)", "");
    }

    @Test
    void shardsPartitionTheRange() {
        assertEquals(List.of(3, 6, 9), new Shard(0, 3).select(3, 10));
        assertEquals(List.of(4, 7, 10), new Shard(1, 3).select(3, 10));
        assertEquals(List.of(), new Shard(2, 3).select(3, 4));
        assertEquals(List.of(3, 4, 5), Shard.ALL.select(3, 5));
        assertEquals(new Shard(2, 3), Shard.parse(" 2/3 "));
        assertThrows(IllegalArgumentException.class, () -> Shard.parse("3/3"));
        assertThrows(IllegalArgumentException.class, () -> Shard.parse("1"));
    }

    @Test
    void threeShardsMergeToTheUnshardedTable() throws IOException {
        FamilyTable whole = run("whole", 0, 3, 5, Shard.ALL);
        for (int i = 0; i < 3; i++) {
            assertEquals(1, run("shard" + i, 0, 3, 5, new Shard(i, 3)).rows().size());
        }
        Path merged = dir.resolve("merged");
        FamilyTable table = FamilyMerge.merge(CORNER, List.of(dir.resolve("shard2"), dir.resolve("shard0"),
                dir.resolve("shard1")), merged);
        assertEquals(withoutTimings(whole.toJson()), withoutTimings(table.toJson()));
        for (int n = 3; n <= 5; n++) {
            assertTrue(CertificateVerifier.verify(merged.resolve(FamilyRun.certificateName(n))).passed());
        }
        // Completeness: each table records its part, so a missing, repeated or foreign shard is refused.
        FamilyException missing = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(dir.resolve("shard0"), dir.resolve("shard2")), dir.resolve("gap")));
        assertTrue(missing.getMessage().startsWith("shard 1/3 of n = 3..5 is missing"), missing.getMessage());
        FamilyException twice = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(dir.resolve("shard0"), dir.resolve("shard1"), dir.resolve("shard0"), dir.resolve("shard2")),
                dir.resolve("twice")));
        assertTrue(twice.getMessage().contains("shard 0/3 is given twice"), twice.getMessage());
        FamilyException mixed = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(dir.resolve("shard0"), dir.resolve("whole")), dir.resolve("mixed")));
        assertTrue(mixed.getMessage().contains("is shard 0/1 of n = 3..5"), mixed.getMessage());
        assertFalse(Files.exists(dir.resolve("gap")), "nothing is written before the shards are found complete");
    }

    @Test
    void inconsistentShardsAreRefused() throws IOException {
        run("seed0", 0, 3, 4, new Shard(0, 2));
        run("seed1", 1, 3, 4, new Shard(1, 2));
        FamilyException seeds = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(dir.resolve("seed0"), dir.resolve("seed1")), dir.resolve("m1")));
        assertTrue(seeds.getMessage().contains("seed 1 and strategy contract-first differ from seed 0"),
                seeds.getMessage());
        FamilyDefinition other = FamilyDefinition.read(Path.of("families/corner-uncontracted.json"));
        assertThrows(FamilyException.class, () -> FamilyMerge.merge(other, List.of(dir.resolve("seed0"),
                dir.resolve("seed1")), dir.resolve("m2")));
        // a shard whose table claims seed 0 while its certificate at n = 3 records seed 1
        Path forged = dir.resolve("seed1");
        Path table = forged.resolve(FamilyRun.TABLE_JSON);
        Files.writeString(table, Files.readString(table).replaceFirst("\"seed\": ?1", "\"seed\":0"));
        FamilyException certificate = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(dir.resolve("seed0"), forged), dir.resolve("m3")));
        assertTrue(certificate.getMessage().contains("the certificate of n = 3 records another construction, seed "
                + "or strategy"), certificate.getMessage());
        // a table listing an n outside its part
        Files.writeString(table, Files.readString(table).replaceFirst("\"shard\": ?1", "\"shard\":0"));
        FamilyException part = assertThrows(FamilyException.class, () -> FamilyMerge.merge(CORNER,
                List.of(forged), dir.resolve("m4")));
        assertTrue(part.getMessage().contains("lists n = [3], but shard 0/2 of n = 3..4 has n = [4]"),
                part.getMessage());
    }
}
