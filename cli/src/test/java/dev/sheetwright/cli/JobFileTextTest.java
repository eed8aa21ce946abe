package dev.sheetwright.cli;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Job and shop files that are not UTF-8 text or are nested absurdly deep: exit 2, named file, nothing written. */
class JobFileTextTest {

    private static final String JOB = "job: text\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n"
            + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24, note: %s}\n";

    @TempDir
    Path tmp;

    private void assertRefused(CommandRun run, Path file, String expected) {
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains(file + ": "), run::toString);
        assertTrue(run.err().contains(expected), run::toString);
        assertFalse(run.err().contains("Exception"), run::toString);
        assertTrue(Files.notExists(tmp.resolve("out")), "nothing is written");
    }

    @Test
    void latin1JobFile_saysNotUtf8_withByteOffset() throws Exception {
        String text = String.format(JOB, "Café");
        Path job = Files.write(tmp.resolve("job.yaml"), text.getBytes(StandardCharsets.ISO_8859_1));
        int offset = text.indexOf('é'); // one byte per character in Latin-1
        CommandRun run = CommandRun.of("develop", job.toString(), "-o", tmp.resolve("out").toString());
        assertRefused(run, job, "not UTF-8 text: byte 0xE9 at byte offset " + offset + " (line 5)");
    }

    @Test
    void binaryJobFile_saysNotUtf8() throws Exception {
        byte[] bytes = {'P', 'K', 3, 4, 0, 0, 8, 0, 'x', 'l'};
        Path job = Files.write(tmp.resolve("job.yaml"), bytes);
        CommandRun run = CommandRun.of("develop", job.toString(), "-o", tmp.resolve("out").toString());
        assertRefused(run, job, "not UTF-8 text: byte 0x00 at byte offset 4");
    }

    @Test
    void deeplyNestedJobFile_exit2_noStackTrace() throws Exception {
        String deep = "[".repeat(2000) + "]".repeat(2000);
        Path job = Files.writeString(tmp.resolve("job.yaml"), String.format(JOB, deep));
        CommandRun run = CommandRun.of("develop", job.toString(), "-o", tmp.resolve("out").toString());
        assertRefused(run, job, "nested more than 50 levels deep");
    }

    @Test
    void deeplyNestedShopFile_exit2_namesTheShopFile() throws Exception {
        Path job = Files.writeString(tmp.resolve("job.yaml"), String.format(JOB, "plain"));
        StringBuilder deep = new StringBuilder("units: in\ncut-chart:\n");
        for (int i = 0; i < 2000; i++) {
            deep.append("  ".repeat(i + 1)).append("- \n");
        }
        Path shop = Files.writeString(tmp.resolve("shop.yaml"), deep.toString());
        CommandRun run = CommandRun.of("quote", job.toString(), "--shop", shop.toString(), "--time", "1", "-o",
                tmp.resolve("out").toString());
        assertRefused(run, shop, "nested more than 50 levels deep");
    }
}
