package dev.sheetwright.cli;

import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.cli.output.NestJson;
import dev.sheetwright.cli.output.OutputFolder;
import dev.sheetwright.cli.output.PatternDrawings;
import dev.sheetwright.cli.output.PatternsJson;
import dev.sheetwright.cli.output.SheetDrawings;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.DxfWriter;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheetwright nest JOB.yaml -o OUT}: every piece of the job nested onto stock, one cut program per sheet. */
@Command(name = "nest", mixinStandardHelpOptions = true,
        description = "Develop and nest every piece of a job onto its stock; write one DXF cut program and SVG"
                + " preview per sheet, nest.json and patterns.json. Exit 3 when some pieces could not be placed.")
public final class NestCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "JOB.yaml", description = "the job file")
    Path jobFile;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "OUT", description = "output folder")
    Path out;

    @Option(names = "--time", defaultValue = "10", paramLabel = "S",
            description = "seconds the improvement search may run (default ${DEFAULT-VALUE})")
    double seconds;

    @Option(names = "--iterations", paramLabel = "N",
            description = "run exactly N search steps instead of a time limit (reproducible nests)")
    Long iterations;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "N", description = "search seed (default ${DEFAULT-VALUE})")
    long seed;

    @Mixin
    dev.sheetwright.cli.mixin.ShopOption shop;

    @Override
    public Integer call() {
        if (!(seconds >= 0) || seconds > 86400) {
            throw new picocli.CommandLine.ParameterException(spec.commandLine(),
                    "--time must be from 0 to 86400 seconds, got " + seconds);
        }
        Job job = JobReader.read(jobFile);
        PrintWriter err = spec.commandLine().getErr();
        Progress progress = Progress.forTerminal(err, seconds);
        NestOptions options = iterations != null
                ? new NestOptions(Duration.ofDays(1), java.util.OptionalLong.of(iterations), seed, 2, progress)
                : new NestOptions(Duration.ofMillis((long) (seconds * 1000)), java.util.OptionalLong.empty(), seed, 2,
                        progress);
        long start = System.nanoTime();
        JobNest nest = JobNest.run(job, jobFile.toString(), options);
        progress.done();
        Map<String, Object> doc = NestJson.document(nest);
        dev.sheetwright.core.quote.Quote quote;
        try (OutputFolder folder = OutputFolder.stage(out)) {
            for (SheetLayout s : nest.result().sheets()) {
                Drawing d = SheetDrawings.drawing(s, nest.plan(), job.name(), job.unit());
                DxfWriter.write(d, folder.file(NestJson.sheetFile(s) + ".dxf"));
                PatternDrawings.svgWriter(true).write(d, folder.file(NestJson.sheetFile(s) + ".svg"));
            }
            PatternsJson.write(doc, folder.file("nest.json"));
            PatternsJson.write(PatternsJson.document(job, nest.developments()), folder.file("patterns.json"));
            quote = QuoteFiles.write(folder, nest, jobFile, shop.settings());
            folder.commit();
        }
        print(nest, doc, (System.nanoTime() - start) / 1e9);
        dev.sheetwright.cli.output.QuoteText.summary(quote).forEach(spec.commandLine().getOut()::println);
        return nest.result().unplaced().isEmpty() ? ExitCodes.OK : ExitCodes.UNPLACED;
    }

    @SuppressWarnings("unchecked")
    private void print(JobNest nest, Map<String, Object> doc, double secs) {
        PrintWriter w = spec.commandLine().getOut();
        Map<String, Object> totals = (Map<String, Object>) doc.get("totals");
        String u = nest.job().unit().symbol();
        w.printf(Locale.ROOT, "%s: %d sheets, utilization %.1f %% (parts %.1f %s2 on %.1f %s2 of stock), %.1f s%n",
                nest.job().name(), nest.result().sheets().size(), 100 * (double) totals.get("utilization"),
                (double) totals.get("partArea"), u, (double) totals.get("stockArea"), u, secs);
        for (SheetLayout s : nest.result().sheets()) {
            w.printf(Locale.ROOT, "  sheet %3d  %-14s %3d parts  %5.1f %%%s%n", s.index() + 1, s.stock().label(),
                    s.parts().size(), 100 * s.utilization(),
                    s.offcut() == null ? "" : String.format(Locale.ROOT, "  offcut %.2f x %.2f %s",
                            s.offcut().width(), s.offcut().height(), u));
        }
        for (Unplaced up : nest.result().unplaced()) {
            w.printf(Locale.ROOT, "  NOT PLACED %s %s #%d: %s%n", up.fitting(), up.piece(), up.copy(), up.reason());
        }
        w.printf(Locale.ROOT, "Wrote %s (sheets/*.dxf, sheets/*.svg, nest.json, patterns.json)%n%s%n", out,
                Cautions.SHORT);
        w.flush();
    }
}
