package dev.sheetwright.cli.mixin;

import dev.sheetwright.inventory.RackLocation;
import dev.sheetwright.inventory.RemnantStore;
import java.util.function.Consumer;
import java.util.function.Function;
import picocli.CommandLine.Option;

/**
 * {@code --inventory FILE|URL}: the remnant rack to use, a SQLite file or a {@code postgresql://} server database;
 * without it {@code SHEETWRIGHT_INVENTORY}, else {@code ~/.sheetwright/remnants.db}. Only the commands that add
 * remnants ({@code remnant add}, {@code remnant import}) may start a new rack; the others refuse a missing one.
 */
public final class InventoryOption {
    @Option(names = "--inventory", paramLabel = "FILE|URL",
            description = "Remnant rack: a SQLite file or postgresql://USER@HOST[:PORT]/DATABASE (password from"
                    + " PGPASSWORD or ~/.pgpass); default: $SHEETWRIGHT_INVENTORY, else ~/.sheetwright/remnants.db.")
    private String value;

    /** Where the rack is: {@code --inventory}, else {@code SHEETWRIGHT_INVENTORY}, else the default file. */
    public RackLocation location() {
        return locate(value);
    }

    /** {@code value} when given, else {@code SHEETWRIGHT_INVENTORY}, else the default file. */
    public static RackLocation locate(String value) {
        if (value != null) {
            return RackLocation.parse(value);
        }
        String env = System.getenv(RemnantStore.ENVIRONMENT_VARIABLE);
        if (env != null && !env.isBlank()) {
            return RackLocation.parse(env);
        }
        return new RackLocation.File(RemnantStore.defaultPath());
    }

    /** True when {@code --inventory} was given. */
    public boolean given() {
        return value != null;
    }

    /** Opens the rack, which must exist. */
    public RemnantStore open() {
        return RemnantStore.open(location(), false);
    }

    /** Opens the rack, starting a new one when there is none yet. */
    public RemnantStore openOrCreate() {
        return RemnantStore.open(location(), true);
    }

    /** Opens the existing rack, returns what {@code work} makes of it, and closes it again. */
    public <T> T apply(Function<RemnantStore, T> work) {
        try (RemnantStore store = open()) {
            return work.apply(store);
        }
    }

    /** Opens the existing rack, does {@code work} with it, and closes it again. */
    public void use(Consumer<RemnantStore> work) {
        try (RemnantStore store = open()) {
            work.accept(store);
        }
    }

    /** Opens the rack (starting one if needed), returns what {@code work} makes of it, and closes it again. */
    public <T> T applyCreating(Function<RemnantStore, T> work) {
        try (RemnantStore store = openOrCreate()) {
            return work.apply(store);
        }
    }
}
