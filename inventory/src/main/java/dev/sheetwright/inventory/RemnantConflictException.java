package dev.sheetwright.inventory;

/**
 * A change refused because of what another plan (or an earlier commit) did: the remnant is reserved by
 * someone else, or already used. Nothing was changed; the caller may re-plan.
 */
public class RemnantConflictException extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    public RemnantConflictException(String message) {
        super(message);
    }
}
