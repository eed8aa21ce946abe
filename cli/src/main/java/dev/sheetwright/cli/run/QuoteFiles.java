package dev.sheetwright.cli.run;

import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.cli.output.JsonFiles;
import dev.sheetwright.cli.output.OutputFolder;
import dev.sheetwright.cli.output.PatternsJson;
import dev.sheetwright.cli.output.QuoteCsv;
import dev.sheetwright.cli.output.QuoteJson;
import dev.sheetwright.cli.output.ReportHtml;
import dev.sheetwright.cli.output.ReportPdf;
import dev.sheetwright.cli.output.ShopReport;
import dev.sheetwright.core.quote.Quote;
import dev.sheetwright.core.quote.QuoteTerms;
import dev.sheetwright.core.quote.ShopSettings;
import java.nio.file.Path;

/** Quotes a finished nest and stages {@code quote.json}, {@code quote.csv}, {@code report.html} and {@code report.pdf}. */
public final class QuoteFiles {

    private QuoteFiles() {
    }

    /** The quote of a nest, with the job file's {@code cutting:} leads, {@code quote:} section and the shop settings. */
    public static Quote quote(JobNest nest, Path jobFile, ShopSettings shop) {
        JobReader.JobFile file = JobReader.readFull(jobFile);
        return JobQuote.of(nest, CutPlans.of(nest, file.cutPath()), file.quote(), shop);
    }

    /** Computes the quote and writes the four files into the staging folder. */
    public static Quote write(OutputFolder folder, JobNest nest, Path jobFile, ShopSettings shop) {
        JobReader.JobFile file = JobReader.readFull(jobFile);
        return write(folder, nest, CutPlans.of(nest, file.cutPath()), file.quote(), shop, false);
    }

    /**
     * As {@link #write(OutputFolder, JobNest, Path, ShopSettings)} with the sheets' cut plans already made;
     * {@code showPath} draws the cutting order and rapids on the report's sheet pictures.
     */
    public static Quote write(OutputFolder folder, JobNest nest, CutPlans plans, QuoteTerms terms,
            ShopSettings shop, boolean showPath) {
        Quote q = JobQuote.of(nest, plans, terms, shop);
        JsonFiles.write(QuoteJson.document(nest.job().name(), q), folder.file("quote.json"));
        QuoteCsv.write(q, folder.file("quote.csv"));
        ShopReport report = ShopReport.of(nest, q, showPath ? plans : null);
        ReportHtml.write(report, folder.file("report.html"));
        ReportPdf.write(report, folder.file("report.pdf"));
        return q;
    }
}
