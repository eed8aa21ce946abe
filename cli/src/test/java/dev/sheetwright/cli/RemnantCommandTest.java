package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.cli.command.RemnantCommand;
import dev.sheetwright.inventory.RemnantFilter;
import dev.sheetwright.inventory.RemnantSort;
import dev.sheetwright.inventory.RemnantStore;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class RemnantCommandTest {
    private static final double EPS = 1e-9;

    @TempDir
    Path dir;

    record Run(int exit, String out, String err) {
    }

    /** Runs {@code remnant ARGS... --inventory dir/r.db} with captured output. */
    private Run run(String... args) {
        List<String> all = new ArrayList<>(List.of(args));
        if (all.size() > 0 && !all.contains("--inventory") && !all.get(0).equals("help")) {
            all.add("--inventory");
            all.add(db().toString());
        }
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cmd = new CommandLine(new RemnantCommand());
        cmd.setOut(new PrintWriter(out));
        cmd.setErr(new PrintWriter(err));
        int exit = cmd.execute(all.toArray(String[]::new));
        return new Run(exit, out.toString(), err.toString());
    }

    private Path db() {
        return dir.resolve("r.db");
    }

    private int count() {
        try (RemnantStore store = RemnantStore.open(db())) {
            return store.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID).size();
        }
    }

    private static void ok(Run r) {
        assertEquals(0, r.exit(), "out:\n" + r.out() + "\nerr:\n" + r.err());
    }

    @Test
    void add_sizeInInches_storesMmAndPrintsId() {
        Run r = run("add", "--size", "47.9375x30", "--material", "Galvanized", "--gauge", "24",
                "--location", "rack A3");

        ok(r);
        assertEquals("added R-0001: galvanized 47.938 (47 15/16) x 30 in at rack A3\n", r.out());
        try (RemnantStore store = RemnantStore.open(db())) {
            assertEquals(1217.6125, store.get("R-0001").orElseThrow().widthMm(), EPS);
            assertEquals(762, store.get("R-0001").orElseThrow().heightMm(), EPS);
        }
    }

    @Test
    void add_polygonInMmWithThickness_isStored() {
        Run r = run("add", "--units", "mm", "--polygon", "0,0 1000,0 1000,300 400,300 400,800 0,800",
                "--material", "stainless", "--thickness", "1.2");

        ok(r);
        try (RemnantStore store = RemnantStore.open(db())) {
            var rem = store.get("R-0001").orElseThrow();
            assertEquals(1.2, rem.thicknessMm(), EPS);
            assertEquals(1000 * 300 + 400 * 500, rem.areaMm2(), EPS);
            assertEquals(null, rem.gauge());
        }
    }

    @Test
    void add_thicknessWithOwnUnit_overridesUnits() {
        ok(run("add", "--size", "10x10", "--material", "steel", "--thickness", "0.8mm"));
        try (RemnantStore store = RemnantStore.open(db())) {
            assertEquals(0.8, store.get("R-0001").orElseThrow().thicknessMm(), EPS);
        }
    }

    @Test
    void add_fromDxf_readsSheetLayer() throws Exception {
        Path dxf = Files.writeString(dir.resolve("off.dxf"), String.join("\n", "0", "SECTION", "2", "ENTITIES",
                "0", "LWPOLYLINE", "8", "SHEET", "70", "1", "10", "0", "20", "0", "10", "900", "20", "0",
                "10", "900", "20", "450", "10", "0", "20", "450", "0", "ENDSEC", "0", "EOF") + "\n");

        Run r = run("add", "--from-dxf", dxf.toString(), "--material", "aluminum", "--gauge", "18");

        ok(r);
        try (RemnantStore store = RemnantStore.open(db())) {
            assertEquals(900, store.get("R-0001").orElseThrow().widthMm(), EPS);
        }
    }

    @Test
    void add_unknownMaterial_exits2AndAddsNothing() {
        Run r = run("add", "--size", "48x30", "--material", "copper", "--gauge", "24");

        assertEquals(2, r.exit());
        assertEquals("error: material 'copper' is not known; valid words: galvanized, steel, stainless, aluminum"
                + " (or aluminium)\n", r.err());
        assertEquals(0, count());
    }

    @Test
    void add_negativeSize_exits2NamingOptionAndValue() {
        Run r = run("add", "--size", "-5x30", "--material", "steel", "--gauge", "20");

        assertEquals(2, r.exit());
        assertEquals("error: --size '-5x30' in: width_mm: -127.0 is out of range; must be > 0 and at most 100000 mm\n",
                r.err());
        assertEquals(0, count());
    }

    @Test
    void add_selfIntersectingPolygon_exits2() {
        Run r = run("add", "--polygon", "0,0 10,10 10,0 0,10", "--units", "mm", "--material", "steel",
                "--gauge", "20");

        assertEquals(2, r.exit());
        assertEquals("error: --polygon (mm): outline: 0,0 10,10 10,0 0,10 is not a simple polygon (self-intersection"
                + " at (5,5)); edges must not cross or touch\n", r.err());
        assertEquals(0, count());
    }

    @Test
    void add_noGaugeNorThickness_exits2() {
        Run r = run("add", "--size", "48x30", "--material", "steel");

        assertEquals(2, r.exit());
        assertEquals("error: gauge/thickness_mm: both are missing; give a gauge or a thickness\n", r.err());
    }

    @Test
    void add_twoShapes_isAUsageError() {
        Run r = run("add", "--size", "48x30", "--polygon", "0,0 1,0 1,1", "--material", "steel", "--gauge", "20");

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("mutually exclusive"), r.err());
    }

    @Test
    void add_badUnits_isAUsageError() {
        Run r = run("add", "--size", "48x30", "--material", "steel", "--gauge", "20", "--units", "ft");

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("'ft' is not a unit; expected in or mm"), r.err());
    }

    @Test
    void list_table_isAlignedWithFractionsAndTotal() {
        ok(run("add", "--size", "48x30", "--material", "galvanized", "--gauge", "24", "--location", "A1"));
        ok(run("add", "--size", "47 15/16x12".replace(" 15/16", ".9375"), "--material", "steel", "--gauge", "20"));

        Run r = run("list", "--sort", "-area");

        ok(r);
        List<String> lines = r.out().lines().toList();
        assertEquals(4, lines.size(), r.out());
        assertTrue(lines.get(0).startsWith("ID      MATERIAL    GAUGE  THICK in"), lines.get(0));
        assertTrue(lines.get(1).startsWith("R-0001  galvanized     24         -"), lines.get(1));
        assertTrue(lines.get(2).contains("47.938 (47 15/16)"), lines.get(2));
        assertTrue(lines.get(2).startsWith("R-0002  steel"), lines.get(2));
        int col = lines.get(0).indexOf("AREA ft2") + "AREA ft2".length();
        assertEquals("10", lines.get(1).substring(col - 2, col));
        assertEquals("3.99", lines.get(2).substring(col - 4, col));
        assertEquals("2 remnant(s), 13.99 ft2", lines.get(3));
    }

    @Test
    void list_filterAndMm_showsOnlyMatches() {
        ok(run("add", "--size", "48x30", "--material", "galvanized", "--gauge", "24"));
        ok(run("add", "--size", "10x10", "--material", "steel", "--gauge", "20"));

        Run r = run("list", "--material", "STEEL", "--units", "mm");

        ok(r);
        assertTrue(r.out().contains("R-0002"));
        assertTrue(!r.out().contains("R-0001"));
        assertTrue(r.out().contains("254"), r.out());
        assertTrue(r.out().contains("WIDTH mm"), r.out());
    }

    @Test
    void list_json_givesMmFields() throws Exception {
        ok(run("add", "--size", "48x30", "--material", "galvanized", "--gauge", "24"));

        Run r = run("list", "--json");

        ok(r);
        JsonNode arr = new ObjectMapper().readTree(r.out());
        assertEquals(1, arr.size());
        assertEquals("R-0001", arr.get(0).get("id").asText());
        assertEquals(1219.2, arr.get(0).get("width_mm").asDouble(), EPS);
        assertEquals("available", arr.get(0).get("state").asText());
        assertEquals(4, arr.get(0).get("outline_mm").size());
    }

    @Test
    void list_badSort_isAUsageError() {
        Run r = run("list", "--sort", "size");

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("'size' is not a sort; expected area, -area, id or date"), r.err());
    }

    @Test
    void remove_severalIds_removesAllOrNone() {
        ok(run("add", "--size", "1x1", "--material", "steel", "--gauge", "20"));
        ok(run("add", "--size", "1x1", "--material", "steel", "--gauge", "20"));

        Run bad = run("remove", "R-0001", "R-0099");
        assertEquals(2, bad.exit());
        assertEquals("error: no remnant R-0099 in " + db() + "\n", bad.err());
        assertEquals(2, count());

        Run good = run("remove", "R-0001", "R-0002");
        ok(good);
        assertEquals("removed R-0001 R-0002\n", good.out());
        assertEquals(0, count());
    }

    @Test
    void exportThenImport_intoAnotherInventory_roundTrips() throws Exception {
        ok(run("add", "--size", "48x30", "--material", "galvanized", "--gauge", "24", "--location", "A, 1"));
        ok(run("add", "--polygon", "0,0 20,0 20,5 10,5 10,10 0,10", "--material", "steel", "--thickness", "0.8mm"));
        Path csv = dir.resolve("rack.csv");

        Run stdout = run("export");
        ok(run("export", csv.toString()));
        Path other = dir.resolve("other.db");
        Run imp = run("import", csv.toString(), "--inventory", other.toString());
        Run again = run("export", "--inventory", other.toString());

        ok(stdout);
        ok(imp);
        assertEquals("imported 2 remnant(s): R-0001 R-0002\n", imp.out());
        assertEquals(stdout.out(), Files.readString(csv));
        assertEquals(stdout.out(), again.out());
        assertTrue(stdout.out().startsWith("id,material,gauge,thickness_mm,width_mm,height_mm,outline,location,"
                + "added,source,state\nR-0001,galvanized,24,,1219.2,762,,\"A, 1\","), stdout.out());
    }

    @Test
    void import_badRow_exits2AndImportsNothing() throws Exception {
        Path csv = Files.writeString(dir.resolve("in.csv"), "material,gauge,width_mm,height_mm\n"
                + "steel,20,100,100\n"
                + "steel,20,100,abc\n");

        Run r = run("import", csv.toString());

        assertEquals(2, r.exit());
        assertEquals("error: " + csv + " row 3, column height_mm: 'abc' is not a number\n", r.err());
        assertEquals(0, count());
    }

    @Test
    void noSubcommand_isAUsageError() {
        Run r = run();

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("missing command"), r.err());
    }

    @Test
    void help_listsSubcommandsAndExitCodes() {
        Run r = run("--help");

        ok(r);
        for (String word : List.of("add", "list", "remove", "import", "export", "2   bad input (nothing changed)")) {
            assertTrue(r.out().contains(word), word + " missing in:\n" + r.out());
        }
    }
}
