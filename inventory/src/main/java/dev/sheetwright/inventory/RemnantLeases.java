package dev.sheetwright.inventory;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;

/**
 * Reservations: leases of remnants to a plan until an expiry time; once that time has passed another plan may take
 * them. Package-private; reached through {@link RemnantStore}.
 */
final class RemnantLeases {
    /** Longest reservation accepted. */
    static final Duration MAX_TTL = Duration.ofDays(30);

    private final RackDb db;

    RemnantLeases(RackDb db) {
        this.db = db;
    }

    List<Remnant> reserve(RemnantFilter filter, String planId, Duration ttl, int maxCount) {
        RackDb.requireNonNull("filter", filter);
        RackDb.checkPlanId(planId);
        checkTtl(ttl);
        if (maxCount < 0) {
            throw new IllegalArgumentException("maxCount: " + maxCount + " is out of range; must be >= 0");
        }
        return db.transaction(() -> {
            long now = db.now().toEpochMilli();
            long until = now + ttl.toMillis();
            List<Object> args = new ArrayList<>();
            args.add(planId);
            args.add(until);
            String where = RackDb.where(filter, args, true);
            args.add(now);
            args.add(maxCount);
            db.update("UPDATE remnant SET state = 'reserved', reserved_by = ?, reserved_until = ? WHERE seq IN ("
                    + "SELECT seq FROM remnant WHERE " + where
                    + " AND (state = 'available' OR (state = 'reserved' AND reserved_until <= ?))"
                    + " ORDER BY area_mm2 ASC, seq ASC LIMIT ?)", args);
            db.update("UPDATE remnant SET reserved_until = ? WHERE state = 'reserved' AND reserved_by = ?",
                    List.of(until, planId));
            return reservedForIn(planId);
        });
    }

    List<Remnant> reserveIds(Collection<String> ids, String planId, Duration ttl) {
        RackDb.requireNonNull("ids", ids);
        RackDb.checkPlanId(planId);
        checkTtl(ttl);
        Set<Long> seqs = RackDb.seqsOf(ids);
        return db.transaction(() -> {
            Instant now = db.now();
            long until = now.toEpochMilli() + ttl.toMillis();
            for (long seq : seqs) {
                Remnant r = db.get(seq).orElseThrow(() -> db.noSuch(seq));
                if (r.state() == RemnantState.USED) {
                    throw new RemnantConflictException(r.id() + " is already used; it cannot be planned again");
                }
                if (!r.isFreeAt(now) && !planId.equals(r.reservedBy())) {
                    throw new RemnantConflictException(r.id() + " is reserved by plan " + r.reservedBy() + " until "
                            + r.reservedUntil() + "; wait for that plan or choose another remnant");
                }
                db.update("UPDATE remnant SET state = 'reserved', reserved_by = ?, reserved_until = ? WHERE seq = ?",
                        List.of(planId, until, seq));
            }
            return reservedForIn(planId);
        });
    }

    List<Remnant> reservedFor(String planId) {
        RackDb.checkPlanId(planId);
        return db.read(() -> reservedForIn(planId));
    }

    private List<Remnant> reservedForIn(String planId) throws java.sql.SQLException {
        return db.query("SELECT " + RackDb.COLUMNS + " FROM remnant WHERE state = 'reserved' AND reserved_by = ?"
                + " ORDER BY seq", List.of(planId));
    }

    int release(String planId) {
        RackDb.checkPlanId(planId);
        return db.transaction(() -> releaseAllBut(planId, Set.of()));
    }

    /** Returns the remnants reserved for {@code planId}, except {@code keep}, to {@code available}; returns how many. */
    int releaseAllBut(String planId, Set<Long> keep) throws java.sql.SQLException {
        List<Object> args = new ArrayList<>();
        args.add(planId);
        StringBuilder marks = new StringBuilder();
        for (long seq : keep) {
            marks.append(marks.length() == 0 ? "" : ", ").append('?');
            args.add(seq);
        }
        return db.update("UPDATE remnant SET state = 'available', reserved_by = NULL, reserved_until = NULL"
                + " WHERE state = 'reserved' AND reserved_by = ?"
                + (keep.isEmpty() ? "" : " AND seq NOT IN (" + marks + ")"), args);
    }

    /** Marks {@code seqs} used; each must be reserved by {@code planId} (an expired lease nobody took counts). */
    void markUsed(String planId, Set<Long> seqs) throws java.sql.SQLException {
        for (long seq : seqs) {
            Remnant r = db.get(seq).orElseThrow(() -> db.noSuch(seq));
            if (r.state() == RemnantState.USED) {
                throw new RemnantConflictException(r.id() + " is already used; plan " + planId
                        + " cannot cut it again");
            }
            if (r.state() != RemnantState.RESERVED || !planId.equals(r.reservedBy())) {
                String now = r.state() == RemnantState.AVAILABLE ? "it is available"
                        : "it is reserved by plan " + r.reservedBy() + " until " + r.reservedUntil();
                throw new RemnantConflictException(r.id() + " is not reserved by plan " + planId + " (" + now
                        + "); reserve it before committing");
            }
            int n = db.update("UPDATE remnant SET state = 'used', reserved_by = NULL, reserved_until = NULL"
                    + " WHERE seq = ? AND state = 'reserved' AND reserved_by = ?", List.of(seq, planId));
            if (n != 1) {
                throw new IllegalStateException("commit: " + r.id() + " changed during the transaction");
            }
            db.faults.reached("commit:used " + r.id());
        }
    }

    static void checkTtl(Duration ttl) {
        if (ttl == null || ttl.isNegative() || ttl.isZero() || ttl.compareTo(MAX_TTL) > 0) {
            throw new IllegalArgumentException("ttl: " + ttl + " is out of range; must be > 0 and at most " + MAX_TTL);
        }
    }
}
