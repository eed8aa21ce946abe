package dev.sheetwright.cli.mixin;

import picocli.CommandLine.Option;

/**
 * {@code --sheet-search} / {@code --no-sheet-search} for the commands that nest a job on sheets: after the first
 * layout, try to empty sheets by overlap minimisation in the rest of the time (see the nest module's
 * {@code overlap.SheetSearch}). Off by default: measured no better than the first engine alone on the fixture jobs
 * (README, nesting benchmarks), and worse on a 2 s quote.
 */
public final class SheetSearchOption {
    @Option(names = "--sheet-search", negatable = true, defaultValue = "false", fallbackValue = "true",
            description = "give the first layout half the time, then try to empty sheets by moving their parts onto"
                    + " the others with overlap allowed and separating them (default: off)")
    boolean on;

    public boolean on() {
        return on;
    }
}
