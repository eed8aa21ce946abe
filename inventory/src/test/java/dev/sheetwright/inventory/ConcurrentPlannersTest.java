package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Planners racing for the same rack, each through its own store (threads) or its own JVM (processes), on both
 * backends. Every remnant must be cut at most once and every offcut id issued once; a client killed inside a commit
 * leaves the rack as it was.
 */
@ParameterizedClass
@MethodSource("dev.sheetwright.inventory.TestRack#kinds")
class ConcurrentPlannersTest {
    private static final int REMNANTS = 30;

    @Parameter
    TestRack.Kind kind;

    @TempDir
    Path dir;
    private TestRack rack;

    @BeforeEach
    void make() {
        rack = TestRack.make(kind, dir, "rack.db");
    }

    @AfterEach
    void drop() {
        if (rack != null) {
            rack.close();
        }
    }

    private void fill(int count) {
        try (RemnantStore store = rack.open()) {
            for (int i = 0; i < count; i++) {
                store.add(NewRemnant.manual(MaterialType.GALVANIZED, 24,
                        RemnantOutline.rectangle(100 + i, 100), "A" + i));
            }
        }
    }

    @Test
    @Timeout(120)
    void twoThreads_eachWithItsOwnStore_neverShareARemnant() throws Exception {
        fill(REMNANTS);
        ExecutorService pool = Executors.newFixedThreadPool(2);
        CountDownLatch start = new CountDownLatch(1);
        try {
            Future<List<String>> a = pool.submit(() -> {
                start.await();
                return PlannerMain.run(rack.location, "plan-a");
            });
            Future<List<String>> b = pool.submit(() -> {
                start.await();
                return PlannerMain.run(rack.location, "plan-b");
            });
            start.countDown();

            check(a.get(100, TimeUnit.SECONDS), b.get(100, TimeUnit.SECONDS));
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    @Timeout(180)
    void twoProcesses_onTheSameRack_neverShareARemnant() throws Exception {
        fill(REMNANTS);
        Process a = planner("drain", "plan-a");
        Process b = planner("drain", "plan-b");
        try {
            CompletableFuture<String> outA = CompletableFuture.supplyAsync(() -> read(a));
            CompletableFuture<String> outB = CompletableFuture.supplyAsync(() -> read(b));
            assertTrue(a.waitFor(150, TimeUnit.SECONDS) && b.waitFor(30, TimeUnit.SECONDS), "planners timed out");
            assertEquals(0, a.exitValue(), outA.get());
            assertEquals(0, b.exitValue(), outB.get());

            check(outA.get().lines().toList(), outB.get().lines().toList());
        } finally {
            a.destroyForcibly();
            b.destroyForcibly();
        }
    }

    @Test
    @Timeout(180)
    void fourProcesses_raceForTwoRemnants_noneIsCutTwice() throws Exception {
        fill(2);
        List<Process> planners = new ArrayList<>();
        List<CompletableFuture<String>> outs = new ArrayList<>();
        try {
            for (int i = 1; i <= 4; i++) {
                Process p = planner("once", "plan-" + i);
                planners.add(p);
                outs.add(CompletableFuture.supplyAsync(() -> read(p)));
            }
            List<String> cut = new ArrayList<>();
            for (int i = 0; i < 4; i++) {
                assertTrue(planners.get(i).waitFor(150, TimeUnit.SECONDS), "planner timed out");
                assertEquals(0, planners.get(i).exitValue(), outs.get(i).get());
                String line = outs.get(i).get().strip();
                if (!line.isEmpty()) {
                    cut.addAll(List.of(line.split(" ")));
                }
            }

            assertEquals(List.of("R-0001", "R-0002"), cut.stream().sorted().toList(), "cut by the planners");
            try (RemnantStore store = rack.open()) {
                for (Remnant r : store.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID)) {
                    assertEquals(RemnantState.USED, r.state(), r.id());
                }
            }
        } finally {
            planners.forEach(Process::destroyForcibly);
        }
    }

    @Test
    @Timeout(120)
    void commit_clientKilledInsideTheTransaction_leavesTheRackUnchanged() throws Exception {
        fill(2);
        try (RemnantStore store = rack.open()) {
            store.reserve(RemnantFilter.any(), "plan-k", Duration.ofMinutes(30));
            store.hold("plan-k", "J-9", Set.of("R-0001"), List.of(
                    NewRemnant.offcut(MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(300, 200), "",
                            "J-9", 1),
                    NewRemnant.offcut(MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(300, 300), "",
                            "J-9", 2)), Duration.ofMinutes(30));
        }
        List<String> before = rack.snapshot();

        Process p = planner("commit-and-hang", "plan-k");
        try (BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            String line = out.readLine();
            assertEquals("writing", line, "the client reached the middle of its commit");
            p.destroyForcibly().waitFor(30, TimeUnit.SECONDS);
        }

        assertEquals(before, rack.snapshot());
        try (RemnantStore store = rack.open()) {
            assertNull(store.findPlan("plan-k").orElseThrow().committed());
            assertEquals(2, store.commitPlan("plan-k", "").size());
            assertEquals(RemnantState.USED, store.get("R-0001").orElseThrow().state());
        }
    }

    private Process planner(String mode, String planId) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                PlannerMain.class.getName(), mode, locationArgument(), planId)
                .redirectErrorStream(true)
                .start();
    }

    /** The location with its password, for the child process only (the test server's, on 127.0.0.1). */
    private String locationArgument() {
        if (rack.location instanceof RackLocation.Server s) {
            return "postgresql://" + s.user() + (s.password() == null ? "" : ":" + s.password()) + "@" + s.host()
                    + ":" + s.port() + "/" + s.database();
        }
        return rack.location.toString();
    }

    private static String read(Process p) {
        try {
            return new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private void check(List<String> linesA, List<String> linesB) {
        List<String> used = new ArrayList<>();
        List<String> offcuts = new ArrayList<>();
        List<String> all = new ArrayList<>(linesA);
        all.addAll(linesB);
        for (String line : all) {
            String[] parts = line.split(" ");
            assertEquals(2, parts.length, "unexpected planner output: " + line);
            used.add(parts[0]);
            offcuts.add(parts[1]);
        }
        Set<String> inA = new HashSet<>(linesA.stream().map(l -> l.split(" ")[0]).toList());
        Set<String> inB = new HashSet<>(linesB.stream().map(l -> l.split(" ")[0]).toList());
        inA.retainAll(inB);
        assertEquals(Set.of(), inA, "both planners cut the same remnant");
        assertEquals(REMNANTS, used.size());
        assertEquals(REMNANTS, new HashSet<>(used).size());
        assertEquals(REMNANTS, new HashSet<>(offcuts).size());
        try (RemnantStore store = rack.open()) {
            List<Remnant> rows = store.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID);
            assertEquals(2 * REMNANTS, rows.size());
            for (Remnant r : rows) {
                RemnantState expected = r.material() == MaterialType.GALVANIZED
                        ? RemnantState.USED : RemnantState.AVAILABLE;
                assertEquals(expected, r.state(), r.id());
            }
        }
    }
}
