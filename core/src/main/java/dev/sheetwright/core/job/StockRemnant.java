package dev.sheetwright.core.job;

import dev.sheetwright.core.geom.Point2;
import java.util.List;

/** A leftover piece of sheet listed in the job: its id and outline (corners in order, job units). */
public record StockRemnant(String id, List<Point2> outline, double cost) {

    public StockRemnant {
        outline = List.copyOf(outline);
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("remnant id must not be blank");
        }
        if (outline.size() < 3) {
            throw new IllegalArgumentException("remnant " + id + " needs at least 3 corners, got " + outline.size());
        }
        if (!(cost >= 0)) {
            throw new IllegalArgumentException("remnant cost must not be negative, got " + cost);
        }
    }

    public static StockRemnant rectangle(String id, double width, double length, double cost) {
        return new StockRemnant(id, List.of(new Point2(0, 0), new Point2(width, 0), new Point2(width, length),
                new Point2(0, length)), cost);
    }
}
