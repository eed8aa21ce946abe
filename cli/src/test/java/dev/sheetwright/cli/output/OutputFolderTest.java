package dev.sheetwright.cli.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The output folder is replaced whole, by folder renames, and never left mixed or half written. */
class OutputFolderTest {

    @TempDir
    Path tmp;

    private static List<String> files(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).map(p -> root.relativize(p).toString()).sorted().toList();
        }
    }

    private static List<String> siblings(Path dir) throws IOException {
        try (Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private Path earlierOutput() throws IOException {
        Path out = tmp.resolve("out");
        try (OutputFolder f = OutputFolder.stage(out)) {
            Files.writeString(f.file("nest.json"), "{\"sheets\": 2}");
            Files.writeString(f.file("sheets/sheet-001.dxf"), "old 1");
            Files.writeString(f.file("sheets/sheet-002.dxf"), "old 2");
            f.commit();
        }
        return out;
    }

    @Test
    void commit_overEarlierOutput_keepsNoFileOfTheEarlierRun() throws IOException {
        Path out = earlierOutput();
        try (OutputFolder f = OutputFolder.stage(out)) {
            Files.writeString(f.file("nest.json"), "{\"sheets\": 1}");
            Files.writeString(f.file("sheets/sheet-001.dxf"), "new 1");
            f.commit();
        }
        assertEquals(List.of(OutputFolder.MARKER, "nest.json", "sheets/sheet-001.dxf"), files(out));
        assertEquals("new 1", Files.readString(out.resolve("sheets/sheet-001.dxf")));
        assertEquals(List.of("out"), siblings(tmp), "no staging or set-aside folder is left");
    }

    @Test
    void commit_whenTheSwapFails_keepsTheEarlierOutputWhole() throws IOException {
        Path out = earlierOutput();
        List<String> before = files(out);
        // the first rename (old output aside) succeeds, the second (staging into place) fails
        int[] calls = {0};
        OutputFolder.Mover failSecond = (from, to) -> {
            if (++calls[0] == 2) {
                throw new IOException("disk full (simulated)");
            }
            Files.move(from, to, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        };
        try (OutputFolder f = OutputFolder.stage(out, failSecond)) {
            Files.writeString(f.file("nest.json"), "{\"sheets\": 1}");
            Files.writeString(f.file("sheets/sheet-001.dxf"), "new 1");
            UncheckedIOException e = assertThrows(UncheckedIOException.class, f::commit);
            assertTrue(e.getMessage().contains("unchanged"), e.getMessage());
        }
        assertEquals(before, files(out));
        assertEquals("{\"sheets\": 2}", Files.readString(out.resolve("nest.json")));
        assertEquals("old 2", Files.readString(out.resolve("sheets/sheet-002.dxf")));
        assertEquals(List.of("out"), siblings(tmp), "the staging folder is removed");
    }

    @Test
    void commit_whenSettingTheOldOutputAsideFails_changesNothing() throws IOException {
        Path out = earlierOutput();
        List<String> before = files(out);
        OutputFolder.Mover failing = (from, to) -> {
            throw new IOException("busy (simulated)");
        };
        try (OutputFolder f = OutputFolder.stage(out, failing)) {
            Files.writeString(f.file("nest.json"), "{}");
            assertThrows(UncheckedIOException.class, f::commit);
        }
        assertEquals(before, files(out));
        assertEquals(List.of("out"), siblings(tmp));
    }

    @Test
    void stage_removesStagingFoldersOfEndedRuns_keepsLiveOnes() throws IOException {
        Path out = tmp.resolve("out");
        // an older version's name (random number only), a minute old
        Path unowned = Files.createDirectories(tmp.resolve(".out.partial-4711"));
        Files.writeString(unowned.resolve("nest.json"), "{}");
        Files.setLastModifiedTime(unowned, FileTime.from(Instant.now().minusSeconds(3600)));
        // a run whose process is gone (no process has this id)
        Path killed = Files.createDirectories(tmp.resolve(".out.partial-" + Long.MAX_VALUE + "-1-99"));
        Files.writeString(killed.resolve("sheets.dxf"), "x");
        Path killedSwap = Files.createDirectories(tmp.resolve(".out.old-" + Long.MAX_VALUE + "-1-98"));
        // another output's staging folder is not ours to touch
        Path other = Files.createDirectories(tmp.resolve(".other.partial-4711"));
        Files.setLastModifiedTime(other, FileTime.from(Instant.now().minusSeconds(3600)));
        try (OutputFolder live = OutputFolder.stage(out); OutputFolder second = OutputFolder.stage(out)) {
            Files.writeString(second.file("a.txt"), "a");
            long liveFolders;
            try (Stream<Path> list = Files.list(tmp)) {
                liveFolders = list.filter(p -> p.getFileName().toString().startsWith(".out.partial-")).count();
            }
            assertEquals(2, liveFolders, "the first staging folder (a live run) survives the second stage");
        }
        assertTrue(Files.notExists(unowned));
        assertTrue(Files.notExists(killed));
        assertTrue(Files.notExists(killedSwap));
        assertTrue(Files.exists(other));
    }

    @Test
    void stage_refusesAFolderSheetwrightDidNotWrite() throws IOException {
        Path mine = Files.createDirectories(tmp.resolve("drawings"));
        Files.writeString(mine.resolve("house.dwg"), "precious");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> OutputFolder.check(mine));
        assertTrue(e.getMessage().contains("did not write"), e.getMessage());
        assertEquals("precious", Files.readString(mine.resolve("house.dwg")));
    }

    @Test
    void check_refusesATargetBelowAFile() throws IOException {
        Path file = Files.writeString(tmp.resolve("notes.txt"), "x");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> OutputFolder.check(file.resolve("out")));
        assertTrue(e.getMessage().contains("is not a folder"), e.getMessage());
    }
}
