package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Tolerance;
import java.util.List;

/**
 * The room the job's stock leaves for one blank: each listed sheet, remnant (its bounding box) or coil less the
 * edge margin on both sides. A development that may choose its make-up (a rectangular duct's
 * {@code construction: auto}) asks whether a blank fits any of them. {@link #ANY} (no stock known) fits everything.
 *
 * @param spaces usable width x length of each stock; a coil's length is infinite
 * @param turn whether the nesting may turn a blank a quarter turn
 */
public record StockRoom(List<Space> spaces, boolean turn) {

    /** No stock known: every blank fits. */
    public static final StockRoom ANY = new StockRoom(List.of(), true);

    /** One stock's usable rectangle. */
    public record Space(String name, double width, double length) {
    }

    public StockRoom {
        spaces = List.copyOf(spaces);
    }

    /** True when a blank of {@code width x length} fits at least one space (either way round when turning is allowed). */
    public boolean fits(double width, double length, Tolerance tol) {
        if (spaces.isEmpty()) {
            return true;
        }
        for (Space s : spaces) {
            if (width <= s.width() + tol.linear() && length <= s.length() + tol.linear()) {
                return true;
            }
            if (turn && length <= s.width() + tol.linear() && width <= s.length() + tol.linear()) {
                return true;
            }
        }
        return false;
    }
}
