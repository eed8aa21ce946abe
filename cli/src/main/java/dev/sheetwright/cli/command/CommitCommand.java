package dev.sheetwright.cli.command;

import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.rack.PlanReport;
import dev.sheetwright.cli.rack.RackCommit;
import dev.sheetwright.cli.rack.RackPlan;
import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheetwright commit OUT}: the nest in OUT was cut; bring the rack's records up to date. */
@Command(name = "commit", mixinStandardHelpOptions = true,
        description = "Commit a planned nest once it is cut: the remnants it used become used and each new offcut"
                + " is recorded under the id marked on its sheet, as the rack recorded it when the plan was made,"
                + " all in one transaction. A plan commits once.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE,
            "2:bad input: no plan in OUT, no such rack, plan already committed or released, nest.json's plan edited,"
                + " or a remnant it cut was taken by another plan after the reservation ran out (nothing changed)"})
public final class CommitCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OUT", description = "the output folder of the nest")
    Path out;

    @Option(names = "--inventory", paramLabel = "FILE|URL",
            description = "the rack to commit to (default: the one the plan was made against)")
    String inventory;

    @Option(names = "--location", paramLabel = "TEXT", defaultValue = "",
            description = "where the new offcuts are put on the rack")
    String location;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            RackPlan plan = RackPlan.read(out);
            try (RemnantStore store = plan.openRack(inventory)) {
                PlanReport.committed(spec.commandLine().getOut(), plan, RackCommit.commit(store, plan, location));
            }
            return ExitCodes.OK;
        });
    }
}
