package dev.sheetwright.cli;

import dev.sheetwright.cli.mixin.InventoryOption;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code remnant import FILE.csv}: adds the rows of a CSV file, all or none. */
@Command(name = "import", mixinStandardHelpOptions = true,
        description = {"Add offcuts from a CSV file (sizes in mm): all rows, or none if one is bad.",
                "Columns: id, material, gauge, thickness_mm, width_mm, height_mm, outline, location, added,"
                        + " source, state; only material, gauge or thickness_mm, and a size are required."},
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public final class RemnantImportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    InventoryOption inventory;

    @Parameters(paramLabel = "FILE.csv", description = "The CSV file, with a header row.")
    Path csv;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            List<Remnant> imported;
            try (RemnantStore store = inventory.open()) {
                imported = store.importCsv(csv);
            }
            spec.commandLine().getOut().println("imported " + imported.size() + " remnant(s)"
                    + (imported.isEmpty() ? "" : ": "
                    + imported.stream().map(Remnant::id).collect(Collectors.joining(" "))));
            return ExitCodes.OK;
        });
    }
}
