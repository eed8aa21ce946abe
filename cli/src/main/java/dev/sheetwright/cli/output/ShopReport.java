package dev.sheetwright.cli.output;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.cli.run.JobNest;
import dev.sheetwright.cli.run.CutPlans;
import dev.sheetwright.cli.run.JobQuote;
import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.develop.LayoutTable;
import dev.sheetwright.core.develop.LayoutValue;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.quote.Quote;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * What the shop report says, in the order it says it; {@link ReportHtml} and {@link ReportPdf} only lay it out.
 *
 * @param facts job, material, process and file lines for the heading
 * @param totals rows of (what, value, where the number comes from)
 * @param stock rows of (stock, count, area, weight, cost, priced)
 * @param rates rows of (rate, value, source)
 * @param partList rows of (fitting, piece, count, sheets)
 */
public record ShopReport(String title, List<String> facts, List<String[]> totals, List<String> stockHeader,
                         List<String[]> stock, List<String[]> rates, List<String> warnings, List<SheetPage> sheets,
                         List<String[]> partList, List<String> unplaced, List<LayoutBlock> layouts,
                         List<String> cautions) {

    /** One sheet: its number, heading line, picture and the labels of its parts. */
    public record SheetPage(int number, String heading, Drawing drawing, List<String> parts) {
    }

    /** Hand-layout dimensions of one developed piece: (dimension, value) rows and any tables. */
    public record LayoutBlock(String heading, List<String[]> values, List<LayoutTable> tables) {
    }

    /**
     * The report of a nest and its quote; with {@code path} (the sheets' cut plans, or null) each sheet picture
     * also shows the cutting order and the rapids.
     */
    public static ShopReport of(JobNest nest, Quote q, CutPlans path) {
        Job job = nest.job();
        String u = job.unit().symbol();
        String w = q.weightUnit().symbol();
        String a = q.areaUnit();
        Quote.QuoteTotals t = q.totals();
        List<String> facts = List.of(
                "Material: " + job.material().describe() + ", " + job.material().source(),
                "Cut: " + job.cutting().process().word() + String.format(Locale.ROOT, ", kerf %s %s, gap %s %s,"
                        + " margin %s %s", trim(job.cutting().kerf()), u, trim(job.cutting().gap()), u,
                        trim(job.cutting().margin()), u),
                "Fittings: " + job.fittings().stream().map(f -> f.id() + " " + f.type() + " x" + f.qty())
                        .collect(Collectors.joining(", ")));

        String perArea = q.rate("weightPerArea").map(QuoteText::rate).orElse("");
        String perAreaSource = q.rate("weightPerArea").map(Quote.Rate::source).orElse("");
        List<String[]> totals = new ArrayList<>();
        totals.add(row("Sheets / stock pieces", String.valueOf(t.sheets()), "nest"));
        totals.add(row("Stock area", QuoteText.num(t.stockArea(), 2) + " " + a, "nest, whole pieces billed"));
        totals.add(row("Stock weight", QuoteText.num(t.stockWeight(), 2) + " " + w,
                "stock area x " + perArea + " (" + perAreaSource + ")"));
        totals.add(row("Part weight", QuoteText.num(t.partWeight(), 2) + " " + w,
                "net part area " + QuoteText.num(t.partArea(), 2) + " " + a + " x " + perArea));
        totals.add(row("Scrap weight", QuoteText.num(t.scrapWeight(), 2) + " " + w, "stock - parts"));
        totals.add(row("Utilization", String.format(Locale.ROOT, "%.1f %%", 100 * t.utilization()),
                "part area / stock area"));
        totals.add(row("Cut length", QuoteText.num(t.cutLength(), 1) + " " + u, "the torch path of the cut"
                + " programs: " + QuoteText.num(t.contourLength(), 1) + " " + u + " around the contours (half a kerf"
                + " into scrap) + " + QuoteText.num(t.leadInLength(), 1) + " " + u + " of lead-ins and lead-outs"));
        totals.add(row("Pierces", String.valueOf(t.pierces()), "one per closed contour (outer + holes)"));
        totals.add(row("Rapid travel", QuoteText.num(t.rapidLength(), 1) + " " + u,
                "the programs' rapids: holes before outlines, nearest-next tour improved by 2-opt (common"
                        + " practice)"));
        totals.add(row("Cut time", QuoteText.minutes(t.cutMinutes()), QuoteText.timeTerms(q)
                + "; trade-reference 9.5 formula, rates below"));
        totals.add(row("Material cost", QuoteText.money(q, t.materialCost()), q.stock().stream()
                .map(Quote.StockLine::costBasis).distinct().collect(Collectors.joining("; "))));
        boolean machinePriced = q.rate("machineRate").map(r -> r.value() > 0).orElse(false);
        totals.add(row("Machine cost", machinePriced ? QuoteText.money(q, t.machineCost()) : "not priced",
                q.rate("machineRate").map(r -> "cut hours x " + QuoteText.rate(r) + " (" + r.source() + ")")
                        .orElse("")));
        totals.add(row("Total", QuoteText.money(q, t.totalCost()), "material + machine"));

        List<String> stockHeader = List.of("Stock", "Count", "Area " + a, "Weight " + w,
                "Cost" + q.currency().map(c -> " " + c).orElse(""), "Priced");
        List<String[]> stock = new ArrayList<>();
        for (Quote.StockLine l : q.stock()) {
            stock.add(row(l.kind().word() + " " + l.name(), String.valueOf(l.count()), QuoteText.num(l.area(), 2),
                    QuoteText.num(l.weight(), 2), QuoteText.num(l.cost(), 2), l.costBasis()));
        }
        List<String[]> rates = new ArrayList<>();
        String previous = null;
        for (Quote.Rate r : q.rates()) {
            rates.add(row(r.name(), QuoteText.rate(r), r.source().equals(previous) ? "as above" : r.source()));
            previous = r.source();
        }

        List<SheetPage> pages = new ArrayList<>();
        Map<String, int[]> counts = new LinkedHashMap<>();
        Map<String, Set<Integer>> onSheets = new LinkedHashMap<>();
        int n = nest.result().sheets().size();
        for (SheetLayout s : nest.result().sheets()) {
            int number = s.index() + 1;
            List<String> labels = ReportDrawings.key(s);
            for (Placement pl : s.parts()) {
                String key = pl.fitting() + "\u0000" + pl.piece();
                counts.computeIfAbsent(key, k -> new int[1])[0]++;
                onSheets.computeIfAbsent(key, k -> new LinkedHashSet<>()).add(number);
            }
            String heading = String.format(Locale.ROOT, "Sheet %d of %d: %s, %d parts, utilization %.1f %%, program %s",
                    number, n, stockText(s, u), s.parts().size(), 100 * s.utilization(), NestJson.sheetFile(s)
                            + ".dxf");
            pages.add(new SheetPage(number, heading,
                    ReportDrawings.sheet(s, JobQuote.placedParts(s, nest.plan()), job.unit(),
                            path == null ? null : path.of(s)), labels));
        }
        List<String[]> partList = new ArrayList<>();
        for (Map.Entry<String, int[]> e : counts.entrySet()) {
            String[] fp = e.getKey().split("\u0000");
            partList.add(row(fp[0], fp[1], String.valueOf(e.getValue()[0]), onSheets.get(e.getKey()).stream()
                    .map(String::valueOf).collect(Collectors.joining(", "))));
        }
        List<String> unplaced = new ArrayList<>();
        for (Unplaced up : nest.result().unplaced()) {
            unplaced.add(up.fitting() + " " + up.piece() + " #" + (up.copy() + 1) + ": " + up.reason());
        }

        LayoutText text = new LayoutText(job.unit(), FractionFormat.SIXTEENTHS);
        List<LayoutBlock> layouts = new ArrayList<>();
        for (Development d : nest.developments()) {
            for (DevelopedPiece piece : d.pieces()) {
                List<String[]> values = new ArrayList<>();
                for (LayoutValue v : piece.layout().values()) {
                    values.add(row(v.label(), text.format(v)));
                }
                layouts.add(new LayoutBlock(d.fitting().id() + " " + d.fitting().type() + ", piece "
                        + piece.pattern().piece() + " (" + piece.pattern().count() + " per fitting x " + d.fitting().qty()
                        + ")", values, piece.layout().tables()));
            }
        }
        return new ShopReport("Shop report: " + job.name(), facts, totals, stockHeader, stock, rates, q.warnings(),
                pages, partList, unplaced, layouts, Cautions.ALL);
    }

    private static String stockText(SheetLayout s, String u) {
        return s.stock().match(
                sh -> "sheet " + sh.name() + " (" + trim(sh.width()) + " x " + trim(sh.height()) + " " + u + ")",
                r -> "remnant " + r.id(),
                c -> "coil " + trim(c.width()) + " " + u + ", " + QuoteText.num(s.usedLength(), 2) + " " + u
                        + " used");
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.4f", v)
                .replaceAll("0+$", "");
    }

    private static String[] row(String... cells) {
        return cells;
    }
}
