package dev.sheetwright.cli.command;

import dev.sheetwright.inventory.Remnant;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code remnant import FILE.csv}: adds the rows of a CSV file, all or none. */
@Command(name = "import",
        description = {"Add offcuts from a CSV file (sizes in mm): all rows, or none if one is bad.",
                "Columns: id, material, gauge, thickness_mm, width_mm, height_mm, outline, location, added,"
                        + " source, state; only material, gauge or thickness_mm, and a size are required."})
public final class RemnantImportCommand extends RemnantSubcommand {
    @Parameters(paramLabel = "FILE.csv", description = "The CSV file, with a header row.")
    Path csv;

    @Override
    void run(PrintWriter out) {
        List<Remnant> imported = inventory.applyCreating(store -> store.importCsv(csv));
        out.println("imported " + imported.size() + " remnant(s)"
                + (imported.isEmpty() ? "" : ": "
                + imported.stream().map(Remnant::id).collect(Collectors.joining(" "))));
    }
}
