package dev.sheetwright.cli.command;

import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.mixin.InventoryOption;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * What every {@code remnant} subcommand shares: the help options and exit-code list (picocli merges this
 * {@code @Command} with the subclass's), {@code --inventory}, and the one way a body runs: exceptions become exit
 * codes through {@link ExitCodes#run}, so the commands behave the same when run alone (as their tests do).
 */
@Command(mixinStandardHelpOptions = true, exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public abstract class RemnantSubcommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    InventoryOption inventory;

    @Override
    public final Integer call() {
        return ExitCodes.run(spec, () -> {
            run(spec.commandLine().getOut());
            return ExitCodes.OK;
        });
    }

    /** The command's work, writing what it reports to {@code out}; it returns normally only when it succeeded. */
    abstract void run(PrintWriter out) throws Exception;
}
