package dev.sheetwright.cli.mixin;

import dev.sheetwright.cli.job.ShopReader;
import dev.sheetwright.core.cutpath.MachineSettings;
import dev.sheetwright.core.quote.ShopSettings;
import java.nio.file.Path;
import picocli.CommandLine.Option;

/** {@code --shop FILE}: the shop's own cut chart rows, rapid speed, handling minutes, machine rate and prices. */
public final class ShopOption {
    @Option(names = "--shop", paramLabel = "FILE",
            description = "shop settings (YAML): cut-chart rows, rapid-speed, load-minutes, machine-rate, prices,"
                    + " machine (G-code dialect)")
    private Path file;

    /** The settings from the file, or {@link ShopSettings#NONE} without {@code --shop}. */
    public ShopSettings settings() {
        return file == null ? ShopSettings.NONE : ShopReader.read(file);
    }

    /** The table's G-code dialect from the file's {@code machine:} section, or the built-in one. */
    public MachineSettings machine() {
        return file == null ? MachineSettings.DEFAULT : ShopReader.machine(file);
    }
}
