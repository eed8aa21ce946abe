package dev.sheetwright.inventory;

import java.time.Instant;
import java.util.List;

/**
 * What a settled plan holds on the rack (see {@link RemnantStore#hold}).
 *
 * @param planId    the plan
 * @param remnants  the remnants the plan's nest cuts, reserved for it until {@code until}
 * @param offcutIds ids handed out for the offcuts the nest leaves, in the order asked for
 * @param until     when the reservation of {@code remnants} runs out
 */
public record PlanHold(String planId, List<Remnant> remnants, List<String> offcutIds, Instant until) {
    public PlanHold {
        remnants = List.copyOf(remnants);
        offcutIds = List.copyOf(offcutIds);
    }
}
