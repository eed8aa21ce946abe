package dev.sheetwright.cli.output;

import dev.sheetwright.core.cutting.CutTimeEstimate;
import dev.sheetwright.core.quote.Quote;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/** The quote for people: a terminal table, a short summary for {@code nest}, and number formats shared by reports. */
public final class QuoteText {

    private QuoteText() {
    }

    /** Money with its currency code, or {@code unknown}. */
    public static String money(Quote q, OptionalDouble v) {
        return v.isPresent() ? money(q, v.getAsDouble()) : "unknown";
    }

    public static String money(Quote q, double v) {
        return String.format(Locale.ROOT, "%,.2f", v) + q.currency().map(c -> " " + c).orElse("");
    }

    public static String minutes(OptionalDouble m) {
        return m.isPresent() ? String.format(Locale.ROOT, "%.1f min", m.getAsDouble()) : "unknown";
    }

    public static String num(double v, int places) {
        return String.format(Locale.ROOT, "%,." + places + "f", v);
    }

    /** A rate's value as people read it, e.g. {@code 262.1 in/min}. */
    public static String rate(Quote.Rate r) {
        double v = r.value();
        String n = v == Math.rint(v) && Math.abs(v) < 1e6 ? String.valueOf((long) v)
                : Math.abs(v) >= 100 ? num(v, 1) : Math.abs(v) >= 1 ? num(v, 3) : num(v, 4);
        return n + " " + r.unit();
    }

    /** The cut-time terms, e.g. {@code cutting 3.1 + starts 0.5 + rapids 0.4 + handling 2.0 min}. */
    public static String timeTerms(Quote q) {
        if (q.cutTime().isEmpty()) {
            return "unknown (see warnings)";
        }
        CutTimeEstimate e = q.cutTime().get();
        return String.format(Locale.ROOT, "cutting %.1f + starts %.1f + rapids %.1f + handling %.1f min",
                e.cuttingMinutes(), e.piercingMinutes(), e.rapidMinutes(), e.handlingMinutes());
    }

    /** The full quote as a table with a heading, rates with sources and warnings. */
    public static List<String> table(String jobName, Quote q) {
        List<String> out = new ArrayList<>();
        Quote.QuoteTotals t = q.totals();
        String w = q.weightUnit().symbol();
        String u = q.unit().symbol();
        out.add("Quote: " + jobName);
        out.add("  " + q.material().describe() + ", " + q.process().word() + " cut");
        out.add("");
        out.add(String.format(Locale.ROOT, "  %-22s %5s %12s %12s %14s  %s", "stock", "count", "area " + q.areaUnit(),
                "weight " + w, "cost", "priced"));
        for (Quote.StockLine l : q.stock()) {
            out.add(String.format(Locale.ROOT, "  %-22s %5d %12s %12s %14s  %s", l.kind().word() + " " + l.name(),
                    l.count(), num(l.area(), 2), num(l.weight(), 2), money(q, l.cost()), l.costBasis()));
        }
        out.add("  " + "-".repeat(72));
        out.add(String.format(Locale.ROOT, "  %-22s %5d %12s %12s %14s", "all stock", t.sheets(),
                num(t.stockArea(), 2), num(t.stockWeight(), 2), money(q, t.materialCost())));
        out.add("");
        out.add(String.format(Locale.ROOT, "  parts      %s %s (%s %s), scrap %s %s, utilization %.1f %%",
                num(t.partWeight(), 2), w, num(t.partArea(), 2), q.areaUnit(), num(t.scrapWeight(), 2), w,
                100 * t.utilization()));
        out.add(String.format(Locale.ROOT, "  cutting    %s %s of cut (%s around contours + %s of leads), %d pierces,"
                + " %s %s of rapids", num(t.cutLength(), 1), u, num(t.contourLength(), 1), num(t.leadInLength(), 1),
                t.pierces(), num(t.rapidLength(), 1), u));
        out.add("  cut time   " + minutes(t.cutMinutes()) + " = " + timeTerms(q));
        out.add("  cost       material " + money(q, t.materialCost()) + " + machine "
                + (q.rate("machineRate").map(r -> r.value() == 0).orElse(true) ? "not priced"
                : money(q, t.machineCost())) + " = total " + money(q, t.totalCost()));
        out.add("");
        out.add("  rates used (source):");
        String previous = null;
        for (Quote.Rate r : q.rates()) {
            out.add(String.format(Locale.ROOT, "    %-26s %-18s %s", r.name(), rate(r),
                    r.source().equals(previous) ? "as above" : r.source()));
            previous = r.source();
        }
        out.addAll(warnings(q));
        return out;
    }

    /** For {@code nest}: one line of weight, cost and cutting, the files, and the warnings. */
    public static List<String> summary(Quote q) {
        List<String> out = new ArrayList<>();
        Quote.QuoteTotals t = q.totals();
        String w = q.weightUnit().symbol();
        out.add(String.format(Locale.ROOT, "Quote: stock %s %s (parts %s, scrap %s), material %s, cut %s %s with %d"
                        + " pierces, cut time %s, total %s", num(t.stockWeight(), 2), w, num(t.partWeight(), 2),
                num(t.scrapWeight(), 2), money(q, t.materialCost()), num(t.cutLength(), 1), q.unit().symbol(),
                t.pierces(), minutes(t.cutMinutes()), money(q, t.totalCost())));
        out.add("Quote files: quote.json, quote.csv, report.html, report.pdf");
        out.addAll(warnings(q));
        return out;
    }

    private static List<String> warnings(Quote q) {
        List<String> out = new ArrayList<>();
        if (!q.warnings().isEmpty()) {
            out.add("Warnings:");
            q.warnings().forEach(x -> out.add("  - " + x));
        }
        return out;
    }
}
