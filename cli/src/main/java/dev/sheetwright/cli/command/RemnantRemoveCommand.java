package dev.sheetwright.cli.command;

import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code remnant remove ID...}: takes offcuts off the rack (all given, or none). */
@Command(name = "remove",
        description = "Remove offcuts from the inventory: all the given ids, or none if one cannot be removed.")
public final class RemnantRemoveCommand extends RemnantSubcommand {
    @Parameters(arity = "1..*", paramLabel = "ID", description = "Remnant ids, e.g. R-0042.")
    List<String> ids;

    @Override
    void run(PrintWriter out) {
        inventory.use(store -> store.removeAll(ids));
        out.println("removed " + String.join(" ", ids));
    }
}
