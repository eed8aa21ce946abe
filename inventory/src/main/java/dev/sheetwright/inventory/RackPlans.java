package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Plans: a nest against the rack is settled (its remnants held, ids handed out for its offcuts, and what it cuts
 * and leaves recorded), then committed once or released. Package-private; reached through {@link RemnantStore}.
 */
final class RackPlans {
    /** Most offcut ids one plan may hold. */
    static final int MAX_OFFCUTS_PER_PLAN = 10_000;

    private final RackDb db;
    private final RemnantLeases leases;

    RackPlans(RackDb db, RemnantLeases leases) {
        this.db = db;
        this.leases = leases;
    }

    PlanHold hold(String planId, String job, Set<String> usedIds, List<NewRemnant> offcuts, Duration ttl) {
        RackDb.checkPlanId(planId);
        RackDb.requireNonNull("usedIds", usedIds);
        RackDb.requireNonNull("offcuts", offcuts);
        RemnantLeases.checkTtl(ttl);
        RemnantSource.job(job, 1); // checks the job name the way offcut sources will carry it
        if (offcuts.size() > MAX_OFFCUTS_PER_PLAN) {
            throw new IllegalArgumentException("offcuts: " + offcuts.size() + " is too many; at most "
                    + MAX_OFFCUTS_PER_PLAN);
        }
        for (int i = 0; i < offcuts.size(); i++) {
            RackDb.requireNonNull("offcuts[" + i + "]", offcuts.get(i));
        }
        Set<Long> seqs = RackDb.seqsOf(usedIds);
        return db.transaction(() -> {
            if (plan(planId).isPresent()) {
                throw new RemnantConflictException("plan " + planId + " was settled before; make a new plan");
            }
            Instant now = db.now();
            long until = now.toEpochMilli() + ttl.toMillis();
            List<Remnant> kept = new ArrayList<>();
            for (long seq : seqs) {
                Remnant r = db.get(seq).orElseThrow(() -> db.noSuch(seq));
                if (r.state() != RemnantState.RESERVED || !planId.equals(r.reservedBy())) {
                    String state = r.state() == RemnantState.RESERVED
                            ? "reserved by plan " + r.reservedBy() + " until " + r.reservedUntil() : r.state().word();
                    throw new RemnantConflictException(r.id() + " is no longer reserved by plan " + planId + " (it is "
                            + state + "); its reservation ran out while nesting; nest again");
                }
                db.update("UPDATE remnant SET reserved_until = ? WHERE seq = ?", List.of(until, seq));
                kept.add(db.get(seq).orElseThrow());
            }
            leases.releaseAllBut(planId, seqs);
            String used = seqs.stream().map(RemnantId::format).collect(Collectors.joining(" "));
            db.update("INSERT INTO plan (id, job, made, committed, remnants_used) VALUES (?, ?, ?, NULL, ?)",
                    List.of(planId, RemnantSource.job(job, 1).job(), now.toString(), used));
            long issued = db.highestIssued();
            List<String> ids = new ArrayList<>();
            for (int i = 0; i < offcuts.size(); i++) {
                NewRemnant o = offcuts.get(i);
                long seq = issued + i + 1;
                db.update("INSERT INTO plan_offcut_id (seq, plan_id, material, gauge, thickness_mm, outline, source)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?)", Arrays.asList(seq, planId, o.material().word(), o.gauge(),
                        o.thicknessMm(), o.outline().toText(), o.source().text()));
                ids.add(RemnantId.format(seq));
            }
            if (!offcuts.isEmpty()) {
                db.noteIssued(issued + offcuts.size());
            }
            db.faults.reached("hold:recorded");
            return new PlanHold(planId, List.copyOf(kept), List.copyOf(ids), Instant.ofEpochMilli(until));
        });
    }

    List<Remnant> commit(String planId, String location) {
        RackDb.checkPlanId(planId);
        return db.transaction(() -> {
            PlanRecord plan = plan(planId).orElseThrow(() -> new IllegalArgumentException("plan " + planId
                    + " is not in " + db.location() + "; commit it to the inventory it was nested against"));
            if (plan.committed() != null) {
                throw new RemnantConflictException("plan " + planId + " was already committed at " + plan.committed()
                        + "; nothing was changed");
            }
            if (plan.released() != null) {
                throw new RemnantConflictException("plan " + planId + " was released at " + plan.released()
                        + "; its remnants went back to the rack; nest again");
            }
            if (!plan.complete()) {
                throw new RemnantConflictException("plan " + planId + " was recorded by an older sheetwright without"
                        + " what it cuts; release it ('sheetwright release OUT') and nest again");
            }
            leases.markUsed(planId, RackDb.seqsOf(plan.remnantsUsed()));
            leases.releaseAllBut(planId, Set.of());
            Instant now = db.now();
            List<Remnant> added = new ArrayList<>();
            for (PlanOffcut o : plan.offcuts()) {
                long seq = RemnantId.parse(o.id());
                if (db.get(seq).isPresent()) {
                    throw new IllegalStateException("commit: " + o.id() + " is already recorded");
                }
                NewRemnant r = o.remnant();
                NewRemnant placed = new NewRemnant(r.material(), r.gauge(), r.thicknessMm(), r.outline(), location,
                        r.source());
                added.add(db.get(db.insert(placed, seq, now, RemnantState.AVAILABLE)).orElseThrow());
                db.faults.reached("commit:offcut " + added.size());
            }
            db.update("UPDATE plan SET committed = ? WHERE id = ?", List.of(now.toString(), planId));
            return List.copyOf(added);
        });
    }

    int release(String planId) {
        RackDb.checkPlanId(planId);
        return db.transaction(() -> {
            PlanRecord plan = plan(planId).orElseThrow(() -> new IllegalArgumentException("plan " + planId
                    + " is not in " + db.location() + "; release it from the inventory it was nested against"));
            if (plan.committed() != null) {
                throw new RemnantConflictException("plan " + planId + " was committed at " + plan.committed()
                        + "; a committed plan cannot be released");
            }
            int n = leases.releaseAllBut(planId, Set.of());
            if (plan.released() == null) {
                db.update("UPDATE plan SET released = ? WHERE id = ?", List.of(db.now().toString(), planId));
            }
            return n;
        });
    }

    Optional<PlanRecord> find(String planId) {
        RackDb.checkPlanId(planId);
        return db.read(() -> plan(planId));
    }

    private Optional<PlanRecord> plan(String planId) throws SQLException {
        String job;
        Instant made;
        Instant committed;
        Instant released;
        List<String> used;
        try (PreparedStatement p = db.conn.prepareStatement(
                "SELECT id, job, made, committed, released, remnants_used FROM plan WHERE id = ?")) {
            p.setString(1, planId);
            try (ResultSet rs = p.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                job = rs.getString("job");
                made = Instant.parse(rs.getString("made"));
                committed = instant(rs.getString("committed"));
                released = instant(rs.getString("released"));
                String u = rs.getString("remnants_used");
                used = u == null ? null : u.isBlank() ? List.of() : List.of(u.strip().split(" "));
            }
        }
        List<PlanOffcut> offcuts = new ArrayList<>();
        try (PreparedStatement p = db.conn.prepareStatement("SELECT seq, material, gauge, thickness_mm, outline,"
                + " source FROM plan_offcut_id WHERE plan_id = ? ORDER BY seq")) {
            p.setString(1, planId);
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    String material = rs.getString("material");
                    if (material == null) {
                        continue; // an id held by a plan recorded before schema version 3
                    }
                    int gauge = rs.getInt("gauge");
                    Integer g = rs.wasNull() ? null : gauge;
                    double thickness = rs.getDouble("thickness_mm");
                    Double t = rs.wasNull() ? null : thickness;
                    offcuts.add(new PlanOffcut(RemnantId.format(rs.getLong("seq")), new NewRemnant(
                            MaterialType.parse(material), g, t, RemnantOutline.parse(rs.getString("outline")), "",
                            RemnantSource.parse(rs.getString("source")))));
                }
            }
        }
        return Optional.of(new PlanRecord(planId, job, made, committed, released, used, offcuts));
    }

    private static Instant instant(String text) {
        return text == null ? null : Instant.parse(text);
    }
}
