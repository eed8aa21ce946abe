package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Two planners drain the same rack at once, each through its own store on the same file. Every
 * galvanized remnant must be cut exactly once and every offcut id issued exactly once.
 */
class ConcurrentPlannersTest {
    private static final int REMNANTS = 30;

    @TempDir
    Path dir;

    private Path rack() {
        Path file = dir.resolve("rack.db");
        try (RemnantStore store = RemnantStore.open(file)) {
            for (int i = 0; i < REMNANTS; i++) {
                store.add(NewRemnant.manual(MaterialType.GALVANIZED, 24,
                        RemnantOutline.rectangle(100 + i, 100), "A" + i));
            }
        }
        return file;
    }

    @Test
    @Timeout(120)
    void twoThreads_eachWithItsOwnStore_neverShareARemnant() throws Exception {
        Path file = rack();
        ExecutorService pool = Executors.newFixedThreadPool(2);
        CountDownLatch start = new CountDownLatch(1);
        try {
            Future<List<String>> a = pool.submit(() -> {
                start.await();
                return PlannerMain.run(file, "plan-a");
            });
            Future<List<String>> b = pool.submit(() -> {
                start.await();
                return PlannerMain.run(file, "plan-b");
            });
            start.countDown();

            check(file, a.get(100, TimeUnit.SECONDS), b.get(100, TimeUnit.SECONDS));
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    @Timeout(180)
    void twoProcesses_onTheSameFile_neverShareARemnant() throws Exception {
        Path file = rack();
        Process a = planner(file, "plan-a");
        Process b = planner(file, "plan-b");
        try {
            CompletableFuture<String> outA = CompletableFuture.supplyAsync(() -> read(a));
            CompletableFuture<String> outB = CompletableFuture.supplyAsync(() -> read(b));
            assertTrue(a.waitFor(150, TimeUnit.SECONDS) && b.waitFor(30, TimeUnit.SECONDS), "planners timed out");
            assertEquals(0, a.exitValue(), outA.get());
            assertEquals(0, b.exitValue(), outB.get());

            check(file, outA.get().lines().toList(), outB.get().lines().toList());
        } finally {
            a.destroyForcibly();
            b.destroyForcibly();
        }
    }

    private static Process planner(Path file, String planId) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                PlannerMain.class.getName(), file.toString(), planId)
                .redirectErrorStream(true)
                .start();
    }

    private static String read(Process p) {
        try {
            return new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static void check(Path file, List<String> linesA, List<String> linesB) {
        List<String> used = new ArrayList<>();
        List<String> offcuts = new ArrayList<>();
        for (String line : concat(linesA, linesB)) {
            String[] parts = line.split(" ");
            assertEquals(2, parts.length, "unexpected planner output: " + line);
            used.add(parts[0]);
            offcuts.add(parts[1]);
        }
        Set<String> usedOnce = new HashSet<>(used);
        Set<String> inA = new HashSet<>(linesA.stream().map(l -> l.split(" ")[0]).toList());
        Set<String> inB = new HashSet<>(linesB.stream().map(l -> l.split(" ")[0]).toList());
        inA.retainAll(inB);
        assertEquals(Set.of(), inA, "both planners cut the same remnant");
        assertEquals(REMNANTS, used.size());
        assertEquals(REMNANTS, usedOnce.size());
        assertEquals(REMNANTS, new HashSet<>(offcuts).size());
        try (RemnantStore store = RemnantStore.open(file)) {
            List<Remnant> all = store.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID);
            assertEquals(2 * REMNANTS, all.size());
            for (Remnant r : all) {
                RemnantState expected = r.material() == MaterialType.GALVANIZED
                        ? RemnantState.USED : RemnantState.AVAILABLE;
                assertEquals(expected, r.state(), r.id());
            }
        }
    }

    private static List<String> concat(List<String> a, List<String> b) {
        List<String> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }

}
