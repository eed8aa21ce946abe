package dev.sheetwright.cli.command;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.mixin.JobFileOption;
import dev.sheetwright.cli.mixin.SearchOptions;
import dev.sheetwright.cli.mixin.SheetSearchOption;
import dev.sheetwright.cli.mixin.ShopOption;
import dev.sheetwright.cli.output.OutputFolder;
import dev.sheetwright.cli.output.QuoteText;
import dev.sheetwright.cli.run.JobNest;
import dev.sheetwright.cli.run.Progress;
import dev.sheetwright.cli.run.QuoteFiles;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.quote.Quote;
import dev.sheetwright.core.quote.ShopSettings;
import dev.sheetwright.nest.model.NestOptions;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code sheetwright quote JOB.yaml}: a quick nest, then the material and cutting quote as a table. */
@Command(name = "quote", mixinStandardHelpOptions = true,
        description = "Nest a job quickly and print its material and cutting quote: stock, weights, cut length,"
                + " pierces, cut time and cost, each rate with its source. With -o, also write quote.json,"
                + " quote.csv, report.html and report.pdf.")
public final class QuoteCommand implements Callable<Integer> {

    /** Search seconds without {@code --time}: a quote is a quick nest. */
    static final double DEFAULT_SECONDS = 2;

    @Spec
    CommandSpec spec;

    @Mixin
    JobFileOption jobFile;

    @Option(names = {"-o", "--out"}, paramLabel = "OUT", description = "also write the quote files and report here")
    Path out;

    @Mixin
    SearchOptions search;

    @Mixin
    SheetSearchOption sheetSearch;

    @Mixin
    ShopOption shop;

    @Override
    public Integer call() {
        double seconds = search.seconds(DEFAULT_SECONDS);
        if (out != null) {
            OutputFolder.check(out); // before the nest, not after it
        }
        Job job = jobFile.read();
        ShopSettings settings = shop.settings();
        PrintWriter err = spec.commandLine().getErr();
        JobNest nest;
        try (Progress progress = Progress.forTerminal(err, seconds, Progress.coilOnly(job))) {
            NestOptions options = search.nestOptions(DEFAULT_SECONDS, progress);
            nest = JobNest.run(job, jobFile.label(), options, List.of(), sheetSearch.on(options));
        }
        Quote q;
        if (out != null) {
            try (OutputFolder folder = OutputFolder.stage(out)) {
                q = QuoteFiles.write(folder, nest, jobFile.path(), settings);
                folder.commit();
            }
        } else {
            q = QuoteFiles.quote(nest, jobFile.path(), settings);
        }
        PrintWriter w = spec.commandLine().getOut();
        QuoteText.table(job.name(), q).forEach(w::println);
        nest.result().unplaced().forEach(up -> w.println("  NOT PLACED " + up.fitting() + " " + up.piece() + " #"
                + (up.copy() + 1) + ": " + up.reason() + " (the quote leaves it out)"));
        if (out != null) {
            w.println("Wrote " + out + " (quote.json, quote.csv, report.html, report.pdf)");
        }
        w.println(Cautions.SHORT);
        w.flush();
        return nest.result().unplaced().isEmpty() ? ExitCodes.OK : ExitCodes.UNPLACED;
    }
}
