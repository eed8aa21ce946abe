package dev.sheetwright.nest.model;

import java.util.List;

/** The nest: one layout per piece of stock used, and every copy that could not be placed. */
public record NestResult(List<SheetLayout> sheets, List<Unplaced> unplaced) {
    public NestResult {
        sheets = List.copyOf(Checks.requireNonNull("sheets", sheets));
        unplaced = List.copyOf(Checks.requireNonNull("unplaced", unplaced));
    }

    public int placedCount() {
        return sheets.stream().mapToInt(s -> s.parts().size()).sum();
    }
}
