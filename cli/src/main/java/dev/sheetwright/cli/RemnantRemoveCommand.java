package dev.sheetwright.cli;

import dev.sheetwright.cli.mixin.InventoryOption;
import dev.sheetwright.inventory.RemnantStore;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code remnant remove ID...}: takes offcuts off the rack (all given, or none). */
@Command(name = "remove", mixinStandardHelpOptions = true,
        description = "Remove offcuts from the inventory: all the given ids, or none if one cannot be removed.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public final class RemnantRemoveCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    InventoryOption inventory;

    @Parameters(arity = "1..*", paramLabel = "ID", description = "Remnant ids, e.g. R-0042.")
    List<String> ids;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            try (RemnantStore store = inventory.open()) {
                store.removeAll(ids);
            }
            spec.commandLine().getOut().println("removed " + String.join(" ", ids));
            return ExitCodes.OK;
        });
    }
}
