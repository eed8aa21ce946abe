package dev.sheetwright.cli.run;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.core.cutpath.GcodeProgram;
import dev.sheetwright.core.cutpath.MachineSettings;
import dev.sheetwright.core.cutpath.ProgramHead;
import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CutDataOutOfRange;
import dev.sheetwright.core.cutting.CutRates;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.quote.ShopSettings;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.List;

/**
 * The G-code of each sheet: its cut plan written in the table's dialect, fed at the cut chart's speed for the job's
 * metal (the shop's own chart rows first), dwelling the chart's pierce time unless the machine section sets one.
 */
public final class SheetPrograms {

    private final JobNest nest;
    private final CutPlans plans;
    private final GcodeProgram.Settings settings;

    private SheetPrograms(JobNest nest, CutPlans plans, GcodeProgram.Settings settings) {
        this.nest = nest;
        this.plans = plans;
        this.settings = settings;
    }

    /**
     * Ready to write every sheet's program.
     *
     * @throws IllegalArgumentException when the cut chart has no speed for the job's metal (a feed is never guessed)
     */
    public static SheetPrograms of(JobNest nest, CutPlans plans, ShopSettings shop, MachineSettings machine) {
        Job job = nest.job();
        CutRates rates;
        try {
            rates = CutRates.from(shop.applyTo(CutChart.defaults()), job.cutting().process(), job.material());
        } catch (CutDataOutOfRange e) {
            throw new IllegalArgumentException("--gcode needs a cut speed for " + job.material().describe() + ": "
                    + e.getMessage() + "; add a cut-chart row for this metal to the shop file (--shop)", e);
        }
        double feed = job.unit().fromMm(rates.cutSpeedMmPerMin());
        return new SheetPrograms(nest, plans, new GcodeProgram.Settings(job.unit(), feed, rates.pierceSeconds(),
                plans.settings().kerf(), plans.settings().compensation(), machine));
    }

    /** The program lines of one sheet. */
    public List<String> lines(SheetLayout sheet) {
        Job job = nest.job();
        ProgramHead head = new ProgramHead(job.name(), sheet.index() + 1, nest.result().sheets().size(),
                sheet.stock().label(), job.material().describe(), job.cutting().process().word(), Cautions.ALL);
        return GcodeProgram.lines(plans.of(sheet), CutPlans.labels(sheet), head, settings);
    }
}
