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

class DevelopCommandTest {

    @TempDir
    Path tmp;

    @Test
    void develop_demoJob_writesEveryPieceAndPatternsJson() throws Exception {
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("develop", Fixtures.path("demo-bakery.yaml").toString(), "-o", out.toString());
        assertEquals(0, run.exitCode(), run::toString);
        JsonNode doc = new ObjectMapper().readTree(out.resolve("patterns.json").toFile());
        assertEquals("in", doc.get("units").asText());
        assertTrue(doc.get("pieces").size() >= 4);
        for (JsonNode piece : doc.get("pieces")) {
            Path dxf = out.resolve(piece.get("file").asText());
            assertTrue(Files.isRegularFile(dxf), dxf::toString);
            assertTrue(Files.isRegularFile(Path.of(dxf.toString().replace(".dxf", ".svg"))));
        }
        // R1 is the 12 -> 8 in x 10 in reducer of trade-reference §1.2(c), here from inside sizes in 24 ga
        JsonNode r1 = doc.get("pieces").get(0);
        assertEquals("R1", r1.get("fitting").asText());
        assertEquals(70.6018, r1.get("layout").get("patternAngle").asDouble(), 5e-5);
        assertEquals(30.6645, r1.get("layout").get("largeRadius").asDouble(), 5e-5);
        assertTrue(run.out().contains("30.6645 in (30 11/16)"), run::toString);
        assertTrue(run.out().contains("Caution"), run::toString);
        try (var files = Files.list(tmp)) {
            assertEquals(List.of(out), files.toList(), "no staging folder is left behind");
        }
    }

    @Test
    @SuppressWarnings("unchecked")
    void develop_dxfReadBackByOutsideReader_cutLengthsMatch() throws Exception {
        DxfCheck.requireAvailable();
        Path out = tmp.resolve("out");
        assertEquals(0, CommandRun.of("develop", Fixtures.path("demo-bakery.yaml").toString(), "-o",
                out.toString()).exitCode());
        JsonNode doc = new ObjectMapper().readTree(out.resolve("patterns.json").toFile());
        for (JsonNode piece : doc.get("pieces")) {
            DxfCheck.Result r = DxfCheck.run(List.of(), out.resolve(piece.get("file").asText()));
            assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
            Map<String, Object> f = r.file(0);
            assertEquals(0, ((Map<String, Object>) f.get("audit")).get("errors"));
            assertEquals(1, f.get("outer_contours"), piece.get("file").asText());
            assertEquals(piece.get("holes").asInt(), f.get("holes"), piece.get("file").asText());
            assertEquals(piece.get("cutLength").asDouble(), ((Number) f.get("cut_length")).doubleValue(), 1e-3);
        }
    }

    @Test
    void develop_demoJob_holdsEveryFittingType_teeMainHasItsHole() throws Exception {
        Path out = tmp.resolve("out");
        assertEquals(0, CommandRun.of("develop", Fixtures.path("demo-bakery.yaml").toString(), "-o",
                out.toString()).exitCode());
        JsonNode doc = new ObjectMapper().readTree(out.resolve("patterns.json").toFile());
        java.util.Set<String> types = new java.util.TreeSet<>();
        for (JsonNode piece : doc.get("pieces")) {
            types.add(piece.get("type").asText());
            if (piece.get("piece").asText().equals("main")) {
                assertEquals(1, piece.get("holes").asInt(), "the main of a tee carries the intersection hole");
            }
        }
        assertEquals(java.util.Set.of("pipe", "reducer", "eccentric-reducer", "cone", "elbow", "offset", "tee", "lateral",
                "tap", "transition"), types);
    }

    @Test
    void develop_netAllowancesMeanDimensions_giveTheBareDevelopedSurface() throws Exception {
        Path job = tmp.resolve("net.yaml");
        Files.writeString(job, String.join("\n",
                "job: net check", "units: in", "material: {type: galvanized, gauge: 24}", "dimensions: mean",
                "allowances: {seam: none, ends: none, notch: false}",
                "fittings:", "  - {id: R, type: reducer, large: 12, small: 8, height: 10}", ""));
        Path out = tmp.resolve("o");
        assertEquals(0, CommandRun.of("develop", job.toString(), "-o", out.toString()).exitCode());
        JsonNode p = new ObjectMapper().readTree(out.resolve("patterns.json").toFile()).get("pieces").get(0);
        // trade-reference §1.2(c) (computed): net perimeter 83.2279, box 35.3589 x 13.9483, area pi (R1+R2) s
        assertEquals(83.2279, p.get("cutLength").asDouble(), 5e-5);
        assertEquals(35.3589, p.get("width").asDouble(), 5e-5);
        assertEquals(13.9483, p.get("height").asDouble(), 5e-5);
        assertEquals(Math.PI * (6 + 4) * Math.hypot(2, 10), p.get("area").asDouble(), 1e-9);
    }

    @Test
    void develop_badFraction_exit2AndNothingWritten() throws Exception {
        Path job = tmp.resolve("bad.yaml");
        Files.writeString(job, "job: x\nunits: in\nmaterial: {type: galvanized, gauge: 24}\n"
                + "fittings:\n  - {id: P1, type: pipe, diameter: 8 1/x, length: 24}\n");
        Path out = tmp.resolve("never");
        CommandRun run = CommandRun.of("develop", job.toString(), "-o", out.toString());
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("bad.yaml: fitting 'P1', field 'diameter'"), run::toString);
        assertFalse(Files.exists(out));
    }
}
