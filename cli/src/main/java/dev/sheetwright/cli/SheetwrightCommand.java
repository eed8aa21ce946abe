package dev.sheetwright.cli;

import dev.sheetwright.cli.command.BenchCommand;
import dev.sheetwright.cli.command.CommitCommand;
import dev.sheetwright.cli.command.DevelopCommand;
import dev.sheetwright.cli.command.NestCommand;
import dev.sheetwright.cli.command.QuoteCommand;
import dev.sheetwright.cli.command.ReleaseCommand;
import dev.sheetwright.cli.command.RemnantCommand;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;
import picocli.CommandLine;

/** The root command: groups the subcommands and prints usage when run alone. */
@Command(name = "sheetwright", mixinStandardHelpOptions = true, versionProvider = ManifestVersion.class,
        description = "Round duct fittings from shop ticket to flat patterns, sheet cut programs and a material quote.",
        subcommands = {DevelopCommand.class, NestCommand.class, QuoteCommand.class, RemnantCommand.class, BenchCommand.class,
            CommitCommand.class, ReleaseCommand.class,
            CommandLine.HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:done", "1:unexpected failure (a bug or an I/O problem)",
            "2:bad input: the message names the file, fitting and field; nothing was written",
            "3:nest finished but some pieces could not be placed (listed with the reason)"})
public final class SheetwrightCommand implements Runnable {

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The configured command line: one exception handler and one exit-code mapper for every command. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new SheetwrightCommand());
        cl.setExecutionExceptionHandler(SheetwrightCommand::handle);
        cl.setExitCodeExceptionMapper(SheetwrightCommand::exitCodeOf);
        return cl;
    }

    static int exitCodeOf(Throwable t) {
        return ExitCodes.of(t);
    }

    private static int handle(Exception e, CommandLine cl, CommandLine.ParseResult parsed) {
        return ExitCodes.report(e, cl.getErr());
    }
}
