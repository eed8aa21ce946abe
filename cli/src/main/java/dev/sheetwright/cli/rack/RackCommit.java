package dev.sheetwright.cli.rack;

import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantOutline;
import dev.sheetwright.inventory.RemnantStore;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;

/** Commits a planned nest to the rack: the remnants it cut become used, its offcuts are recorded, all at once. */
public final class RackCommit {

    private RackCommit() {
    }

    /**
     * Marks the plan's remnants used and records each planned offcut under the id etched on its sheet, kept at
     * {@code location}, in one inventory transaction.
     *
     * @return the new offcuts' records
     * @throws IllegalArgumentException if the plan is not in {@code store}
     * @throws dev.sheetwright.inventory.RemnantConflictException if it was committed before, or a remnant it cuts
     *                                                            was taken by another plan after its reservation ran out
     */
    public static List<Remnant> commit(RemnantStore store, RackPlan plan, String location) {
        Map<String, NewRemnant> offcuts = new LinkedHashMap<>();
        for (RackPlan.PlannedOffcut o : plan.offcuts()) {
            RemnantOutline outline = RemnantOutline.rectangle(plan.unit().toMm(o.width()),
                    plan.unit().toMm(o.height()));
            offcuts.put(o.id(), NewRemnant.offcut(plan.material(), plan.gauge(),
                    plan.gauge() == null ? plan.thicknessMm() : null, outline, location, plan.job(), o.sheet()));
        }
        return store.commitPlan(plan.id(), new LinkedHashSet<>(plan.remnantsUsed()), offcuts);
    }
}
