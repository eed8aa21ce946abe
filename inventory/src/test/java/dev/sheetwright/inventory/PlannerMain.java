package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * A stand-in planner used by the concurrency tests, in threads and as a separate JVM: it takes one
 * galvanized remnant at a time, cuts it (commit) and records a steel offcut, until none is left.
 */
final class PlannerMain {
    private PlannerMain() {
    }

    /** Arguments: database file, plan id. Prints one line per commit: the used id and the offcut id. */
    public static void main(String[] args) {
        for (String line : run(Path.of(args[0]), args[1])) {
            System.out.println(line);
        }
    }

    static List<String> run(Path file, String planId) {
        List<String> lines = new ArrayList<>();
        RemnantFilter galvanized = RemnantFilter.any().withMaterial(MaterialType.GALVANIZED);
        try (RemnantStore store = RemnantStore.open(file)) {
            for (int round = 1; ; round++) {
                List<Remnant> got = store.reserve(galvanized, planId, Duration.ofMinutes(5), 1);
                if (got.isEmpty()) {
                    return lines;
                }
                String used = got.get(0).id();
                List<Remnant> offcuts = store.commit(planId, Set.of(used), List.of(NewRemnant.offcut(
                        MaterialType.STEEL, 20, null, RemnantOutline.rectangle(100, 50), "bin", planId, round)));
                lines.add(used + " " + offcuts.get(0).id());
            }
        }
    }
}
