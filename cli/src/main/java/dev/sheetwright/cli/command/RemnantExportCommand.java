package dev.sheetwright.cli.command;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code remnant export [FILE.csv]}: writes the whole inventory as CSV. */
@Command(name = "export",
        description = "Write every remnant (used ones included) as CSV, sizes in mm, to FILE or to standard output.")
public final class RemnantExportCommand extends RemnantSubcommand {
    @Parameters(arity = "0..1", paramLabel = "FILE.csv", description = "Where to write (default: standard output).")
    Path csv;

    @Override
    void run(PrintWriter out) throws IOException {
        StringWriter text = new StringWriter();
        inventory.use(store -> store.exportCsv(text));
        if (csv == null) {
            out.print(text);
        } else {
            Path parent = csv.toAbsolutePath().getParent();
            Path tmp = Files.createTempFile(parent, ".remnants-", ".csv");
            try {
                Files.writeString(tmp, text.toString(), StandardCharsets.UTF_8);
                Files.move(tmp, csv, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(tmp);
            }
            long rows = text.toString().lines().count() - 1;
            out.println("exported " + rows + " remnant(s) to " + csv);
        }
    }
}
