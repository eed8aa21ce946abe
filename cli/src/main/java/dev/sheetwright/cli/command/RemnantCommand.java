package dev.sheetwright.cli.command;

import dev.sheetwright.cli.ExitCodes;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.HelpCommand;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code remnant}: groups the commands that keep the rack of offcuts. */
@Command(name = "remnant", mixinStandardHelpOptions = true,
        description = "Keep the rack of offcuts (remnants) that jobs are cut from before a new sheet is opened.",
        subcommands = {RemnantAddCommand.class, RemnantListCommand.class, RemnantRemoveCommand.class,
                RemnantImportCommand.class, RemnantExportCommand.class, HelpCommand.class},
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public final class RemnantCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "remnant: missing command; use add, list, remove, import"
                + " or export");
    }
}
