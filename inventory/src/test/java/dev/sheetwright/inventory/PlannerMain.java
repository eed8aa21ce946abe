package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * A stand-in planner used by the concurrency tests, in threads and as a separate JVM. Modes:
 * <ul>
 *   <li>{@code drain}: takes one galvanized remnant at a time, settles a plan that cuts it and leaves a steel offcut,
 *       commits it, until none is left; prints one line per commit: the used id and the offcut id;</li>
 *   <li>{@code once}: reserves every free galvanized remnant, settles a plan that cuts all it got, commits it;
 *       prints the used ids on one line (empty when it got none);</li>
 *   <li>{@code commit-and-hang}: commits the settled plan given as third argument, but stops for good after the
 *       first offcut is written (printing {@code writing}), so the test can kill it inside the transaction;</li>
 *   <li>{@code count}: prints how many remnants are on the rack (to see that it could log in).</li>
 * </ul>
 */
final class PlannerMain {
    private static final Duration TTL = Duration.ofMinutes(5);
    private static final RemnantFilter GALVANIZED = RemnantFilter.any().withMaterial(MaterialType.GALVANIZED);

    private PlannerMain() {
    }

    /** Arguments: mode, rack location, plan id (not for {@code count}). */
    public static void main(String[] args) throws Exception {
        RackLocation location = RackLocation.parse(args[1]);
        switch (args[0]) {
            case "drain" -> run(location, args[2]).forEach(System.out::println);
            case "once" -> System.out.println(String.join(" ", once(location, args[2])));
            case "commit-and-hang" -> commitAndHang(location, args[2]);
            case "count" -> {
                try (RemnantStore store = RemnantStore.open(location, false)) {
                    System.out.println(store.list(RemnantFilter.any(), RemnantSort.ID).size());
                }
            }
            default -> throw new IllegalArgumentException("mode " + args[0]);
        }
    }

    static List<String> run(RackLocation location, String planId) {
        List<String> lines = new ArrayList<>();
        try (RemnantStore store = RemnantStore.open(location, false)) {
            for (int round = 1; ; round++) {
                String plan = planId + "-" + round;
                List<Remnant> got = store.reserve(GALVANIZED, plan, TTL, 1);
                if (got.isEmpty()) {
                    return lines;
                }
                String used = got.get(0).id();
                store.hold(plan, planId, Set.of(used), List.of(NewRemnant.offcut(MaterialType.STEEL, 20, null,
                        RemnantOutline.rectangle(100, 50), "", planId, round)), TTL);
                List<Remnant> offcuts = store.commitPlan(plan, "bin");
                lines.add(used + " " + offcuts.get(0).id());
            }
        }
    }

    static List<String> once(RackLocation location, String planId) {
        try (RemnantStore store = RemnantStore.open(location, false)) {
            List<Remnant> got = store.reserve(GALVANIZED, planId, TTL);
            Set<String> used = new LinkedHashSet<>(got.stream().map(Remnant::id).toList());
            store.hold(planId, "race", used, List.of(), TTL);
            store.commitPlan(planId, "");
            return List.copyOf(used);
        }
    }

    private static void commitAndHang(RackLocation location, String planId) {
        FaultPoint hang = step -> {
            if (step.equals("commit:offcut 1")) {
                System.out.println("writing");
                System.out.flush();
                try {
                    Thread.sleep(Long.MAX_VALUE);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        };
        try (RemnantStore store = RemnantStore.open(RemnantStore.backend(location), false, Clock.systemUTC(),
                Migrations.ALL, hang)) {
            store.commitPlan(planId, "");
        }
    }
}
