package dev.sheetwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Each kind of bad job gives exit 2, a message naming file, fitting and field, and no output folder. */
class BadInputTest {

    private static final String HEAD = "job: bad\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n";

    @TempDir
    Path tmp;

    static Stream<Arguments> badJobs() {
        return Stream.of(
                Arguments.of(HEAD + "fittings:\n  - {id: R1, type: reducer, large: 8, small: 12, height: 10}\n",
                        "fitting 'R1', field 'small'"),
                Arguments.of(HEAD + "fittings:\n  - {id: R1, type: reducer, large: 12, small: 8, height: -3}\n",
                        "fitting 'R1', field 'height'"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 0, length: 24}\n",
                        "fitting 'P1', field 'diameter'"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24, lenght: 3}\n",
                        "fitting 'P1', field 'lenght': unknown field"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 2,"
                        + " allowances: {ends: crimp 1-1/2}}\n", "fitting 'P1', field 'allowances.ends'"),
                Arguments.of(HEAD + "fittings:\n  - {id: R1, type: reducer, large: 12, small: 8, height: 10,"
                        + " allowances: {seam: lap 40}}\n", "fitting 'R1', field 'allowances.seam'"),
                Arguments.of(HEAD + "fittings:\n  - {id: R1, type: reducer, large: 12, small: 8, height: 10,"
                        + " allowances: {seam: zipper}}\n", "fitting 'R1', field 'allowances.seam': unknown seam"),
                Arguments.of(HEAD + "fittings:\n  - {id: X, type: trumpet, diameter: 8}\n",
                        "fitting 'X', field 'type': unknown fitting type"),
                Arguments.of(HEAD + "fittings:\n  - {id: A, type: pipe, diameter: 8, length: 10}\n"
                        + "  - {id: A, type: pipe, diameter: 6, length: 10}\n", "fitting 'A', field 'id'"),
                Arguments.of("job: bad\nunits: furlongs\nmaterial: {type: galvanized, gauge: 24}\nfittings: []\n",
                        "field 'units'"),
                Arguments.of("job: bad\nunits: in\nmaterial: {type: galvanized, gauge: 23.5}\nfittings: []\n",
                        "field 'material.gauge'"),
                Arguments.of("job: bad\nunits: in\nmaterial: {type: brass, gauge: 24}\nfittings: []\n",
                        "field 'material.type'"),
                Arguments.of("job: bad\nunits: in\nmaterial: {type: galvanized, gauge: 31}\nfittings: []\n",
                        "field 'material.gauge'"),
                Arguments.of(HEAD + "fittings: [\n", "not valid YAML"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "cutting: {kerf: 0.1, gap: 0.05}\n", "field 'cutting.gap'"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "stock: {sheets: [{size: 48 by 120}]}\n", "field 'stock.sheets[1].size'"),
                Arguments.of(HEAD + "fittings:\n  - {id: a/b, type: pipe, diameter: 8, length: 10}\n"
                        + "  - {id: a-b, type: pipe, diameter: 6, length: 10}\n",
                        "fitting 'a-b', field 'id': fittings 'a/b' and 'a-b' would both write parts/a-b_"),
                Arguments.of(HEAD + "fittings:\n  - {id: E1, type: pipe, diameter: 8, length: 10}\n"
                        + "  - {id: e1, type: pipe, diameter: 6, length: 10}\n",
                        "fittings 'E1' and 'e1' would both write"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 1e308, length: 10}\n",
                        "fitting 'P1', field 'diameter': must be at most 1000"),
                Arguments.of(HEAD + "fittings:\n  - {id: R1, type: reducer, large: 12, small: 8, height: 10,"
                        + " offset: {x: 1e300}}\n", "fitting 'R1', field 'offset.x': must be at most 1000"),
                Arguments.of(HEAD + "fittings:\n  - {id: E1, type: elbow, diameter: 8, angle: 90, radius: 5e200}\n",
                        "fitting 'E1', field 'radius': must be at most 1000"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "stock: {sheets: [{size: 48 x 1e308}]}\n", "field 'stock.sheets[1].size'"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "cutting: {kerf: 1e308}\n", "field 'cutting.kerf': must be at most 1000"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "cutting: {margin: 25}\n", "field 'cutting.margin': margin 25.0 in leaves no room on"
                        + " sheet 48x120 (shorter side 48.0 in)"),
                Arguments.of(HEAD + "fittings:\n  - {id: P1, type: pipe, diameter: 8, length: 24}\n"
                        + "cutting: {margin: 2}\nstock: {sheets: [{size: 48x120}], coil: {width: 4}}\n",
                        "field 'cutting.margin': margin 2.0 in leaves no room on the coil"));
    }

    @ParameterizedTest
    @MethodSource("badJobs")
    void develop_badJob_exit2_namesFileFittingField_writesNothing(String yaml, String expected) throws Exception {
        Path job = tmp.resolve("job.yaml");
        Files.writeString(job, yaml);
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("develop", job.toString(), "-o", out.toString());
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains(job + ": "), run::toString);
        assertTrue(run.err().contains(expected), run::toString);
        assertTrue(Files.notExists(out), "output folder must not be created");
        try (var files = Files.list(tmp)) {
            assertEquals(1, files.count(), "only the job file remains");
        }
    }
}
