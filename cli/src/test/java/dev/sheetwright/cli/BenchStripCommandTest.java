package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.cli.command.BenchCommand;
import dev.sheetwright.dxf.DxfCheck;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** End-to-end run of 'bench strip' on the fu instance (Fujita et al. 1993, from the shared benchmark folder). */
class BenchStripCommandTest {
    private static final Path FU = DxfCheck.sharedFolder().resolve("nesting-benchmarks").resolve("fu.json");

    @Test
    void strip_fuWithIterations_printsOneValidJsonLine() throws Exception {
        if (!Files.isReadable(FU)) {
            if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
                Assertions.fail("required external file is missing: " + FU);
            }
            Assumptions.abort("benchmark file not present: " + FU);
        }
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new BenchCommand());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));

        int code = cl.execute("strip", FU.toString(), "--iterations", "10", "--seed", "3");

        assertEquals(0, code, err.toString());
        String[] lines = out.toString().strip().split("\n");
        assertEquals(1, lines.length);
        JsonNode json = new ObjectMapper().readTree(lines[0]);
        assertEquals("fu", json.get("instance").asText());
        assertEquals(12, json.get("pieces").asInt());
        assertEquals(0, json.get("violations").asInt());
        // fu: total item area 1083, strip height 38 (benchmark README); density = area / (height x length)
        assertEquals(1083 / (38 * json.get("length").asDouble()), json.get("density").asDouble(), 1e-5);
        assertTrue(json.get("density").asDouble() > 0.5 && json.get("density").asDouble() <= 1);
    }

    @TempDir
    Path tmp;

    @Test
    void strip_fuWithDxf_outsideReaderSeesEveryItemInsideTheStrip() throws Exception {
        DxfCheck.requireAvailable();
        Path dxf = tmp.resolve("fu.dxf");
        StringWriter out = new StringWriter();
        CommandLine cl = SheetwrightCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        assertEquals(0, cl.execute("bench", "strip", FU.toString(), "--iterations", "5", "--dxf", dxf.toString()));
        JsonNode json = new ObjectMapper().readTree(out.toString().strip());
        String sheet = json.get("length").asDouble() + "x38";
        // no gap in strip packing: parts may touch; published coordinates are exact integers here
        DxfCheck.Result r = DxfCheck.run(List.of("--allow-touch", "--sheet", sheet, "--margin", "0"), dxf);
        assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
        Map<String, Object> f = r.file(0);
        assertEquals(12, f.get("outer_contours"));
    }

    @Test
    void strip_negativeTime_usageError() {
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new BenchCommand());
        cl.setErr(new PrintWriter(err));
        int code = cl.execute("strip", "x.json", "--time", "-1");
        assertEquals(2, code);
        assertTrue(err.toString().contains("--time must be from 0 to 86400 seconds, got -1.0"), err.toString());
    }
}
