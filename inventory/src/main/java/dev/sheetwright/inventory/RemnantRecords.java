package dev.sheetwright.inventory;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/** The remnant records themselves: add, read, list and remove. Package-private; reached through {@link RemnantStore}. */
final class RemnantRecords {
    private final RackDb db;

    RemnantRecords(RackDb db) {
        this.db = db;
    }

    Remnant add(NewRemnant remnant) {
        RackDb.requireNonNull("remnant", remnant);
        return db.transaction(() -> db.get(db.insert(remnant, null, db.now(), RemnantState.AVAILABLE)).orElseThrow());
    }

    Optional<Remnant> get(String id) {
        long seq = RemnantId.parse(id);
        return db.read(() -> db.get(seq));
    }

    List<Remnant> list(RemnantFilter filter, RemnantSort sort) {
        RackDb.requireNonNull("filter", filter);
        RackDb.requireNonNull("sort", sort);
        return db.read(() -> {
            List<Object> args = new ArrayList<>();
            String where = RackDb.where(filter, args, !filter.includeUsed());
            return db.query("SELECT " + RackDb.COLUMNS + " FROM remnant WHERE " + where + " ORDER BY "
                    + sort.orderBy(), args);
        });
    }

    void removeAll(Collection<String> ids) {
        RackDb.requireNonNull("ids", ids);
        Set<Long> seqs = RackDb.seqsOf(ids);
        db.transaction(() -> {
            var now = db.now();
            for (long seq : seqs) {
                Remnant r = db.get(seq).orElseThrow(() -> db.noSuch(seq));
                if (r.state() == RemnantState.RESERVED && !r.isFreeAt(now)) {
                    throw new RemnantConflictException(r.id() + " is reserved by plan " + r.reservedBy()
                            + " until " + r.reservedUntil() + "; release that plan first ('sheetwright release OUT')");
                }
                db.update("DELETE FROM remnant WHERE seq = ?", List.of(seq));
            }
            return null;
        });
    }
}
