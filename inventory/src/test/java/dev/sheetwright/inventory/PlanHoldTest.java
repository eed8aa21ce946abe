package dev.sheetwright.inventory;

import static dev.sheetwright.inventory.RemnantStoreTest.ids;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sheetwright.core.material.MaterialType;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Plans settled against the rack: remnants kept, offcut ids handed out up front, one commit per plan. */
class PlanHoldTest {
    private static final Instant T0 = Instant.parse("2025-03-14T09:30:00Z");
    private static final Duration TTL = Duration.ofMinutes(15);
    private static final RemnantFilter GALV = RemnantFilter.any().withMaterial(MaterialType.GALVANIZED);

    @TempDir
    Path dir;
    private Path file;
    private MutableClock clock;

    @BeforeEach
    void fill() {
        file = dir.resolve("r.db");
        clock = new MutableClock(T0);
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.add(galv(1200, 600));                                      // R-0001
            store.add(galv(600, 300));                                       // R-0002
            store.add(NewRemnant.manual(MaterialType.STEEL, 20, RemnantOutline.rectangle(500, 500), ""));
        }
    }

    private static NewRemnant galv(double w, double h) {
        return NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(w, h), "rack");
    }

    private static NewRemnant offcut(double w, double h, int sheet) {
        return NewRemnant.offcut(MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(w, h), "bay 2",
                "J-17", sheet);
    }

    @Test
    void hold_keepsUsedReleasesOthersAndHandsOutIdsAfterTheHighest() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.reserve(GALV, "plan-a", TTL);
            clock.advance(Duration.ofMinutes(5));

            PlanHold hold = store.hold("plan-a", "J-17", Set.of("R-0002"), 2, TTL);

            assertEquals(List.of("R-0002"), ids(hold.remnants()));
            assertEquals(List.of("R-0004", "R-0005"), hold.offcutIds());
            assertEquals(T0.plus(Duration.ofMinutes(5)).plus(TTL), hold.until());
            assertEquals(RemnantState.AVAILABLE, store.get("R-0001").orElseThrow().state());
            assertEquals(List.of("R-0002"), ids(store.reservedFor("plan-a")));
            assertEquals("R-0006", store.add(galv(100, 100)).id());
        }
    }

    @Test
    void hold_leaseTakenByAnotherPlanWhileNesting_refusesAndChangesNothing() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.reserve(GALV, "plan-a", TTL);
            clock.advance(TTL.plusMinutes(1));
            store.reserve(GALV, "plan-b", TTL);
            List<String> before = InventorySnapshot.of(file);

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.hold("plan-a", "J-17", Set.of("R-0001"), 1, TTL));

            assertEquals("R-0001 is no longer reserved by plan plan-a (it is reserved by plan plan-b until "
                    + T0.plus(TTL).plus(Duration.ofMinutes(1)).plus(TTL) + "); its reservation ran out while nesting; nest again",
                    e.getMessage());
            assertEquals(before, InventorySnapshot.of(file));
        }
    }

    @Test
    void commitPlan_recordsOffcutsUnderHeldIdsAndUsesRemnant() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.reserve(GALV, "plan-a", TTL);
            PlanHold hold = store.hold("plan-a", "J-17", Set.of("R-0001"), 2, TTL);
            Map<String, NewRemnant> offcuts = new LinkedHashMap<>();
            offcuts.put(hold.offcutIds().get(1), offcut(400, 600, 2));

            List<Remnant> added = store.commitPlan("plan-a", Set.of("R-0001"), offcuts);

            assertEquals(List.of("R-0005"), ids(added));
            assertEquals("job J-17 sheet 2", added.get(0).source().text());
            assertEquals(RemnantState.USED, store.get("R-0001").orElseThrow().state());
            assertEquals(RemnantState.AVAILABLE, store.get("R-0005").orElseThrow().state());
            assertEquals(java.util.Optional.empty(), store.get("R-0004"));
            assertEquals(T0, store.findPlan("plan-a").orElseThrow().committed());
        }
    }

    @Test
    void commitPlan_secondTime_refusedAndNothingChanges() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.reserve(GALV, "plan-a", TTL);
            PlanHold hold = store.hold("plan-a", "J-17", Set.of("R-0001"), 1, TTL);
            store.commitPlan("plan-a", Set.of("R-0001"), Map.of(hold.offcutIds().get(0), offcut(300, 300, 1)));
            List<String> before = InventorySnapshot.of(file);

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.commitPlan("plan-a", Set.of(), Map.of()));

            assertEquals("plan plan-a was already committed at " + T0 + "; nothing was changed", e.getMessage());
            assertEquals(before, InventorySnapshot.of(file));
        }
    }

    @Test
    void commitPlan_idHeldByAnotherPlan_refusedAndNothingChanges() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.hold("plan-a", "J-17", Set.of(), 1, TTL);
            store.reserveIds(List.of("R-0002"), "plan-b", TTL);
            store.hold("plan-b", "J-18", Set.of("R-0002"), 1, TTL);
            List<String> before = InventorySnapshot.of(file);

            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> store.commitPlan("plan-b", Set.of("R-0002"), Map.of("R-0004", offcut(300, 300, 1))));

            assertEquals("offcut id R-0004 is not held by plan plan-b", e.getMessage());
            assertEquals(before, InventorySnapshot.of(file));
        }
    }

    @Test
    void commitPlan_unknownPlan_namesPlanAndFile() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> store.commitPlan("plan-z", Set.of(), Map.of()));

            assertEquals("plan plan-z is not in " + file + "; commit it to the inventory it was nested against",
                    e.getMessage());
        }
    }

    @Test
    void commitPlan_failureAfterFirstOffcut_leavesInventoryAsItWas() {
        try (RemnantStore setup = RemnantStore.open(file, clock)) {
            setup.reserve(GALV, "plan-a", TTL);
            setup.hold("plan-a", "J-17", Set.of("R-0001"), 2, TTL);
        }
        List<String> before = InventorySnapshot.of(file);
        RemnantStore.FaultPoint crash = step -> {
            if (step.equals("commit:offcut 1")) {
                throw new IllegalStateException("simulated crash at " + step);
            }
        };
        Map<String, NewRemnant> offcuts = Map.of("R-0004", offcut(300, 300, 1), "R-0005", offcut(200, 500, 2));
        try (RemnantStore store = RemnantStore.open(file, clock, Migrations.ALL, crash)) {
            assertThrows(IllegalStateException.class, () -> store.commitPlan("plan-a", Set.of("R-0001"), offcuts));
        }

        assertEquals(before, InventorySnapshot.of(file));
        try (RemnantStore after = RemnantStore.open(file, clock)) {
            assertNull(after.findPlan("plan-a").orElseThrow().committed());
            assertEquals(2, after.commitPlan("plan-a", Set.of("R-0001"), offcuts).size());
        }
    }

    @Test
    void reserveIds_oneHeldByAnotherPlan_reservesNone() {
        try (RemnantStore store = RemnantStore.open(file, clock)) {
            store.reserveIds(List.of("R-0002"), "plan-b", TTL);
            List<String> before = InventorySnapshot.of(file);

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.reserveIds(List.of("R-0001", "R-0002"), "plan-a", TTL));

            assertEquals("R-0002 is reserved by plan plan-b until " + T0.plus(TTL)
                    + "; wait for that plan or choose another remnant", e.getMessage());
            assertEquals(before, InventorySnapshot.of(file));
        }
    }
}
