package dev.sheetwright.cli.mixin;

import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.overlap.SheetSearch;
import picocli.CommandLine.Option;

/**
 * {@code --sheet-search} / {@code --no-sheet-search} for the commands that nest a job on sheets: after the first
 * layout, try to empty sheets by moving their parts onto the others and separating them (see the nest module's
 * {@code overlap.SheetSearch}). Given neither, a timed run of at least {@link SheetSearch#WORTHWHILE} searches
 * sheets and a shorter or counted one does not ({@link SheetSearch#byDefault}).
 */
public final class SheetSearchOption {
    @Option(names = "--sheet-search", negatable = true,
            description = "give the first layout half the time, then try to empty the least filled sheet by moving"
                    + " its parts onto the others, overlap allowed, and separating them (default: on for a --time"
                    + " of 30 s or more)")
    Boolean on;

    /** Whether a run with {@code options} searches sheets: as told, else {@link SheetSearch#byDefault}. */
    public boolean on(NestOptions options) {
        return on != null ? on : SheetSearch.byDefault(options);
    }
}
