package dev.sheetwright.cli.command;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.cli.ExitCodes;
import dev.sheetwright.cli.mixin.JobFileOption;
import dev.sheetwright.cli.output.JsonFiles;
import dev.sheetwright.cli.output.LayoutText;
import dev.sheetwright.cli.output.OutputFolder;
import dev.sheetwright.cli.output.PatternDrawings;
import dev.sheetwright.cli.output.PatternsJson;
import dev.sheetwright.cli.run.JobDevelopment;
import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.develop.LayoutTable;
import dev.sheetwright.core.develop.LayoutValue;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.DxfWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code sheetwright develop JOB.yaml -o OUT}: flat patterns of every fitting, with hand-layout dimensions. */
@Command(name = "develop", mixinStandardHelpOptions = true,
        description = "Develop every fitting of a job into exact flat patterns: one DXF and SVG per distinct piece,"
                + " patterns.json, and the layout dimensions printed for hand layout.")
public final class DevelopCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    JobFileOption jobFile;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "OUT", description = "output folder")
    Path out;

    @Option(names = "--fraction", defaultValue = "16", paramLabel = "N",
            description = "inch fractions to the nearest 1/N (power of two; default ${DEFAULT-VALUE})")
    int fraction;

    @Override
    public Integer call() {
        FractionFormat fractions = new FractionFormat(fraction);
        OutputFolder.check(out);
        Job job = jobFile.read();
        List<Development> developments = JobDevelopment.developAll(job, jobFile.label());
        try (OutputFolder folder = OutputFolder.stage(out)) {
            for (Development d : developments) {
                for (DevelopedPiece piece : d.pieces()) {
                    Pattern p = piece.pattern().atOrigin();
                    Drawing drawing = Drawing.of(job.unit().symbol(), PatternDrawings.LAYERS,
                            PatternDrawings.shapes(p, label(job, p, d.fitting().qty()), job.unit()));
                    String name = PatternsJson.partFile(p);
                    DxfWriter.write(drawing, folder.file(name + ".dxf"));
                    PatternDrawings.svgWriter(false).write(drawing, folder.file(name + ".svg"));
                }
            }
            JsonFiles.write(PatternsJson.document(job, developments), folder.file("patterns.json"));
            folder.commit();
        }
        print(job, developments, new LayoutText(job.unit(), fractions));
        return ExitCodes.OK;
    }

    static List<String> label(Job job, Pattern p, int qty) {
        return List.of(job.name() + "  " + p.fitting() + "  " + p.piece(),
                (p.count() * qty) + " off  " + job.material().describe());
    }

    private void print(Job job, List<Development> developments, LayoutText text) {
        PrintWriter w = spec.commandLine().getOut();
        w.printf(Locale.ROOT, "%s: %d fittings, %s, %s dimensions, developed on the mean line (t = %s)%n",
                job.name(), developments.size(), job.material().describe(), job.dimensions().word(),
                text.thickness(job.thickness()));
        for (Development d : developments) {
            for (DevelopedPiece piece : d.pieces()) {
                Pattern p = piece.pattern();
                w.printf(Locale.ROOT, "%n%s %s  (%s, %d per fitting x qty %d)%n", p.fitting(), p.piece(),
                        d.fitting().type(), p.count(), d.fitting().qty());
                for (LayoutValue v : piece.layout().values()) {
                    w.printf(Locale.ROOT, "  %-40s %s%n", v.label(), text.format(v));
                }
                w.printf(Locale.ROOT, "  %-40s %s x %s%n", "blank size", text.length(p.bounds().width()),
                        text.length(p.bounds().height()));
                w.printf(Locale.ROOT, "  %-40s %s%n", "cut length", text.length(p.cutLength()));
                for (LayoutTable t : piece.layout().tables()) {
                    w.printf(Locale.ROOT, "  %s%n    ", t.label());
                    for (String c : t.columns()) {
                        w.printf(Locale.ROOT, "%12s", c);
                    }
                    w.println();
                    for (List<Double> row : t.rows()) {
                        w.print("    ");
                        for (Double cell : row) {
                            w.printf(Locale.ROOT, "%12.4f", cell);
                        }
                        w.println();
                    }
                }
            }
            for (String warning : d.warnings()) {
                w.println("  warning: " + warning);
            }
        }
        w.printf(Locale.ROOT, "%nWrote %s (parts/*.dxf, parts/*.svg, patterns.json)%n%s%n", out, Cautions.SHORT);
        w.flush();
    }
}
