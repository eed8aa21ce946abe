package dev.sheetwright.cli.rack;

import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.PlanOffcut;
import dev.sheetwright.inventory.PlanRecord;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantStore;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * Commits a planned nest to the rack: the remnants it cut become used, its offcuts are recorded, all at once. What is
 * recorded is what the rack kept when the plan was made; the plan in nest.json must still say the same, so an edited
 * file is refused rather than half believed.
 */
public final class RackCommit {
    /**
     * nest.json keeps sizes in the job's unit at full double precision; converted back to mm they match the rack's
     * record to far better than this, while any edit a person makes is far larger (common practice).
     */
    static final double SAME_SIZE_MM = 0.001;

    private RackCommit() {
    }

    /**
     * Marks the plan's remnants used and records each planned offcut under the id etched on its sheet, kept at
     * {@code location}, in one inventory transaction.
     *
     * @return the new offcuts' records
     * @throws IllegalArgumentException if the plan is not in {@code store} or nest.json's plan differs from what the
     *                                  rack recorded for it (naming the field)
     * @throws dev.sheetwright.inventory.RemnantConflictException if it was committed or released before, or a
     *                                                            remnant it cuts was taken by another plan
     */
    public static List<Remnant> commit(RemnantStore store, RackPlan plan, String location) {
        PlanRecord recorded = recorded(store, plan, "commit");
        checkUnchanged(plan, recorded);
        return store.commitPlan(plan.id(), location);
    }

    /** The rack's record of {@code plan}. */
    static PlanRecord recorded(RemnantStore store, RackPlan plan, String verb) {
        return store.findPlan(plan.id()).orElseThrow(() -> new IllegalArgumentException("plan " + plan.id()
                + " is not in " + store.location() + "; " + verb + " it with the inventory it was nested against ("
                + plan.inventory() + ")"));
    }

    /**
     * Refuses a plan whose nest.json no longer says what the rack recorded: the remnants it cuts, the offcut ids, their
     * sizes and material.
     */
    static void checkUnchanged(RackPlan plan, PlanRecord recorded) {
        if (!recorded.complete()) {
            return; // an older plan: the store refuses to commit it with its own message
        }
        if (!new HashSet<>(plan.remnantsUsed()).equals(new HashSet<>(recorded.remnantsUsed()))) {
            throw edited("plan.remnantsUsed", String.join(", ", plan.remnantsUsed()),
                    String.join(", ", recorded.remnantsUsed()));
        }
        List<PlanOffcut> kept = recorded.offcuts();
        if (plan.offcuts().size() != kept.size()) {
            throw edited("plan.offcuts", plan.offcuts().size() + " offcut(s)", kept.size() + " offcut(s)");
        }
        for (int i = 0; i < kept.size(); i++) {
            RackPlan.PlannedOffcut o = plan.offcuts().get(i);
            PlanOffcut k = kept.get(i);
            String field = "plan.offcuts[" + i + "]";
            if (!o.id().equals(k.id())) {
                throw edited(field + ".id", o.id(), k.id());
            }
            NewRemnant r = k.remnant();
            checkSize(plan, field + ".width", o.width(), r.outline().widthMm());
            checkSize(plan, field + ".height", o.height(), r.outline().heightMm());
            if (r.material() != plan.material() || !Objects.equals(r.gauge(), plan.gauge())) {
                throw edited("plan.material", plan.material().word() + (plan.gauge() == null ? "" : " "
                        + plan.gauge() + " ga"), r.material().word() + (r.gauge() == null ? "" : " " + r.gauge()
                        + " ga"));
            }
        }
    }

    private static void checkSize(RackPlan plan, String field, double value, double recordedMm) {
        if (!(Math.abs(plan.unit().toMm(value) - recordedMm) <= SAME_SIZE_MM)) {
            String u = plan.unit().symbol();
            throw edited(field, String.format(Locale.ROOT, "%.4f %s", value, u),
                    String.format(Locale.ROOT, "%.4f %s", plan.unit().fromMm(recordedMm), u));
        }
    }

    private static IllegalArgumentException edited(String field, String file, String rack) {
        return new IllegalArgumentException("nest.json " + field + " is " + file + " but the rack recorded " + rack
                + " when the plan was made; the file was changed after nesting, so nothing was committed (restore"
                + " the file from the nest, or release the plan and nest again)");
    }
}
