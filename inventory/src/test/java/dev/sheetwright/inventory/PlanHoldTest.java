package dev.sheetwright.inventory;

import static dev.sheetwright.inventory.RemnantStoreTest.ids;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sheetwright.core.material.MaterialType;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Plans settled against the rack: remnants kept, what the plan leaves recorded with offcut ids handed out up front,
 * one commit (or a release) per plan; on both backends.
 */
@ParameterizedClass
@MethodSource("dev.sheetwright.inventory.TestRack#kinds")
class PlanHoldTest {
    private static final double EPS = 1e-9;
    private static final Instant T0 = Instant.parse("2025-03-14T09:30:00Z");
    private static final Duration TTL = Duration.ofMinutes(15);
    private static final RemnantFilter GALV = RemnantFilter.any().withMaterial(MaterialType.GALVANIZED);

    @Parameter
    TestRack.Kind kind;

    @TempDir
    Path dir;
    private TestRack rack;
    private MutableClock clock;

    @BeforeEach
    void fill() {
        rack = TestRack.make(kind, dir, "r.db");
        clock = new MutableClock(T0);
        try (RemnantStore store = rack.open(clock)) {
            store.add(galv(1200, 600));                                      // R-0001
            store.add(galv(600, 300));                                       // R-0002
            store.add(NewRemnant.manual(MaterialType.STEEL, 20, RemnantOutline.rectangle(500, 500), ""));
        }
    }

    @AfterEach
    void drop() {
        if (rack != null) {
            rack.close();
        }
    }

    private static NewRemnant galv(double w, double h) {
        return NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(w, h), "rack");
    }

    private static NewRemnant offcut(double w, double h, int sheet) {
        return NewRemnant.offcut(MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(w, h), "",
                "J-17", sheet);
    }

    @Test
    void hold_keepsUsedReleasesOthersAndHandsOutIdsAfterTheHighest() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            clock.advance(Duration.ofMinutes(5));

            PlanHold hold = store.hold("plan-a", "J-17", Set.of("R-0002"),
                    List.of(offcut(300, 300, 1), offcut(400, 200, 1)), TTL);

            assertEquals(List.of("R-0002"), ids(hold.remnants()));
            assertEquals(List.of("R-0004", "R-0005"), hold.offcutIds());
            assertEquals(T0.plus(Duration.ofMinutes(5)).plus(TTL), hold.until());
            assertEquals(RemnantState.AVAILABLE, store.get("R-0001").orElseThrow().state());
            assertEquals(List.of("R-0002"), ids(store.reservedFor("plan-a")));
            assertEquals("R-0006", store.add(galv(100, 100)).id());
            PlanRecord plan = store.findPlan("plan-a").orElseThrow();
            assertEquals(List.of("R-0002"), plan.remnantsUsed());
            assertEquals(List.of("R-0004", "R-0005"), plan.offcuts().stream().map(PlanOffcut::id).toList());
            assertEquals(400, plan.offcuts().get(1).remnant().outline().widthMm(), EPS);
        }
    }

    @Test
    void hold_leaseTakenByAnotherPlanWhileNesting_refusesAndChangesNothing() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            clock.advance(TTL.plusMinutes(1));
            store.reserve(GALV, "plan-b", TTL);
            List<String> before = rack.snapshot();

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.hold("plan-a", "J-17", Set.of("R-0001"), List.of(offcut(10, 10, 1)), TTL));

            assertEquals("R-0001 is no longer reserved by plan plan-a (it is reserved by plan plan-b until "
                    + T0.plus(TTL).plus(Duration.ofMinutes(1)).plus(TTL) + "); its reservation ran out while nesting; nest again",
                    e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void commitPlan_recordsWhatTheRackHeldUnderTheHeldIds() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            store.hold("plan-a", "J-17", Set.of("R-0001"), List.of(offcut(400, 600, 2)), TTL);

            List<Remnant> added = store.commitPlan("plan-a", "bay 2");

            assertEquals(List.of("R-0004"), ids(added));
            assertEquals("job J-17 sheet 2", added.get(0).source().text());
            assertEquals("bay 2", added.get(0).location());
            assertEquals(400, added.get(0).widthMm(), EPS);
            assertEquals(600, added.get(0).heightMm(), EPS);
            assertEquals(RemnantState.USED, store.get("R-0001").orElseThrow().state());
            assertEquals(RemnantState.AVAILABLE, store.get("R-0002").orElseThrow().state());
            assertEquals(T0, store.findPlan("plan-a").orElseThrow().committed());
        }
    }

    @Test
    void commitPlan_secondTime_refusedAndNothingChanges() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            store.hold("plan-a", "J-17", Set.of("R-0001"), List.of(offcut(300, 300, 1)), TTL);
            store.commitPlan("plan-a", "");
            List<String> before = rack.snapshot();

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.commitPlan("plan-a", ""));

            assertEquals("plan plan-a was already committed at " + T0 + "; nothing was changed", e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void releasePlan_handsRemnantsBackAndThePlanCanNoLongerBeCommitted() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            store.hold("plan-a", "J-17", Set.of("R-0001"), List.of(offcut(300, 300, 1)), TTL);

            assertEquals(1, store.releasePlan("plan-a"));

            assertEquals(RemnantState.AVAILABLE, store.get("R-0001").orElseThrow().state());
            assertEquals(T0, store.findPlan("plan-a").orElseThrow().released());
            List<String> before = rack.snapshot();
            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.commitPlan("plan-a", ""));
            assertEquals("plan plan-a was released at " + T0 + "; its remnants went back to the rack; nest again",
                    e.getMessage());
            assertEquals(before, rack.snapshot());
            assertEquals(0, store.releasePlan("plan-a"));
            assertEquals("R-0005", store.add(galv(100, 100)).id());
        }
    }

    @Test
    void releasePlan_committedPlan_refused() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            store.hold("plan-a", "J-17", Set.of("R-0001"), List.of(), TTL);
            store.commitPlan("plan-a", "");

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.releasePlan("plan-a"));

            assertEquals("plan plan-a was committed at " + T0 + "; a committed plan cannot be released",
                    e.getMessage());
            assertEquals(RemnantState.USED, store.get("R-0001").orElseThrow().state());
        }
    }

    @Test
    void commitPlan_unknownPlan_namesPlanAndRack() {
        try (RemnantStore store = rack.open(clock)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> store.commitPlan("plan-z", ""));

            assertEquals("plan plan-z is not in " + rack.shown() + "; commit it to the inventory it was nested"
                    + " against", e.getMessage());
        }
    }

    @Test
    void commitPlan_failureAfterFirstOffcut_leavesInventoryAsItWas() {
        try (RemnantStore setup = rack.open(clock)) {
            setup.reserve(GALV, "plan-a", TTL);
            setup.hold("plan-a", "J-17", Set.of("R-0001"), List.of(offcut(300, 300, 1), offcut(200, 500, 2)), TTL);
        }
        List<String> before = rack.snapshot();
        FaultPoint crash = step -> {
            if (step.equals("commit:offcut 1")) {
                throw new IllegalStateException("simulated crash at " + step);
            }
        };
        try (RemnantStore store = rack.open(clock, Migrations.ALL, crash)) {
            assertThrows(IllegalStateException.class, () -> store.commitPlan("plan-a", ""));
        }

        assertEquals(before, rack.snapshot());
        try (RemnantStore after = rack.open(clock)) {
            assertNull(after.findPlan("plan-a").orElseThrow().committed());
            assertEquals(2, after.commitPlan("plan-a", "").size());
        }
    }

    @Test
    void reserveIds_oneHeldByAnotherPlan_reservesNone() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserveIds(List.of("R-0002"), "plan-b", TTL);
            List<String> before = rack.snapshot();

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> store.reserveIds(List.of("R-0001", "R-0002"), "plan-a", TTL));

            assertEquals("R-0002 is reserved by plan plan-b until " + T0.plus(TTL)
                    + "; wait for that plan or choose another remnant", e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }
}
