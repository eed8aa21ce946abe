package dev.sheetwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A second run into the same output folder leaves no file of the first; an unusable folder is refused first. */
class OutputReplaceTest {

    private static final String HEAD = "job: %s\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n"
            + "stock: {sheets: [{size: 30 x 30}]}\ncutting: {rotation: 90}\nfittings:\n";

    @TempDir
    Path tmp;

    private Path job(String name, int qty) throws Exception {
        Path f = tmp.resolve(name + ".yaml");
        Files.writeString(f, String.format(HEAD, name) + "  - {id: P1, type: pipe, diameter: 6, length: 20, qty: "
                + qty + "}\n");
        return f;
    }

    private static List<String> sheetFiles(Path out) throws Exception {
        try (Stream<Path> s = Files.list(out.resolve("sheets"))) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void nest_twiceIntoOneFolder_noSheetOfTheFirstJobSurvives() throws Exception {
        Path out = tmp.resolve("out");
        CommandRun first = CommandRun.of("nest", job("three", 3).toString(), "-o", out.toString(), "--time", "1",
                "--threads", "1");
        assertEquals(0, first.exitCode(), first::toString);
        List<String> firstSheets = sheetFiles(out);
        assertTrue(firstSheets.contains("sheet-003.dxf"), firstSheets::toString);
        CommandRun second = CommandRun.of("nest", job("one", 1).toString(), "-o", out.toString(), "--time", "1",
                "--threads", "1");
        assertEquals(0, second.exitCode(), second::toString);
        assertEquals(List.of("sheet-001.dxf", "sheet-001.svg"), sheetFiles(out));
        assertTrue(Files.readString(out.resolve("nest.json")).contains("\"one\""));
        try (Stream<Path> s = Files.list(tmp)) {
            assertEquals(0, s.filter(p -> p.getFileName().toString().startsWith(".out.")).count(),
                    "no staging folder is left beside the output");
        }
    }

    @Test
    void nest_intoAFolderThatCannotBeMade_refusedBeforeNesting_exit2() throws Exception {
        Path notes = Files.writeString(tmp.resolve("notes.txt"), "x");
        Path out = notes.resolve("out");
        CommandRun run = CommandRun.of("nest", job("one", 1).toString(), "-o", out.toString(), "--time", "1");
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("output " + out), run::toString);
        assertTrue(run.out().isEmpty(), "nothing was nested: " + run);
    }

    @Test
    void develop_intoAFolderOfOtherFiles_refused_exit2_filesKept() throws Exception {
        Path mine = Files.createDirectories(tmp.resolve("mine"));
        Files.writeString(mine.resolve("letter.txt"), "keep me");
        CommandRun run = CommandRun.of("develop", job("one", 1).toString(), "-o", mine.toString());
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("did not write"), run::toString);
        assertEquals(List.of(mine.resolve("letter.txt")), Files.list(mine).toList());
    }
}
