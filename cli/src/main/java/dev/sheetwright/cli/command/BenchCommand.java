package dev.sheetwright.cli.command;

import picocli.CommandLine.Command;
import picocli.CommandLine;

/** Groups the benchmark subcommands; prints usage when run alone. */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Measure the engine on published benchmark instances.",
        subcommands = {BenchStripCommand.class, CommandLine.HelpCommand.class})
public final class BenchCommand implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
