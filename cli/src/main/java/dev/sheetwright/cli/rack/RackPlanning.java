package dev.sheetwright.cli.rack;

import dev.sheetwright.cli.run.JobNest;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.inventory.NewRemnant;
import dev.sheetwright.inventory.OutlinePoint;
import dev.sheetwright.inventory.PlanHold;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RackLocation;
import dev.sheetwright.inventory.RemnantFilter;
import dev.sheetwright.inventory.RemnantOutline;
import dev.sheetwright.inventory.RemnantStore;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.SheetLayout;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.UUID;

/**
 * One nest planned against the remnant rack. {@link #reserve} takes the rack's remnants of the job's material for
 * a new plan id before nesting, so no other planner can plan on them; {@link #settle} then keeps only the remnants
 * the nest cuts, hands back the rest and takes ids for the new offcuts the nest leaves (so they can be etched on
 * the sheets now); {@link #close} hands everything back if the plan was not settled. Nothing else is changed in
 * the inventory until the plan is committed ({@link RackCommit}).
 */
public final class RackPlanning implements AutoCloseable {

    private final RemnantStore store;
    private final Job job;
    private final Duration ttl;
    private final String planId = UUID.randomUUID().toString();
    private final Set<String> rackIds = new LinkedHashSet<>();
    private boolean settled;

    private RackPlanning(RemnantStore store, Job job, Duration ttl) {
        this.store = store;
        this.job = job;
        this.ttl = ttl;
    }

    /** Opens the rack at {@code location}, which must exist, for a new plan of {@code job}. */
    public static RackPlanning open(RackLocation location, Job job, Duration ttl) {
        return new RackPlanning(RemnantStore.open(location, false), job, ttl);
    }

    String planId() {
        return planId;
    }

    public RemnantStore store() {
        return store;
    }

    /**
     * Reserves for this plan every free rack remnant of the job's material and gauge (or thickness) when
     * {@code all}, plus the remnants {@code ids} (which must match the job's material), and returns them as job
     * stock in the job's unit, smallest first.
     *
     * @throws IllegalArgumentException if an id is unknown or its material does not match the job
     * @throws dev.sheetwright.inventory.RemnantConflictException if a named remnant is used or held by another plan
     */
    public List<StockRemnant> reserve(boolean all, List<String> ids) {
        for (String id : ids) {
            Remnant r = store.get(id).orElseThrow(() -> new IllegalArgumentException("--remnant " + id
                    + ": no such remnant in " + store.location()));
            if (!matchesJob(r)) {
                throw new IllegalArgumentException("--remnant " + id + ": is " + describe(r) + "; the job is "
                        + jobMaterial() + "; choose a remnant of the job's material");
            }
        }
        if (!ids.isEmpty()) {
            store.reserveIds(ids, planId, ttl);
        }
        if (all) {
            RemnantFilter byMaterial = RemnantFilter.any().withMaterial(job.material().type());
            if (job.material().gauge().isPresent()) {
                store.reserve(byMaterial.withGauge(job.material().gauge().getAsInt()), planId, ttl);
            }
            store.reserve(byMaterial.withThicknessMm(job.material().thicknessMm()), planId, ttl);
        }
        List<Remnant> held = new ArrayList<>(store.reservedFor(planId));
        held.sort(Comparator.comparingDouble(Remnant::areaMm2).thenComparing(Remnant::id));
        List<StockRemnant> stock = new ArrayList<>();
        for (Remnant r : held) {
            rackIds.add(r.id());
            stock.add(new StockRemnant(r.id(), outline(r, job.unit()), 0));
        }
        return stock;
    }

    /**
     * Keeps the rack remnants {@code nest} cuts, hands back the others and takes an id for each clean offcut at
     * least {@code min}, all in one inventory transaction.
     */
    public RackPlan settle(JobNest nest, MinOffcut min) {
        Set<String> used = new LinkedHashSet<>();
        List<SheetLayout> withOffcut = new ArrayList<>();
        for (SheetLayout s : nest.result().sheets()) {
            if (rackIds.contains(s.stock().label()) && s.stock() instanceof dev.sheetwright.nest.model.Remnant) {
                used.add(s.stock().label());
            }
            Offcut o = nest.offcut(s);
            if (o != null && min.accepts(o)) {
                withOffcut.add(s);
            }
        }
        List<NewRemnant> records = new ArrayList<>();
        for (SheetLayout s : withOffcut) {
            Offcut o = nest.offcut(s);
            RemnantOutline outline = RemnantOutline.rectangle(job.unit().toMm(o.width()), job.unit().toMm(o.height()));
            records.add(NewRemnant.offcut(job.material().type(), jobGauge(),
                    jobGauge() == null ? job.material().thicknessMm() : null, outline, "", job.name(), s.index() + 1));
        }
        PlanHold hold = store.hold(planId, job.name(), used, records, ttl);
        settled = true;
        List<RackPlan.PlannedOffcut> offcuts = new ArrayList<>();
        for (int i = 0; i < withOffcut.size(); i++) {
            SheetLayout s = withOffcut.get(i);
            Offcut o = nest.offcut(s);
            offcuts.add(new RackPlan.PlannedOffcut(hold.offcutIds().get(i), s.index() + 1, o.x(), o.y(), o.width(),
                    o.height()));
        }
        return new RackPlan(planId, store.location().toString(), job.name(), job.unit(), job.material().type(),
                jobGauge(), job.material().thicknessMm(), hold.until(), List.copyOf(used), offcuts, min);
    }

    /** Hands back every remnant this plan holds (after a failure); the ids it took stay unused. */
    public void abandon() {
        if (settled) {
            store.releasePlan(planId);
        } else {
            store.release(planId);
        }
    }

    @Override
    public void close() {
        try {
            if (!settled) {
                store.release(planId);
            }
        } finally {
            store.close();
        }
    }

    private boolean matchesJob(Remnant r) {
        if (r.material() != job.material().type()) {
            return false;
        }
        if (r.gauge() != null && job.material().gauge().isPresent()) {
            return r.gauge() == job.material().gauge().getAsInt();
        }
        return r.thicknessMm() != null
                && Math.abs(r.thicknessMm() - job.material().thicknessMm()) <= RemnantFilter.THICKNESS_MATCH_MM;
    }

    private static String describe(Remnant r) {
        return describe(r.material(), r.gauge(), r.thicknessMm());
    }

    private String jobMaterial() {
        return describe(job.material().type(), jobGauge(), job.material().thicknessMm());
    }

    /** The job's gauge, or null when its material is given by thickness. */
    private Integer jobGauge() {
        return job.material().gauge().isPresent() ? job.material().gauge().getAsInt() : null;
    }

    /** E.g. {@code galvanized 24 ga 0.701 mm}; gauge and thickness are left out when null. */
    private static String describe(MaterialType type, Integer gauge, Double thicknessMm) {
        return type.word() + (gauge != null ? " " + gauge + " ga" : "")
                + (thicknessMm != null ? String.format(Locale.ROOT, " %.3f mm", thicknessMm) : "");
    }

    /** The remnant's corners converted from the store's millimetres to {@code unit}. */
    private static List<Point2> outline(Remnant r, LengthUnit unit) {
        List<Point2> pts = new ArrayList<>();
        for (OutlinePoint p : r.outline().vertices()) {
            pts.add(new Point2(unit.fromMm(p.x()), unit.fromMm(p.y())));
        }
        return pts;
    }
}
