package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantOutline;
import dev.sheetwright.inventory.RemnantState;
import dev.sheetwright.inventory.RemnantStore;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.distance.DistanceOp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Nesting against the rack and committing plans, end to end through the command line. */
class RackCommandTest {
    private static final double EPS = 1e-6;
    private static final double GAP = 0.25;
    private static final GeometryFactory GEOMETRY = new GeometryFactory();
    /** A small galvanized job nested against the rack (an invented scenario); shared by the rack tests. */
    static final String JOB = """
            version: 1
            job: Rack test
            units: in
            material: {type: galvanized, gauge: 24}
            cutting: {process: plasma, kerf: 0.06, gap: 1/4, margin: 3/8, rotation: 90}
            stock:
              sheets: [{size: 48x120, cost: 62.50}]
            fittings:
              - {id: C6, type: pipe, diameter: 6, length: 3, qty: 4}
            """;

    @TempDir
    Path dir;
    private Path db;
    private Path job;

    @BeforeEach
    void rackWithOneFittingRemnant() throws IOException {
        db = dir.resolve("rack.db");
        job = Files.writeString(dir.resolve("job.yaml"), JOB);
        try (RemnantStore store = RemnantStore.open(db)) {
            store.add(NewRemnant.manual(MaterialType.GALVANIZED, 24,
                    RemnantOutline.rectangle(40 * 25.4, 30 * 25.4), "rack A1"));                // R-0001
            store.add(NewRemnant.manual(MaterialType.STAINLESS, 24,
                    RemnantOutline.rectangle(40 * 25.4, 30 * 25.4), "rack A2"));                // R-0002
        }
    }

    private CommandRun nest(String out, String... more) {
        List<String> args = new ArrayList<>(List.of("nest", job.toString(), "-o", dir.resolve(out).toString(),
                "--iterations", "0", "--inventory", db.toString()));
        args.addAll(List.of(more));
        return CommandRun.of(args.toArray(String[]::new));
    }

    private CommandRun commit(String out, String... more) {
        List<String> args = new ArrayList<>(List.of("commit", dir.resolve(out).toString()));
        args.addAll(List.of(more));
        return CommandRun.of(args.toArray(String[]::new));
    }

    private static void exit(int code, CommandRun run) {
        assertEquals(code, run.exitCode(), run.toString());
    }

    private JsonNode nestJson(String out) {
        try {
            return new ObjectMapper().readTree(dir.resolve(out).resolve("nest.json").toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private Remnant stored(String id) {
        try (RemnantStore store = RemnantStore.open(db)) {
            return store.get(id).orElseThrow();
        }
    }

    private static Polygon polygon(List<double[]> vs) {
        Coordinate[] cs = new Coordinate[vs.size() + 1];
        for (int i = 0; i < vs.size(); i++) {
            cs[i] = new Coordinate(vs.get(i)[0], vs.get(i)[1]);
        }
        cs[vs.size()] = cs[0].copy();
        return GEOMETRY.createPolygon(cs);
    }

    private static Polygon rectangle(JsonNode o) {
        double x = o.get("x").asDouble();
        double y = o.get("y").asDouble();
        double w = o.get("width").asDouble();
        double h = o.get("height").asDouble();
        return polygon(List.of(new double[] {x, y}, new double[] {x + w, y}, new double[] {x + w, y + h},
                new double[] {x, y + h}));
    }

    @Test
    void nest_remnantThatFits_cutBeforeAnySheetAndCommittedOffcutIsClean() {
        exit(0, nest("out", "--use-remnants"));
        JsonNode doc = nestJson("out");

        // the remnant is the only stock used
        assertEquals(1, doc.get("sheets").size());
        JsonNode sheet = doc.get("sheets").get(0);
        assertEquals("R-0001", sheet.get("stock").get("id").asText());
        assertEquals("R-0001", doc.get("plan").get("remnantsUsed").get(0).asText());
        // a plain nest only reserves: R-0001 is held by the plan, no offcut is recorded yet
        Remnant held = stored("R-0001");
        assertEquals(RemnantState.RESERVED, held.state());
        assertEquals(doc.get("plan").get("id").asText(), held.reservedBy());
        String offcutId = sheet.get("offcut").get("id").asText();
        try (RemnantStore store = RemnantStore.open(db)) {
            assertTrue(store.get(offcutId).isEmpty());
        }

        exit(0, commit("out", "--location", "rack B2"));

        assertEquals(RemnantState.USED, stored("R-0001").state());
        Remnant offcut = stored(offcutId);
        assertEquals("job Rack test sheet 1", offcut.source().text());
        assertEquals("rack B2", offcut.location());
        assertEquals(sheet.get("offcut").get("width").asDouble() * 25.4, offcut.widthMm(), EPS);
        assertEquals(sheet.get("offcut").get("height").asDouble() * 25.4, offcut.heightMm(), EPS);
        // checked against the drawing: inside the remnant's outline, the gap from every cut outline
        SheetDxf dxf = SheetDxf.read(dir.resolve("out").resolve(sheet.get("file").asText()));
        Polygon rect = rectangle(sheet.get("offcut"));
        Polygon stock = dxf.polylines().stream().filter(p -> p.layer().equals("SHEET"))
                .map(p -> polygon(p.vertices())).findFirst().orElseThrow();
        assertEquals(40 * 30, stock.getArea(), EPS);
        assertTrue(stock.buffer(EPS).covers(rect), rect + " not inside " + stock);
        List<SheetDxf.Outline> cuts = dxf.polylines().stream().filter(p -> p.layer().equals("CUT")).toList();
        assertEquals(4, cuts.size());
        for (SheetDxf.Outline cut : cuts) {
            assertTrue(cut.bulges().stream().allMatch(b -> b == 0.0), "pipe wraps have straight edges");
            assertTrue(DistanceOp.distance(rect, polygon(cut.vertices())) >= GAP - EPS);
        }
    }

    @Test
    void nest_offcutLabel_newIdOnLayerLabelInsideTheOffcut() {
        exit(0, nest("out", "--use-remnants", "--commit"));
        JsonNode sheet = nestJson("out").get("sheets").get(0);
        String id = sheet.get("offcut").get("id").asText();

        SheetDxf dxf = SheetDxf.read(dir.resolve("out").resolve(sheet.get("file").asText()));

        List<SheetDxf.Label> labels = dxf.texts().stream().filter(t -> t.value().startsWith(id + " ")).toList();
        assertEquals(1, labels.size(), dxf.texts().toString());
        SheetDxf.Label label = labels.get(0);
        assertEquals("LABEL", label.layer());
        assertTrue(rectangle(sheet.get("offcut")).contains(GEOMETRY.createPoint(new Coordinate(label.x(), label.y()))));
        assertEquals(RemnantState.AVAILABLE, stored(id).state());
    }

    @Test
    void nest_twoPlannersAtOnce_onlyOnePlansAndCommitsTheRemnant() throws Exception {
        CyclicBarrier start = new CyclicBarrier(2);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            List<Future<CommandRun>> nests = new ArrayList<>();
            for (String out : List.of("a", "b")) {
                nests.add(pool.submit(() -> {
                    start.await();
                    return nest(out, "--use-remnants");
                }));
            }
            for (Future<CommandRun> f : nests) {
                exit(0, f.get());
            }
            int planning = 0;
            for (String out : List.of("a", "b")) {
                planning += nestJson(out).get("plan").get("remnantsUsed").size();
            }
            assertEquals(1, planning, "exactly one plan cuts R-0001");

            List<Future<CommandRun>> commits = new ArrayList<>();
            for (String out : List.of("a", "b")) {
                commits.add(pool.submit((Callable<CommandRun>) () -> {
                    start.await();
                    return commit(out);
                }));
            }
            for (Future<CommandRun> f : commits) {
                exit(0, f.get());
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(RemnantState.USED, stored("R-0001").state());
        String idA = nestJson("a").get("plan").get("offcuts").get(0).get("id").asText();
        String idB = nestJson("b").get("plan").get("offcuts").get(0).get("id").asText();
        assertNotEquals(idA, idB);
        assertEquals(RemnantState.AVAILABLE, stored(idA).state());
        assertEquals(RemnantState.AVAILABLE, stored(idB).state());
    }

    @Test
    void commit_reservationRanOutAndAnotherPlanTookTheRemnant_refusedAndNothingChanges() {
        exit(0, nest("a", "--use-remnants"));
        RackSnapshot.execute(db, "UPDATE remnant SET reserved_until = 0 WHERE seq = 1");
        exit(0, nest("b", "--use-remnants"));
        assertEquals("R-0001", nestJson("b").get("plan").get("remnantsUsed").get(0).asText());
        List<String> before = RackSnapshot.of(db);

        CommandRun late = commit("a");

        exit(2, late);
        assertTrue(late.err().contains("R-0001 is not reserved by plan " + nestJson("a").get("plan").get("id").asText()),
                late.err());
        assertEquals(before, RackSnapshot.of(db));
        exit(0, commit("b"));
        assertEquals(RemnantState.USED, stored("R-0001").state());
    }

    @Test
    void commit_failsHalfway_inventoryExactlyAsBeforeAndRetrySucceeds() {
        exit(0, nest("out", "--use-remnants"));
        List<String> before = RackSnapshot.of(db);
        RackSnapshot.execute(db, "CREATE TRIGGER power_cut BEFORE INSERT ON remnant"
                + " BEGIN SELECT RAISE(ABORT, 'simulated power cut'); END");

        CommandRun cut = commit("out");

        exit(1, cut);
        assertTrue(cut.err().contains("simulated power cut"), cut.err());
        assertEquals(before, RackSnapshot.of(db));
        RackSnapshot.execute(db, "DROP TRIGGER power_cut");
        exit(0, commit("out"));
        assertEquals(RemnantState.USED, stored("R-0001").state());
    }

    @Test
    void commit_sameOutTwice_exit2AndNothingChanges() {
        exit(0, nest("out", "--use-remnants", "--commit"));
        List<String> before = RackSnapshot.of(db);

        CommandRun again = commit("out");

        exit(2, again);
        assertTrue(again.err().contains("was already committed"), again.err());
        assertEquals(before, RackSnapshot.of(db));
    }

    @Test
    void nest_remnantOfAnotherMaterial_exit2NamesItAndNothingChanges() {
        List<String> before = RackSnapshot.of(db);

        CommandRun run = nest("out", "--remnant", "R-0002");

        exit(2, run);
        assertEquals("error: --remnant R-0002: is stainless 24 ga; the job is galvanized 24 ga 0.701 mm;"
                + " choose a remnant of the job's material\n", run.err());
        assertEquals(before, RackSnapshot.of(db));
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void nest_unknownInventory_exit2AndNoFileOrOutputMade() {
        Path missing = dir.resolve("typo.db");

        CommandRun run = CommandRun.of("nest", job.toString(), "-o", dir.resolve("out").toString(), "--iterations",
                "0", "--use-remnants", "--inventory", missing.toString());

        exit(2, run);
        assertTrue(run.err().startsWith("error: inventory " + missing + ": no rack there"), run.err());
        assertFalse(Files.exists(missing));
        assertFalse(Files.exists(dir.resolve("out")));
    }

    @Test
    void commit_outWithoutPlan_exit2NamesTheFile() {
        exit(0, CommandRun.of("nest", job.toString(), "-o", dir.resolve("out").toString(), "--iterations", "0"));
        List<String> before = RackSnapshot.of(db);

        CommandRun run = commit("out", "--inventory", db.toString());

        exit(2, run);
        assertTrue(run.err().contains("nest.json: has no plan"), run.err());
        assertEquals(before, RackSnapshot.of(db));
    }
}
