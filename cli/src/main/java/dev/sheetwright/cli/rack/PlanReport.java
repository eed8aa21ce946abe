package dev.sheetwright.cli.rack;

import dev.sheetwright.inventory.Remnant;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/** The terminal lines about a rack plan: what it holds, and what a commit recorded. */
public final class PlanReport {

    private PlanReport() {
    }

    public static void planned(PrintWriter w, RackPlan plan, Path out) {
        String u = plan.unit().symbol();
        w.printf(Locale.ROOT, "plan %s (%s): remnants cut %s, held until %s%n", plan.id(), plan.inventory(),
                plan.remnantsUsed().isEmpty() ? "none" : String.join(", ", plan.remnantsUsed()), plan.reservedUntil());
        for (RackPlan.PlannedOffcut o : plan.offcuts()) {
            w.printf(Locale.ROOT, "  offcut %s  sheet %d  %.2f x %.2f %s (id marked on layer LABEL)%n", o.id(),
                    o.sheet(), o.width(), o.height(), u);
        }
        w.printf(Locale.ROOT, "  offcuts smaller than %s are not recorded%n", plan.minOffcut().text(plan.unit()));
        w.flush();
    }

    public static void committed(PrintWriter w, RackPlan plan, List<Remnant> added) {
        w.printf(Locale.ROOT, "committed plan %s: used %s; recorded %s%n", plan.id(),
                plan.remnantsUsed().isEmpty() ? "no remnant" : String.join(", ", plan.remnantsUsed()),
                added.isEmpty() ? "no offcut" : String.join(", ", added.stream().map(r -> r.id()
                        + (r.location().isEmpty() ? "" : " at " + r.location())).toList()));
        w.flush();
    }

    public static void released(PrintWriter w, RackPlan plan, int back) {
        w.printf(Locale.ROOT, "released plan %s: %d remnant(s) back on the rack%s; the plan can no longer be"
                + " committed%n", plan.id(), back, back == 0 ? "" : " (" + String.join(", ", plan.remnantsUsed()) + ")");
        w.flush();
    }
}
