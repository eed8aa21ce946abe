package dev.sheetwright.cli.run;

import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.quote.CutFigures;
import dev.sheetwright.core.quote.Quote;
import dev.sheetwright.core.quote.QuoteRequest;
import dev.sheetwright.core.quote.QuoteTerms;
import dev.sheetwright.core.quote.ShopSettings;
import dev.sheetwright.core.quote.StockUse;
import dev.sheetwright.nest.jobs.JobNestRequest;
import dev.sheetwright.nest.jobs.PatternShapes;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.List;

/** Hands a finished nest to the quote arithmetic in {@code core.quote}: one {@link StockUse} per sheet layout. */
public final class JobQuote {

    private JobQuote() {
    }

    /** The quote of a nest whose cut figures come from {@code plans}, the plans its programs are written from. */
    public static Quote of(JobNest nest, CutPlans plans, QuoteTerms terms, ShopSettings shop) {
        Job job = nest.job();
        List<StockUse> stock = new ArrayList<>();
        for (SheetLayout s : nest.result().sheets()) {
            stock.add(stockUse(s, placedParts(s, nest.plan()), CutFigures.of(plans.of(s))));
        }
        List<String> devWarnings = new ArrayList<>();
        for (Development d : nest.developments()) {
            devWarnings.addAll(d.warnings());
        }
        return Quote.of(new QuoteRequest(job.unit(), job.material(), job.cutting().process(), CutChart.defaults(),
                terms, shop, stock, job.fittings(), devWarnings));
    }

    /** The exact patterns of a layout, moved where they were placed (sheet coordinates). */
    public static List<Pattern> placedParts(SheetLayout s, JobNestRequest plan) {
        List<Pattern> out = new ArrayList<>();
        for (Placement pl : s.parts()) {
            out.add(plan.pattern(pl.fitting(), pl.piece()).transformed(PatternShapes.transform(pl)));
        }
        return out;
    }

    private static StockUse stockUse(SheetLayout s, List<Pattern> parts, CutFigures cut) {
        return s.stock().match(
                sh -> StockUse.sheet(sh.name(), sh.width(), sh.height(), sh.cost(), parts, cut),
                r -> StockUse.remnant(r.id(), r.outline().getArea(), r.cost(), parts, cut),
                c -> StockUse.coil(c.name(), c.width(), s.usedLength(), c.costPerLength(), parts, cut));
    }
}
