package dev.sheetwright.inventory;

import java.time.Instant;

/**
 * A plan as the inventory records it.
 *
 * @param id        the plan id
 * @param job       the job it nests
 * @param made      when it was settled
 * @param committed when it was committed, or null while it is only a plan
 */
public record PlanRecord(String id, String job, Instant made, Instant committed) {
}
