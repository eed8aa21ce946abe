package dev.sheetwright.inventory;

import static dev.sheetwright.inventory.RemnantStoreTest.ids;
import static org.junit.jupiter.api.Assertions.assertEquals;
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

/** Reservations (leases) and cutting what a plan reserved, on both backends. */
@ParameterizedClass
@MethodSource("dev.sheetwright.inventory.TestRack#kinds")
class RemnantReservationTest {
    private static final Instant T0 = Instant.parse("2025-03-14T09:30:00Z");
    private static final Duration TTL = Duration.ofMinutes(10);
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
            store.add(galv(900, 900));                                       // R-0003
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

    static NewRemnant offcut(double w, double h, int sheet) {
        return NewRemnant.offcut(MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(w, h), "",
                "J-17", sheet);
    }

    /** Settles plan {@code planId} with what it cuts and leaves, then commits it at rack slot "rack". */
    static List<Remnant> cut(RemnantStore store, String planId, Set<String> used, List<NewRemnant> offcuts) {
        store.hold(planId, "J-17", used, offcuts, TTL);
        return store.commitPlan(planId, "rack");
    }

    @Test
    void reserve_matchingAvailable_flipsThemToReservedWithOwnerAndExpiry() {
        try (RemnantStore store = rack.open(clock)) {
            List<Remnant> got = store.reserve(GALV, "plan-a", TTL);

            assertEquals(List.of("R-0001", "R-0002", "R-0003"), ids(got));
            for (Remnant r : got) {
                assertEquals(RemnantState.RESERVED, r.state());
                assertEquals("plan-a", r.reservedBy());
                assertEquals(T0.plus(TTL), r.reservedUntil());
            }
            assertEquals(RemnantState.AVAILABLE, store.get("R-0004").orElseThrow().state());
        }
    }

    @Test
    void reserve_maxCount_takesSmallestFirstAndOthersGetTheRest() {
        try (RemnantStore a = rack.open(clock); RemnantStore b = rack.open(clock)) {
            assertEquals(List.of("R-0002"), ids(a.reserve(GALV, "plan-a", TTL, 1)));

            assertEquals(List.of("R-0001", "R-0003"), ids(b.reserve(GALV, "plan-b", TTL)));
            assertEquals(List.of("R-0002"), ids(a.reserve(GALV, "plan-a", TTL)));
        }
    }

    @Test
    void reserve_staleReservation_canBeTakenByAnotherPlanAndTheFirstCannotSettleIt() {
        try (RemnantStore a = rack.open(clock); RemnantStore b = rack.open(clock)) {
            a.reserve(GALV, "plan-a", Duration.ofMinutes(1));
            assertEquals(List.of(), b.reserve(GALV, "plan-b", TTL));

            clock.advance(Duration.ofMinutes(1));
            List<Remnant> taken = b.reserve(GALV, "plan-b", TTL, 1);

            assertEquals(List.of("R-0002"), ids(taken));
            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> cut(a, "plan-a", Set.of("R-0002"), List.of()));
            assertEquals("R-0002 is no longer reserved by plan plan-a (it is reserved by plan plan-b until "
                    + T0.plus(Duration.ofMinutes(11)) + "); its reservation ran out while nesting; nest again",
                    e.getMessage());
            assertEquals(List.of(), cut(b, "plan-b", Set.of("R-0002"), List.of()));
            assertEquals(RemnantState.USED, b.get("R-0002").orElseThrow().state());
        }
    }

    @Test
    void commit_settledLeaseExpiredButUntaken_stillBelongsToThePlan() {
        try (RemnantStore a = rack.open(clock)) {
            a.reserve(GALV, "plan-a", Duration.ofMinutes(1), 1);
            a.hold("plan-a", "J-17", Set.of("R-0002"), List.of(), Duration.ofMinutes(1));
            clock.advance(Duration.ofHours(1));

            a.commitPlan("plan-a", "");

            assertEquals(RemnantState.USED, a.get("R-0002").orElseThrow().state());
        }
    }

    @Test
    void commit_marksUsedReleasesTheRestAndAddsOffcutsWithIds() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);

            List<Remnant> offcuts = cut(store, "plan-a", Set.of("R-0001", "R-0003"),
                    List.of(offcut(400, 300, 1), offcut(200, 900, 2)));

            assertEquals(List.of("R-0005", "R-0006"), ids(offcuts));
            assertEquals("job J-17 sheet 2", offcuts.get(1).source().text());
            assertEquals("rack", offcuts.get(1).location());
            assertEquals(RemnantState.AVAILABLE, offcuts.get(0).state());
            assertEquals(RemnantState.USED, store.get("R-0001").orElseThrow().state());
            assertEquals(RemnantState.USED, store.get("R-0003").orElseThrow().state());
            Remnant back = store.get("R-0002").orElseThrow();
            assertEquals(RemnantState.AVAILABLE, back.state());
            assertEquals(null, back.reservedBy());
            assertEquals(List.of("R-0002", "R-0004", "R-0005", "R-0006"),
                    ids(store.list(RemnantFilter.any(), RemnantSort.ID)));
            assertEquals(List.of(), store.reservedFor("plan-a"));
        }
    }

    @Test
    void hold_remnantAlreadyUsed_isRefusedAndChangesNothing() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);
            cut(store, "plan-a", Set.of("R-0001"), List.of());
            List<String> before = rack.snapshot();

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> cut(store, "plan-b", Set.of("R-0001"), List.of(offcut(10, 10, 1))));

            assertEquals("R-0001 is no longer reserved by plan plan-b (it is used); its reservation ran out while"
                    + " nesting; nest again", e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void hold_notReserved_isRefusedAndChangesNothing() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL, 1);
            List<String> before = rack.snapshot();

            RemnantConflictException e = assertThrows(RemnantConflictException.class,
                    () -> cut(store, "plan-a", Set.of("R-0002", "R-0004"), List.of(offcut(10, 10, 1))));

            assertEquals("R-0004 is no longer reserved by plan plan-a (it is available); its reservation ran out"
                    + " while nesting; nest again", e.getMessage());
            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void hold_unknownId_namesIdAndRack() {
        try (RemnantStore store = rack.open(clock)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> cut(store, "plan-a", Set.of("R-0099"), List.of()));
            assertEquals("no remnant R-0099 in " + rack.shown(), e.getMessage());
        }
    }

    @Test
    void commit_failureAfterFirstUpdate_leavesInventoryExactlyAsItWas() {
        try (RemnantStore setup = rack.open(clock)) {
            setup.reserve(GALV, "plan-a", TTL);
            setup.hold("plan-a", "J-17", Set.of("R-0001", "R-0002"), List.of(offcut(10, 10, 1)), TTL);
        }
        List<String> before = rack.snapshot();
        FaultPoint crash = step -> {
            if (step.equals("commit:used R-0001")) {
                throw new IllegalStateException("simulated crash at " + step);
            }
        };
        try (RemnantStore store = rack.open(clock, Migrations.ALL, crash)) {
            IllegalStateException e = assertThrows(IllegalStateException.class,
                    () -> store.commitPlan("plan-a", "rack"));
            assertEquals("simulated crash at commit:used R-0001", e.getMessage());
        }

        assertEquals(before, rack.snapshot());
        try (RemnantStore after = rack.open(clock)) {
            assertEquals(List.of("R-0001", "R-0002"), ids(after.reservedFor("plan-a")));
            assertEquals("R-0005", after.commitPlan("plan-a", "rack").get(0).id());
        }
    }

    @Test
    void commit_databaseRefusesSecondOffcut_rollsBackUsedAndFirstOffcut() {
        try (RemnantStore setup = rack.open(clock)) {
            setup.reserve(GALV, "plan-a", TTL);
            setup.hold("plan-a", "J-17", Set.of("R-0001", "R-0003"),
                    List.of(offcut(400, 300, 1), offcut(200, 900, 2)), TTL);
        }
        rack.refuseInsertsOfSource("job J-17 sheet 2", "disk full");
        List<String> before = rack.snapshot();

        try (RemnantStore store = rack.open(clock)) {
            InventoryStorageException e = assertThrows(InventoryStorageException.class,
                    () -> store.commitPlan("plan-a", "rack"));
            assertEquals(true, e.getMessage().contains("disk full"), e.getMessage());
        }

        assertEquals(before, rack.snapshot());
    }

    @Test
    void release_returnsThePlansRemnantsToTheRack() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL);

            assertEquals(3, store.release("plan-a"));

            assertEquals(List.of(), store.reservedFor("plan-a"));
            assertEquals(List.of("R-0001", "R-0002", "R-0003"), ids(store.reserve(GALV, "plan-b", TTL)));
        }
    }

    @Test
    void remove_liveReservation_isRefused() {
        try (RemnantStore store = rack.open(clock)) {
            store.reserve(GALV, "plan-a", TTL, 1);
            RemnantConflictException e = assertThrows(RemnantConflictException.class, () -> store.remove("R-0002"));
            assertEquals("R-0002 is reserved by plan plan-a until 2025-03-14T09:40:00Z; release that plan first"
                    + " ('sheetwright release OUT')", e.getMessage());
        }
    }

    @Test
    void reserve_badArguments_nameTheField() {
        try (RemnantStore store = rack.open(clock)) {
            assertEquals("ttl: PT0S is out of range; must be > 0 and at most PT720H", assertThrows(
                    IllegalArgumentException.class, () -> store.reserve(GALV, "p", Duration.ZERO)).getMessage());
            assertEquals("planId: ' ' must be 1 to 100 printable characters without surrounding blanks",
                    assertThrows(IllegalArgumentException.class, () -> store.reserve(GALV, " ", TTL)).getMessage());
        }
    }
}
