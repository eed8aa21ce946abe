package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Line;
import java.util.List;

/**
 * Every contour of one sheet in cutting order, with the rapids between them (the first from the machine's home at
 * the sheet origin; the return home is not counted). The quote's cut length, pierce count and rapid length are read
 * from here, so the program and the estimate never disagree.
 *
 * @param rapids {@code rapids.get(i)} ends at the pierce of {@code steps.get(i)}
 * @param notes plain sentences about leads that could not be placed as asked
 */
public record SheetCutPlan(List<CutStep> steps, List<Line> rapids, List<String> notes) {

    public SheetCutPlan {
        steps = List.copyOf(steps);
        rapids = List.copyOf(rapids);
        notes = List.copyOf(notes);
        if (steps.size() != rapids.size()) {
            throw new IllegalArgumentException("one rapid to each contour: " + steps.size() + " contours, "
                    + rapids.size() + " rapids");
        }
    }

    /** One pierce per contour. */
    public int pierces() {
        return steps.size();
    }

    /** Length the torch cuts around the contours (the compensated loops). */
    public double loopLength() {
        return steps.stream().mapToDouble(s -> s.toolpath().perimeter()).sum();
    }

    /** Lead-in and lead-out length together. */
    public double leadLength() {
        return steps.stream().mapToDouble(s -> s.lead().length()).sum();
    }

    public double rapidLength() {
        return rapids.stream().mapToDouble(Line::length).sum();
    }
}
