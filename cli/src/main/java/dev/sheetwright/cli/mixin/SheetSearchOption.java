package dev.sheetwright.cli.mixin;

import picocli.CommandLine.Option;

/**
 * {@code --sheet-search} / {@code --no-sheet-search} for the commands that nest a job on sheets: after the first
 * layout, try to empty sheets by overlap minimisation in the rest of the time (see the nest module's
 * {@code overlap.SheetSearch}).
 */
public final class SheetSearchOption {
    @Option(names = "--sheet-search", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "after the first layout, try to empty sheets by moving their parts onto the others with"
                    + " overlap allowed, then separating (default: on; --no-sheet-search keeps the first engine only)")
    boolean on = true;

    public boolean on() {
        return on;
    }
}
