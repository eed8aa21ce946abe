package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** What the layout printout and patterns.json call things: cone as cone, areas as areas, thickness in decimals. */
class LayoutLabelsTest {

    @TempDir
    Path tmp;

    private CommandRun run;
    private final Map<String, JsonNode> pieces = new HashMap<>();

    @BeforeEach
    void develop() throws Exception {
        Path job = Files.writeString(tmp.resolve("labels.yaml"), String.join("\n",
                "job: labels", "units: in", "material: {type: galvanized, gauge: 24}", "fittings:",
                "  - {id: CAP, type: cone, diameter: 20, height: 5, pieces: 2}",
                "  - {id: HOOD, type: cone, diameter: 20, height: 8, offset: 3, pieces: 2}",
                "  - {id: ECC, type: reducer, large: 12, small: 8, height: 10, flat: true}",
                "  - {id: SQ, type: transition, width: 12, depth: 12, diameter: 8, height: 10}", ""));
        Path out = tmp.resolve("out");
        run = CommandRun.of("develop", job.toString(), "-o", out.toString());
        assertEquals(0, run.exitCode(), run::toString);
        for (JsonNode p : new ObjectMapper().readTree(out.resolve("patterns.json").toFile()).get("pieces")) {
            pieces.putIfAbsent(p.get("fitting").asText(), p);
        }
    }

    @Test
    void cone_isListedAsCone_eccentricReducerStaysOne() {
        assertEquals("cone", pieces.get("CAP").get("type").asText());
        assertEquals("cone", pieces.get("HOOD").get("type").asText());
        assertEquals("eccentric-reducer", pieces.get("ECC").get("type").asText());
        assertTrue(run.out().contains("CAP wrap  (cone,") || run.out().matches("(?s).*CAP \\S+  \\(cone,.*"),
                run::toString);
    }

    @Test
    void rightCone_hasNoTriangulationAngle_obliqueConeKeepsIt() {
        assertFalse(pieces.get("CAP").get("layout").has("handTriangulatedAngle"), pieces.get("CAP")::toString);
        assertTrue(pieces.get("HOOD").get("layout").has("handTriangulatedAngle"));
        assertTrue(pieces.get("ECC").get("layout").has("handTriangulatedAngle"));
    }

    @Test
    void transitionNetArea_printedAsAnArea() {
        String line = run.out().lines().filter(l -> l.contains("net area of this piece")).findFirst().orElseThrow();
        assertTrue(line.matches(".*\\d+\\.\\d{2} in2$"), line);
    }

    @Test
    void thickness_printedInDecimals_notRoundedToSixteenths() {
        // 24 ga galvanized: 0.0276 in (trade-reference §8.1 [S:SMACNA-GALV])
        assertTrue(run.out().contains("(t = 0.0276 in)"), run::toString);
    }
}
