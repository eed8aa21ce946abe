package dev.sheetwright.inventory;

import java.time.Instant;
import java.util.List;

/**
 * A plan as the inventory records it.
 *
 * @param id           the plan id
 * @param job          the job it nests
 * @param made         when it was settled
 * @param committed    when it was committed, or null
 * @param released     when its reservations were handed back without a commit, or null
 * @param remnantsUsed the remnants its nest cuts, by id; null for plans recorded before the rack kept them
 * @param offcuts      the offcuts it will leave, with their ids; empty for such older plans
 */
public record PlanRecord(String id, String job, Instant made, Instant committed, Instant released,
                         List<String> remnantsUsed, List<PlanOffcut> offcuts) {
    public PlanRecord {
        remnantsUsed = remnantsUsed == null ? null : List.copyOf(remnantsUsed);
        offcuts = List.copyOf(offcuts);
    }

    /** True when the plan was recorded with what it cuts and leaves (every plan since schema version 3). */
    public boolean complete() {
        return remnantsUsed != null;
    }
}
