package dev.sheetwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A duct bigger than any stock but within the size bound is not bad input: it is listed as not placed (exit 3). */
class OversizeDuctTest {

    @TempDir
    Path tmp;

    @Test
    void nest_ductLargerThanAnySheet_exit3_listedNotPlaced() throws Exception {
        Path job = Files.writeString(tmp.resolve("big.yaml"), "job: big\nunits: in\n"
                + "material: {type: galvanized, gauge: 24}\nfittings:\n"
                + "  - {id: BIG, type: pipe, diameter: 200, length: 30}\n");
        CommandRun run = CommandRun.of("nest", job.toString(), "-o", tmp.resolve("out").toString(), "--time", "1");
        assertEquals(3, run.exitCode(), run::toString);
        assertTrue(run.out().contains("NOT PLACED BIG"), run::toString);
    }
}
