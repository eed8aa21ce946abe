package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Bad cutting and machine settings: exit 2 naming the file and field, nothing written. */
class CutProgramInputTest {

    private static final String JOB = "job: bad\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n"
            + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n";
    private static final String SHOP = "units: in\n";

    @TempDir
    Path tmp;

    static Stream<Arguments> badJobs() {
        return Stream.of(
                Arguments.of(JOB + "cutting: {kerf: 0.06, gap: 1/4, lead-in: 1/4}\n", "",
                        "field 'cutting.lead-in': must be at most the gap less the kerf (0.1900 in)"),
                Arguments.of(JOB + "cutting: {kerf: 0.06, gap: 1/4, lead-out: 0.2}\n", "",
                        "field 'cutting.lead-out'"),
                Arguments.of(JOB + "cutting: {kerf: -0.06}\n", "", "field 'cutting.kerf': must not be negative"),
                Arguments.of(JOB + "cutting: {kerf: .nan}\n", "", "field 'cutting.kerf': must be a finite number"),
                Arguments.of(JOB + "cutting: {kerf: .inf}\n", "", "field 'cutting.kerf': must be a finite number"),
                Arguments.of(JOB + "cutting: {kerf-compensation: left}\n", "",
                        "field 'cutting.kerf-compensation': use path, controller or none; got 'left'"),
                Arguments.of(JOB + "quote: {lead-in: 3/16}\n", "",
                        "field 'quote.lead-in': has moved to the cutting: section"),
                Arguments.of(JOB, SHOP + "machine: {torch-on: M03, plasma-on: M07}\n",
                        "field 'machine.plasma-on': unknown field"),
                Arguments.of(JOB, SHOP + "machine: {torch-on: G03}\n",
                        "field 'machine.torch-on': must be an M-code such as M03"),
                Arguments.of(JOB, SHOP + "machine: {torch-off: M3X}\n", "field 'machine.torch-off'"),
                Arguments.of(JOB, SHOP + "machine: {torch-on: M07, torch-off: M7}\n", "field 'machine.torch-off'"),
                Arguments.of(JOB, SHOP + "machine: {safe-height: 1, cut-height: 0.06}\n",
                        "field 'machine.pierce-height'"),
                Arguments.of(JOB, SHOP + "machine: {header: [\"G17\", {a: 1}]}\n", "field 'machine.header'"));
    }

    @ParameterizedTest
    @MethodSource("badJobs")
    void nest_badCutOrMachineSettings_exit2_namesTheField_writesNothing(String job, String shop, String expected)
            throws Exception {
        Path jobFile = tmp.resolve("job.yaml");
        Files.writeString(jobFile, job);
        Path out = tmp.resolve("out");
        CommandRun run;
        if (shop.isEmpty()) {
            run = CommandRun.of("nest", jobFile.toString(), "-o", out.toString(), "--gcode", "--iterations", "0");
        } else {
            Path shopFile = tmp.resolve("shop.yaml");
            Files.writeString(shopFile, shop);
            run = CommandRun.of("nest", jobFile.toString(), "-o", out.toString(), "--gcode", "--iterations", "0",
                    "--shop", shopFile.toString());
        }
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains(expected), run::toString);
        assertTrue(Files.notExists(out), "output folder must not be created");
    }
}
