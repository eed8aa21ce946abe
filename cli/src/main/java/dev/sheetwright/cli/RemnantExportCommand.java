package dev.sheetwright.cli;

import dev.sheetwright.cli.mixin.InventoryOption;
import dev.sheetwright.inventory.RemnantStore;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code remnant export [FILE.csv]}: writes the whole inventory as CSV. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Write every remnant (used ones included) as CSV, sizes in mm, to FILE or to standard output.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE, ExitCodes.LIST_BAD_INPUT})
public final class RemnantExportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    InventoryOption inventory;

    @Parameters(arity = "0..1", paramLabel = "FILE.csv", description = "Where to write (default: standard output).")
    Path csv;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            StringWriter text = new StringWriter();
            try (RemnantStore store = inventory.open()) {
                store.exportCsv(text);
            }
            if (csv == null) {
                spec.commandLine().getOut().print(text);
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
                spec.commandLine().getOut().println("exported " + rows + " remnant(s) to " + csv);
            }
            return ExitCodes.OK;
        });
    }
}
