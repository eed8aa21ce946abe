package dev.sheetwright.cli.mixin;

import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Path;
import picocli.CommandLine.Option;

/** {@code --inventory FILE}: the remnant database to use (default {@code ~/.sheetwright/remnants.db}). */
public final class InventoryOption {
    @Option(names = "--inventory", paramLabel = "FILE",
            description = "Remnant inventory database (created on first use; default: ~/.sheetwright/remnants.db).")
    private Path file;

    /** The file given, or the default. */
    public Path file() {
        return file != null ? file : RemnantStore.defaultPath();
    }

    /** Opens the inventory. */
    public RemnantStore open() {
        return RemnantStore.open(file());
    }
}
