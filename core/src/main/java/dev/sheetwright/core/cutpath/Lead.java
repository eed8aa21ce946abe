package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Point2;
import java.util.Optional;

/**
 * How the torch enters and leaves one contour: it pierces at {@code pierce} (in scrap), runs the lead-in to the path's
 * start, and after the loop runs the lead-out (if any) before the torch goes off.
 *
 * @param leadIn from the pierce to the start of the path; empty when pierced on the path
 * @param note why the lead is not the asked one (shortened, centre pierce, on the path), else empty
 */
public record Lead(Point2 pierce, Optional<Line> leadIn, Optional<Line> leadOut, Optional<String> note) {

    public Lead {
        if (pierce == null || leadIn == null || leadOut == null || note == null) {
            throw new IllegalArgumentException("lead parts must not be null");
        }
        if (leadIn.isPresent() && !leadIn.get().start().equals(pierce)) {
            throw new IllegalArgumentException("a lead-in starts at the pierce");
        }
    }

    public double length() {
        return leadIn.map(Line::length).orElse(0.0) + leadOut.map(Line::length).orElse(0.0);
    }
}
