package dev.sheetwright.cli.mixin;

import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import java.util.function.Function;
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

    /** True when {@code --inventory} was given. */
    public boolean given() {
        return file != null;
    }

    /** Opens the inventory. */
    public RemnantStore open() {
        return RemnantStore.open(file());
    }

    /** Opens the inventory, returns what {@code work} makes of it, and closes it again. */
    public <T> T apply(Function<RemnantStore, T> work) {
        try (RemnantStore store = open()) {
            return work.apply(store);
        }
    }

    /** Opens the inventory, does {@code work} with it, and closes it again. */
    public void use(Consumer<RemnantStore> work) {
        try (RemnantStore store = open()) {
            work.accept(store);
        }
    }

    /**
     * Opens an inventory that must already exist: planning and committing never create one, so a mistyped path
     * is refused instead of silently starting an empty rack.
     *
     * @throws IllegalArgumentException naming the file when there is none
     */
    public static RemnantStore openExisting(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException("--inventory " + file + ": no inventory there; check the path, or"
                    + " start one with 'sheetwright remnant add ... --inventory " + file + "'");
        }
        return RemnantStore.open(file);
    }
}
