package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/** Opening, migrating and the records of the rack, on both backends. */
@ParameterizedClass
@MethodSource("dev.sheetwright.inventory.TestRack#kinds")
class RemnantStoreTest {
    private static final double EPS = 1e-9;
    private static final Instant T0 = Instant.parse("2025-03-14T09:30:00Z");

    @Parameter
    TestRack.Kind kind;

    @TempDir
    Path dir;
    private TestRack rack;

    @BeforeEach
    void make() {
        rack = TestRack.make(kind, dir, "r.db");
    }

    @AfterEach
    void drop() {
        if (rack != null) {
            rack.close();
        }
    }

    private static NewRemnant galv(double w, double h, String location) {
        return NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(w, h), location);
    }

    @Test
    void open_newRack_hasTheLatestSchema() {
        try (RemnantStore store = rack.open()) {
            assertEquals(Migrations.ALL.size(), store.schemaVersion());
            assertEquals(List.of(), store.list(RemnantFilter.any(), RemnantSort.ID));
        }
        List<String> snapshot = rack.snapshot();
        assertEquals(Migrations.ALL.size(), snapshot.stream().filter(r -> r.startsWith("version=")).count());
        assertTrue(snapshot.stream().anyMatch(r -> r.startsWith("version=1 description=initial schema")),
                snapshot.toString());
        assertTrue(snapshot.stream().anyMatch(r -> r.startsWith("version=3 description=plans keep")),
                snapshot.toString());
    }

    @Test
    void open_existingRack_doesNotRerunMigrationsAndKeepsData() {
        MutableClock clock = new MutableClock(T0);
        try (RemnantStore store = rack.open(clock)) {
            store.add(galv(1200, 600, "A1"));
        }
        List<String> before = rack.snapshot();
        clock.advance(java.time.Duration.ofDays(1));

        try (RemnantStore store = rack.open(clock)) {
            assertEquals(Migrations.ALL.size(), store.schemaVersion());
            assertEquals(1, store.list(RemnantFilter.any(), RemnantSort.ID).size());
        }

        assertEquals(before, rack.snapshot());
    }

    @Test
    void open_withAppendedMigration_appliesOnlyTheNewStep() {
        try (RemnantStore store = rack.open()) {
            store.add(galv(1200, 600, "A1"));
        }
        Migration v4 = new Migration(4, "add note column",
                List.of("ALTER TABLE remnant ADD COLUMN note TEXT NOT NULL DEFAULT ''"));

        try (RemnantStore store = rack.open(java.time.Clock.systemUTC(),
                List.of(Migrations.V1, Migrations.V2, Migrations.V3, v4), FaultPoint.NONE)) {
            assertEquals(4, store.schemaVersion());
            assertEquals("A1", store.get("R-0001").orElseThrow().location());
        }
        List<String> snapshot = rack.snapshot();
        assertTrue(snapshot.get(0).contains("note="), snapshot.get(0));
        assertEquals(4, snapshot.stream().filter(r -> r.startsWith("version=")).count());
    }

    @Test
    void open_rackFromNewerProgram_refusesWithVersions() {
        rack.open().close();
        rack.execute("INSERT INTO schema_version VALUES (7, 'future', '2030-01-01T00:00:00Z')");

        InventoryStorageException e = assertThrows(InventoryStorageException.class, () -> rack.open());

        assertEquals("inventory: " + rack.shown() + " has schema version 7; this program knows versions up to 3",
                e.getMessage());
    }

    @Test
    void add_thenGetAndList_roundTripsEveryField() {
        MutableClock clock = new MutableClock(T0);
        try (RemnantStore store = rack.open(clock)) {
            RemnantOutline l = RemnantOutline.parse("0,0 1000,0 1000,300 400,300 400,800 0,800");
            NewRemnant in = new NewRemnant(MaterialType.STAINLESS, null, 1.2, l, "rack B, slot 3",
                    RemnantSource.job("Smith Kitchen", 2));

            Remnant added = store.add(in);

            assertEquals("R-0001", added.id());
            assertEquals(MaterialType.STAINLESS, added.material());
            assertEquals(null, added.gauge());
            assertEquals(1.2, added.thicknessMm(), EPS);
            assertEquals(l, added.outline());
            assertEquals(1000, added.widthMm(), EPS);
            assertEquals(800, added.heightMm(), EPS);
            assertEquals(1000 * 300 + 400 * 500, added.areaMm2(), EPS);
            assertEquals(added.areaMm2(), added.polygon().getArea(), EPS);
            assertEquals("rack B, slot 3", added.location());
            assertEquals(T0, added.added());
            assertEquals("job Smith Kitchen sheet 2", added.source().text());
            assertEquals(RemnantState.AVAILABLE, added.state());
            assertEquals(added, store.get("R-0001").orElseThrow());
            assertEquals(List.of(added), store.list(RemnantFilter.any(), RemnantSort.ID));
        }
    }

    @Test
    void add_ids_areSequentialAndNeverReusedAfterRemove() {
        try (RemnantStore store = rack.open()) {
            assertEquals("R-0001", store.add(galv(100, 100, "")).id());
            assertEquals("R-0002", store.add(galv(100, 100, "")).id());
            store.remove("R-0002");
            store.remove("r-1");

            assertEquals("R-0003", store.add(galv(100, 100, "")).id());
            assertFalse(store.get("R-0002").isPresent());
        }
        try (RemnantStore again = rack.open()) {
            assertEquals("R-0004", again.add(galv(100, 100, "")).id());
        }
    }

    @Test
    void remove_unknownId_namesIdAndFileAndChangesNothing() {
        try (RemnantStore store = rack.open()) {
            store.add(galv(100, 100, ""));
            List<String> before = rack.snapshot();

            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> store.removeAll(List.of("R-0001", "R-0099")));

            assertEquals("no remnant R-0099 in " + rack.shown(), e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void remove_malformedId_namesTheValue() {
        try (RemnantStore store = rack.open()) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.remove("42"));
            assertEquals("id: '42' is not a remnant id; expected R- followed by a number from 1, e.g. R-0042",
                    e.getMessage());
        }
    }

    @Test
    void list_filterAndSort_selectAndOrder() {
        MutableClock clock = new MutableClock(T0);
        try (RemnantStore store = rack.open(clock)) {
            store.add(galv(500, 500, "a"));                        // R-0001, 250000
            clock.advance(java.time.Duration.ofHours(1));
            store.add(galv(1000, 400, "b"));                       // R-0002, 400000
            clock.advance(java.time.Duration.ofHours(1));
            store.add(NewRemnant.manualMm(MaterialType.ALUMINUM, 1.0,
                    RemnantOutline.rectangle(300, 300), "c"));      // R-0003, 90000
            store.add(NewRemnant.manual(MaterialType.GALVANIZED, 20,
                    RemnantOutline.rectangle(2000, 1000), "d"));    // R-0004, 2000000

            assertEquals(List.of("R-0003", "R-0001", "R-0002", "R-0004"),
                    ids(store.list(RemnantFilter.any(), RemnantSort.AREA_ASC)));
            assertEquals(List.of("R-0004", "R-0002", "R-0001", "R-0003"),
                    ids(store.list(RemnantFilter.any(), RemnantSort.AREA_DESC)));
            assertEquals(List.of("R-0001", "R-0002"), ids(store.list(
                    RemnantFilter.any().withMaterial(MaterialType.GALVANIZED).withGauge(24), RemnantSort.ID)));
            assertEquals(List.of("R-0003"), ids(store.list(
                    RemnantFilter.any().withThicknessMm(1.001), RemnantSort.ID)));
            assertEquals(List.of("R-0002", "R-0004"), ids(store.list(
                    RemnantFilter.any().withMinAreaMm2(400_000.0), RemnantSort.DATE)));
        }
    }

    static List<String> ids(List<Remnant> remnants) {
        return remnants.stream().map(Remnant::id).toList();
    }
}
