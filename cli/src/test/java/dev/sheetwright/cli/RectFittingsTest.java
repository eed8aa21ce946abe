package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.dxf.DxfCheck;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Rectangular fittings end to end: the second demo job develops, nests, quotes and reports; the outside DXF
 * reader accepts every piece and every nested sheet; bad rectangular input is refused naming the field.
 */
class RectFittingsTest {

    private static final String HEAD = "job: bad\nunits: in\nmaterial: {type: galvanized, gauge: 24}\nfittings:\n";

    @TempDir
    Path tmp;

    @Test
    @SuppressWarnings("unchecked")
    void demoRooftop_develop_everyPieceCounted_outsideReaderAcceptsEveryPart() throws Exception {
        Path out = tmp.resolve("dev");
        CommandRun run = CommandRun.of("develop", Fixtures.path("demo-rooftop.yaml").toString(), "-o",
                out.toString());
        assertEquals(0, run.exitCode(), run::toString);
        JsonNode patterns = new ObjectMapper().readTree(out.resolve("patterns.json").toFile());
        List<String> seen = new ArrayList<>();
        for (JsonNode p : patterns.get("pieces")) {
            seen.add(p.get("fitting").asText() + " " + p.get("piece").asText() + " x" + p.get("count").asInt());
        }
        // pieces and counts per fitting (trade-reference §13.2-§13.7): L halves x2; auto picks the wrap for a
        // 20 x 10 x 36 duct on a 48 x 120 sheet; cheeks x2 with throat and heel wrappers; an offset's two
        // wrappers; four faces; two L halves; a tap's two cheeks, back and front; one cap
        assertEquals(List.of("D1 l-half x2", "D2 wrap x1", "E1 cheek x2", "E1 throat x1", "E1 heel x1",
                "E2 cheek x2", "E2 heel x1", "E2 throat x1", "O1 cheek x2", "O1 wrapper x2", "T1 bottom x1",
                "T1 right x1", "T1 top x1", "T1 left x1", "T2 l-half-1 x1", "T2 l-half-2 x1", "S1 cheek x2",
                "S1 back x1", "S1 front x1", "K1 cap x1"), seen);
        JsonNode e1 = find(patterns, "E1", "cheek");
        assertEquals(30, e1.get("layout").get("heelRadius").asDouble(), 1e-9);
        assertEquals("30", e1.get("layoutFractions").get("heelRadius").asText());
        // R6 (§13.6): the left face of T1 stands 16.5529 in true height, 16 9/16 to the nearest sixteenth
        assertEquals("16 9/16", find(patterns, "T1", "left").get("layoutFractions").get("trueHeight").asText());
        // R4 (§13.5): offset radius 25.5, each arc 28.0725 degrees
        JsonNode o1 = find(patterns, "O1", "cheek").get("layout");
        assertEquals(25.5, o1.get("radius").asDouble(), 1e-9);
        assertEquals(28.0725, o1.get("arcAngle").asDouble(), 5e-5);
        // the layout sheet on the terminal: the cheek radii in fractions (Ri 6, Ro 30 for E1)
        assertTrue(run.out().contains("heel radius Ro") && run.out().contains("(30)"), run::toString);
        if (!outsideReaderAvailable()) {
            return;
        }
        List<Path> parts;
        try (Stream<Path> s = Files.list(out.resolve("parts"))) {
            parts = s.filter(p -> p.toString().endsWith(".dxf")).sorted().toList();
        }
        assertEquals(20, parts.size());
        DxfCheck.Result r = DxfCheck.run(List.of(), parts.toArray(Path[]::new));
        assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
        for (int i = 0; i < parts.size(); i++) {
            assertEquals(1, r.file(i).get("outer_contours"), parts.get(i).toString());
        }
    }

    @Test
    @SuppressWarnings("unchecked")
    void demoRooftop_nest_everyPiecePlaced_sheetsPassTheOutsideReader_quoteAndReportWritten() throws Exception {
        Path out = tmp.resolve("nest");
        CommandRun run = CommandRun.of("nest", Fixtures.path("demo-rooftop.yaml").toString(), "-o", out.toString(),
                "--iterations", "4", "--seed", "3");
        assertEquals(0, run.exitCode(), run::toString);
        JsonNode doc = NestDoc.allPlaced(out, 26, "every copy of every piece of the demo job");
        for (String f : List.of("quote.json", "quote.csv", "report.html", "report.pdf")) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        assertTrue(Files.readString(out.resolve("report.html")).contains("K1"));
        if (!outsideReaderAvailable()) {
            return;
        }
        for (JsonNode sheet : doc.get("sheets")) {
            Path dxf = out.resolve(sheet.get("file").asText());
            String size = sheet.get("stock").get("width").asDouble() + "x"
                    + sheet.get("stock").get("height").asDouble();
            DxfCheck.Result r = DxfCheck.run(List.of("--cut-layers", "CUT", "--sheet", size, "--margin", "0.375",
                    "--gap", "0.25"), dxf);
            assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
            assertEquals(sheet.get("parts").size(), r.file(0).get("outer_contours"));
            assertEquals(0, ((Map<String, Object>) r.file(0).get("audit")).get("errors"));
        }
    }

    @Test
    void nest_rectPieceWiderThanEveryStock_exit3_listedNotPlaced() throws Exception {
        Path job = Files.writeString(tmp.resolve("wide.yaml"), HEAD
                + "  - {id: W1, type: rect-duct, width: 60, depth: 12, length: 60, construction: four-sides}\n"
                + "  - {id: K1, type: end-cap, width: 12, depth: 10}\n");
        CommandRun run = CommandRun.of("nest", job.toString(), "-o", tmp.resolve("out").toString(), "--iterations",
                "2");
        assertEquals(3, run.exitCode(), run::toString);
        assertTrue(run.out().contains("NOT PLACED W1"), run::toString);
        JsonNode doc = new ObjectMapper().readTree(tmp.resolve("out").resolve("nest.json").toFile());
        assertEquals(2, doc.get("unplaced").size(), "both width sides of W1 (62 x 60 in) are listed");
    }

    static Stream<Arguments> badRectJobs() {
        return Stream.of(
                Arguments.of("  - {id: D1, type: rect-duct, width: 0, depth: 12, length: 48}\n",
                        "fitting 'D1', field 'width'"),
                Arguments.of("  - {id: D1, type: rect-duct, width: 24, depth: -2, length: 48}\n",
                        "fitting 'D1', field 'depth'"),
                Arguments.of("  - {id: E1, type: rect-elbow, width: 24, depth: 12, angle: 90, throat-radius: -1}\n",
                        "fitting 'E1', field 'throat-radius'"),
                Arguments.of("  - {id: O1, type: rect-offset, width: 12, depth: 10, offset: 30, length: 24}\n",
                        "fitting 'O1', field 'offset': two reverse arcs"),
                Arguments.of("  - {id: S1, type: shoe-tap, width: 10, depth: 8, height: 16, entry: 12}\n",
                        "fitting 'S1', field 'entry'"),
                Arguments.of("  - {id: T1, type: rect-transition, width: 20, depth: 10, to: {width: 0, depth: 8},"
                        + " length: 15}\n", "fitting 'T1', field 'to.width'"),
                Arguments.of("  - {id: T1, type: rect-transition, width: 20, depth: 10, to: {width: 12, depth: 8},"
                        + " length: 15, construction: wrap}\n", "fitting 'T1', field 'construction'"),
                Arguments.of("  - {id: D1, type: rect-duct, width: 24, depth: 12, length: 48,"
                        + " allowances: {seam: groove 1/4}}\n", "fitting 'D1', field 'allowances.seam'"),
                Arguments.of("  - {id: D1, type: rect-duct, width: 24, depth: 12, length: 48,"
                        + " allowances: {ends: flange}}\n", "fitting 'D1', field 'allowances.ends'"),
                Arguments.of("  - {id: D1, type: rect-duct, width: 24, depth: 12, length: 48, diameter: 8}\n",
                        "fitting 'D1', field 'diameter': unknown field"),
                Arguments.of("  - {id: P1, type: pipe, diameter: 8, length: 24, allowances: {ends: drive}}\n",
                        "fitting 'P1', field 'allowances.ends'"));
    }

    @ParameterizedTest
    @MethodSource("badRectJobs")
    void badRectJob_exit2_namesTheField_writesNothing(String fitting, String expected) throws Exception {
        Path job = Files.writeString(tmp.resolve("job.yaml"), HEAD + fitting);
        Path out = tmp.resolve("out");
        CommandRun run = CommandRun.of("nest", job.toString(), "-o", out.toString(), "--iterations", "1");
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains(job + ": ") && run.err().contains(expected), run::toString);
        assertTrue(Files.notExists(out), "nothing written");
    }

    private static JsonNode find(JsonNode patterns, String fitting, String piece) {
        for (JsonNode p : patterns.get("pieces")) {
            if (p.get("fitting").asText().equals(fitting) && p.get("piece").asText().equals(piece)) {
                return p;
            }
        }
        throw new AssertionError("no piece " + fitting + " " + piece);
    }

    private static boolean outsideReaderAvailable() {
        DxfCheck.requireAvailable();
        return true;
    }
}
