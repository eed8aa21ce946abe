package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Tolerance;
import java.util.List;

/**
 * The room the job's stock leaves for one blank: each listed sheet, remnant (its bounding box) or coil less the
 * edge margin on both sides. A development that may choose its make-up (a rectangular duct's
 * {@code construction: auto}) asks whether a blank fits any of them. {@link #ANY} (no stock known) fits everything.
 *
 * @param spaces usable rectangle of each stock as the nesting lays it (a sheet's long side along x; a coil runs
 *     along x without end)
 * @param turn whether the nesting may turn a blank a quarter turn
 */
public record StockRoom(List<Space> spaces, boolean turn) {

    /** No stock known: every blank fits. */
    public static final StockRoom ANY = new StockRoom(List.of(), true);

    /** One stock's usable rectangle: {@code x} along the table, {@code y} across. */
    public record Space(String name, double x, double y) {
    }

    public StockRoom {
        spaces = List.copyOf(spaces);
    }

    /**
     * True when a blank {@code width} along x and {@code height} along y fits at least one space (either way round
     * when turning is allowed).
     */
    public boolean fits(double width, double height, Tolerance tol) {
        if (spaces.isEmpty()) {
            return true;
        }
        for (Space s : spaces) {
            if (width <= s.x() + tol.linear() && height <= s.y() + tol.linear()) {
                return true;
            }
            if (turn && height <= s.x() + tol.linear() && width <= s.y() + tol.linear()) {
                return true;
            }
        }
        return false;
    }
}
