package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.dxf.DxfCheck;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

class NestCommandTest {

    private static final String SMALL_JOB = String.join("\n",
            "job: nest check", "units: in", "material: {type: galvanized, gauge: 26}",
            "cutting: {kerf: 0.06, gap: 1/4, margin: 1/2}",
            "stock: {sheets: [{size: 36x48, cost: 20}]}",
            "fittings:",
            "  - {id: R, type: reducer, large: 10, small: 6, height: 6, qty: 2}",
            "  - {id: C, type: pipe, diameter: 4, length: 3, qty: 3}",
            "");

    @TempDir
    Path tmp;

    private Path job(String name, String text) throws Exception {
        Path p = tmp.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    @Test
    void nest_fixedIterations_sameNestJsonByteForByteWhateverTheThreadCount() throws Exception {
        Path job = job("j.yaml", SMALL_JOB);
        Path one = tmp.resolve("one");
        Path two = tmp.resolve("two");
        CommandRun a = CommandRun.of("nest", job.toString(), "-o", one.toString(), "--iterations", "12", "--seed", "5",
                "--threads", "1");
        CommandRun b = CommandRun.of("nest", job.toString(), "-o", two.toString(), "--iterations", "12", "--seed", "5",
                "--threads", "2");
        assertEquals(0, a.exitCode(), a::toString);
        assertEquals(0, b.exitCode(), b::toString);
        assertEquals(Files.readString(one.resolve("nest.json")), Files.readString(two.resolve("nest.json")));
    }

    @Test
    @SuppressWarnings("unchecked")
    void nest_smallJob_everyPieceOnASheet_outsideReaderAgrees() throws Exception {
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("nest", job("j.yaml", SMALL_JOB).toString(), "-o", out.toString(),
                "--iterations", "20", "--seed", "7");
        assertEquals(0, run.exitCode(), run::toString);
        JsonNode doc = NestDoc.allPlaced(out, 5, "2 reducer blanks and 3 collars");
        double partArea = doc.get("totals").get("partArea").asDouble();
        double stockArea = doc.get("totals").get("stockArea").asDouble();
        assertEquals(partArea / stockArea, doc.get("totals").get("utilization").asDouble(), 1e-12);
        if (!outsideReaderAvailable()) {
            return;
        }
        for (JsonNode sheet : doc.get("sheets")) {
            Path dxf = out.resolve(sheet.get("file").asText());
            String size = sheet.get("stock").get("width").asDouble() + "x" + sheet.get("stock").get("height").asDouble();
            DxfCheck.Result r = DxfCheck.run(List.of("--cut-layers", "CUT", "--sheet", size, "--margin", "0.5", "--gap", "0.25"), dxf);
            assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
            Map<String, Object> f = r.file(0);
            assertEquals(sheet.get("parts").size(), f.get("outer_contours"), "one outer contour per placed part");
            assertEquals(0, ((Map<String, Object>) f.get("audit")).get("errors"));
        }
    }

    private static boolean outsideReaderAvailable() {
        DxfCheck.requireAvailable();
        return true;
    }

    @Test
    void nest_sameSeedAndIterations_sameNest() throws Exception {
        Path job = job("j.yaml", SMALL_JOB);
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        assertEquals(0, CommandRun.of("nest", job.toString(), "-o", a.toString(), "--iterations", "30", "--seed",
                "3").exitCode());
        assertEquals(0, CommandRun.of("nest", job.toString(), "-o", b.toString(), "--iterations", "30", "--seed",
                "3").exitCode());
        assertEquals(Files.readString(a.resolve("nest.json")), Files.readString(b.resolve("nest.json")));
    }

    @Test
    void nest_pieceLargerThanEveryStock_exit3_listedWithReason_restWritten() throws Exception {
        String text = SMALL_JOB + "  - {id: BIG, type: pipe, diameter: 24, length: 40, qty: 1}\n";
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("nest", job("j.yaml", text).toString(), "-o", out.toString(),
                "--iterations", "0");
        assertEquals(3, run.exitCode(), run::toString);
        assertTrue(run.out().contains("NOT PLACED BIG wrap"), run::toString);
        JsonNode doc = new ObjectMapper().readTree(out.resolve("nest.json").toFile());
        assertEquals(1, doc.get("unplaced").size());
        JsonNode u = doc.get("unplaced").get(0);
        assertEquals("BIG", u.get("fitting").asText());
        assertFalse(u.get("reason").asText().isBlank());
        assertTrue(Files.exists(out.resolve("sheets/sheet-001.dxf")), "what could be placed is still written");
    }

    @Test
    void nest_badJob_exit2_nothingWritten() throws Exception {
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("nest", job("j.yaml", SMALL_JOB.replace("height: 6", "height: x"))
                .toString(), "-o", out.toString());
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("fitting 'R', field 'height'"), run::toString);
        assertFalse(Files.exists(out));
    }
}
