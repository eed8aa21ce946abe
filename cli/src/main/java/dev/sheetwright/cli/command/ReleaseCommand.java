package dev.sheetwright.cli.command;

import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.rack.PlanReport;
import dev.sheetwright.cli.rack.RackPlan;
import dev.sheetwright.inventory.RemnantStore;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheetwright release OUT}: the nest in OUT will not be cut; hand its remnants back to the rack. */
@Command(name = "release", mixinStandardHelpOptions = true,
        description = "Release a planned nest that will not be cut: the remnants it holds go back to the rack, and"
                + " the plan can no longer be committed. The offcut ids marked on its sheets are never issued again.",
        exitCodeListHeading = "Exit codes:%n",
        exitCodeList = {ExitCodes.LIST_OK, ExitCodes.LIST_FAILURE,
            "2:bad input: no plan in OUT, no such rack, or the plan was committed (nothing changed)"})
public final class ReleaseCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OUT", description = "the output folder of the nest")
    Path out;

    @Option(names = "--inventory", paramLabel = "FILE|URL",
            description = "the rack the plan holds remnants in (default: the one the plan was made against)")
    String inventory;

    @Override
    public Integer call() {
        return ExitCodes.run(spec, () -> {
            RackPlan plan = RackPlan.read(out);
            try (RemnantStore store = plan.openRack(inventory)) {
                int back = store.releasePlan(plan.id());
                PlanReport.released(spec.commandLine().getOut(), plan, back);
            }
            return ExitCodes.OK;
        });
    }
}
