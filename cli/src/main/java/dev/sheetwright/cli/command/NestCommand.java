package dev.sheetwright.cli.command;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.mixin.InventoryOption;
import dev.sheetwright.cli.mixin.JobFileOption;
import dev.sheetwright.cli.mixin.SearchOptions;
import dev.sheetwright.cli.mixin.SheetSearchOption;
import dev.sheetwright.cli.mixin.ShopOption;
import dev.sheetwright.cli.output.JsonFiles;
import dev.sheetwright.cli.output.NestJson;
import dev.sheetwright.cli.output.OutputFolder;
import dev.sheetwright.cli.output.TextFiles;
import dev.sheetwright.cli.output.PatternsJson;
import dev.sheetwright.cli.output.QuoteText;
import dev.sheetwright.cli.output.SheetDrawings;
import dev.sheetwright.cli.rack.MinOffcut;
import dev.sheetwright.cli.rack.PlanReport;
import dev.sheetwright.cli.rack.RackCommit;
import dev.sheetwright.cli.rack.RackPlan;
import dev.sheetwright.cli.rack.RackPlanning;
import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.cli.run.CutPlans;
import dev.sheetwright.cli.run.JobNest;
import dev.sheetwright.cli.run.Progress;
import dev.sheetwright.cli.run.QuoteFiles;
import dev.sheetwright.cli.run.SheetPrograms;
import dev.sheetwright.core.cutpath.MachineSettings;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.quote.Quote;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.DxfWriter;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.ProgressListener;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code sheetwright nest JOB.yaml -o OUT}: every piece of the job nested onto stock, one cut program per sheet. */
@Command(name = "nest", mixinStandardHelpOptions = true,
        description = "Develop and nest every piece of a job onto its stock; write one DXF cut program and SVG"
                + " preview per sheet, nest.json and patterns.json. Exit 3 when some pieces could not be placed.")
public final class NestCommand implements Callable<Integer> {

    /** Search seconds without {@code --time}. */
    static final double DEFAULT_SECONDS = 10;

    @Spec
    CommandSpec spec;

    @Mixin
    JobFileOption jobFile;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "OUT", description = "output folder")
    Path out;

    @Mixin
    SearchOptions search;

    @Mixin
    SheetSearchOption sheetSearch;

    @Option(names = "--use-remnants",
            description = "cut from the rack first: every available remnant of the job's material and gauge (or"
                    + " thickness) in the inventory is offered before sheets, reserved for this plan while nesting")
    boolean useRemnants;

    @Option(names = "--remnant", paramLabel = "ID",
            description = "offer this rack remnant (e.g. R-0042) before sheets; repeat for more; it must be the"
                    + " job's material")
    List<String> remnantIds = new ArrayList<>();

    @Mixin
    InventoryOption inventory;

    @Option(names = "--reserve-minutes", defaultValue = "15", paramLabel = "MIN",
            description = "how long the plan holds its remnants before another planner may take them"
                    + " (default ${DEFAULT-VALUE}; commit within that time)")
    long reserveMinutes;

    @Option(names = "--min-offcut-width", paramLabel = "L",
            description = "narrowest offcut recorded on the rack, job units (default 12 in or 300 mm)")
    Double minOffcutWidth;

    @Option(names = "--min-offcut-area", paramLabel = "A",
            description = "smallest offcut area recorded on the rack, square job units (default 144 in2 or"
                    + " 100000 mm2)")
    Double minOffcutArea;

    @Option(names = "--commit",
            description = "commit the plan right after nesting: mark the remnants cut as used and record the new"
                    + " offcuts (else run 'sheetwright commit OUT' later)")
    boolean commitNow;

    @Option(names = "--location", paramLabel = "TEXT",
            description = "with --commit: where the new offcuts are put on the rack")
    String location;
    @Mixin
    dev.sheetwright.cli.mixin.ShopOption shop;

    @Option(names = "--gcode",
            description = "also write sheets/sheet-NNN.nc: one RS-274 program per sheet (dialect from the shop"
                    + " file's machine: section)")
    boolean gcode;

    @Option(names = "--show-path",
            description = "draw the cut order (numbers at the pierces) and the rapids (dashed) on the SVG previews"
                    + " and the report's sheet pictures")
    boolean showPath;

    @Override
    public Integer call() {
        double seconds = search.seconds(DEFAULT_SECONDS);
        if (reserveMinutes < 1 || reserveMinutes > 24 * 60) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                    "--reserve-minutes must be from 1 to 1440, got " + reserveMinutes);
        }
        if (location != null && !commitNow) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(), "--location is used only with"
                    + " --commit; give --commit too, or give the location later: sheetwright commit OUT --location "
                    + location);
        }
        OutputFolder.check(out); // before the long nest, not after it
        JobReader.JobFile file = JobReader.readFull(jobFile.path());
        Job job = file.job();
        MachineSettings machine = shop.machine();
        MinOffcut defaults = MinOffcut.defaults(job.unit());
        MinOffcut min = new MinOffcut(minOffcutWidth != null ? minOffcutWidth : defaults.width(),
                minOffcutArea != null ? minOffcutArea : defaults.area());
        boolean planned = useRemnants || !remnantIds.isEmpty() || commitNow || inventory.given();
        PrintWriter err = spec.commandLine().getErr();
        search.nestOptions(DEFAULT_SECONDS, ProgressListener.NONE); // bad search options refused before the rack is touched
        long start = System.nanoTime();
        try (RackPlanning rack = planned
                ? RackPlanning.open(inventory.location(), job, Duration.ofMinutes(reserveMinutes)) : null) {
            List<StockRemnant> fromRack = rack == null ? List.of() : rack.reserve(useRemnants, remnantIds);
            JobNest nest;
            try (Progress progress = Progress.forTerminal(err, seconds, Progress.coilOnly(job))) {
                NestOptions options = search.nestOptions(DEFAULT_SECONDS, progress);
                nest = JobNest.run(job, jobFile.label(), options, fromRack, sheetSearch.on(options));
            }
            CutPlans cuts = CutPlans.of(nest, file.cutPath());
            RackPlan plan = rack == null ? null : rack.settle(nest, min);
            Quote quote;
            try {
                quote = write(file, nest, cuts, plan, machine);
            } catch (RuntimeException e) {
                if (rack != null) {
                    rack.abandon();
                }
                throw e;
            }
            print(nest, cuts, NestJson.document(nest, plan), (System.nanoTime() - start) / 1e9);
            QuoteText.summary(quote).forEach(spec.commandLine().getOut()::println);
            if (plan != null) {
                PlanReport.planned(spec.commandLine().getOut(), plan, out);
                if (commitNow) {
                    PlanReport.committed(spec.commandLine().getOut(), plan,
                            RackCommit.commit(rack.store(), plan, location == null ? "" : location));
                }
            }
            return nest.result().unplaced().isEmpty() ? ExitCodes.OK : ExitCodes.UNPLACED;
        }
    }

    private Quote write(JobReader.JobFile file, JobNest nest, CutPlans cuts, RackPlan plan, MachineSettings machine) {
        Job job = file.job();
        Map<String, Object> doc = NestJson.document(nest, plan);
        SheetPrograms programs = gcode ? SheetPrograms.of(nest, cuts, shop.settings(), machine) : null;
        try (OutputFolder folder = OutputFolder.stage(out)) {
            for (SheetLayout s : nest.result().sheets()) {
                RackPlan.PlannedOffcut id = plan == null ? null : plan.offcutOfSheet(s.index() + 1);
                String offcutId = id == null ? null : id.id();
                double chord = job.tolerance().chord();
                Drawing d = SheetDrawings.drawing(s, nest.plan(), job.name(), job.unit(), nest.offcut(s), offcutId,
                        cuts.of(s), chord, false);
                DxfWriter.write(d, folder.file(NestJson.sheetFile(s) + ".dxf"));
                Drawing preview = showPath ? SheetDrawings.drawing(s, nest.plan(), job.name(), job.unit(),
                        nest.offcut(s), offcutId, cuts.of(s), chord, true) : d;
                SheetDrawings.svgWriter().write(preview, folder.file(NestJson.sheetFile(s) + ".svg"));
                if (programs != null) {
                    TextFiles.write(programs.lines(s), folder.file(NestJson.sheetFile(s) + ".nc"));
                }
            }
            JsonFiles.write(doc, folder.file("nest.json"));
            JsonFiles.write(PatternsJson.document(job, nest.developments()), folder.file("patterns.json"));
            Quote quote = QuoteFiles.write(folder, nest, cuts, file.quote(), shop.settings(), showPath);
            folder.commit();
            return quote;
        }
    }

    @SuppressWarnings("unchecked")
    private void print(JobNest nest, CutPlans cuts, Map<String, Object> doc, double secs) {
        PrintWriter w = spec.commandLine().getOut();
        Map<String, Object> totals = (Map<String, Object>) doc.get("totals");
        String u = nest.job().unit().symbol();
        w.printf(Locale.ROOT, "%s: %d sheets, utilization %.1f %% (parts %.1f %s2 on %.1f %s2 of stock), %.1f s%n",
                nest.job().name(), nest.result().sheets().size(), 100 * (double) totals.get("utilization"),
                (double) totals.get("partArea"), u, (double) totals.get("stockArea"), u, secs);
        for (SheetLayout s : nest.result().sheets()) {
            w.printf(Locale.ROOT, "  sheet %3d  %-14s %3d parts  %5.1f %%%s%n", s.index() + 1, s.stock().label(),
                    s.parts().size(), 100 * s.utilization(),
                    nest.offcut(s) == null ? "" : String.format(Locale.ROOT, "  offcut %.2f x %.2f %s",
                            nest.offcut(s).width(), nest.offcut(s).height(), u));
        }
        for (Unplaced up : nest.result().unplaced()) {
            w.printf(Locale.ROOT, "  NOT PLACED %s %s #%d: %s%n", up.fitting(), up.piece(), up.copy() + 1, up.reason());
        }
        for (SheetLayout s : nest.result().sheets()) {
            for (String note : cuts.of(s).notes()) {
                w.printf(Locale.ROOT, "  sheet %3d  lead: %s%n", s.index() + 1, note);
            }
        }
        w.printf(Locale.ROOT, "Wrote %s (sheets/*.dxf, sheets/*.svg%s, nest.json, patterns.json)%n%s%n", out,
                gcode ? ", sheets/*.nc" : "", Cautions.SHORT);
        w.flush();
    }
}
