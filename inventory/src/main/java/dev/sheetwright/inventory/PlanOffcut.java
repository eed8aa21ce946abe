package dev.sheetwright.inventory;

/**
 * An offcut a plan will leave, as the rack recorded it when the plan was settled: the id handed out for it and
 * what will be recorded under that id at commit (its location is set at commit).
 */
public record PlanOffcut(String id, NewRemnant remnant) {
    public PlanOffcut {
        RemnantId.parse(id);
        if (remnant == null) {
            throw new IllegalArgumentException("remnant: is null");
        }
    }
}
