package dev.sheetwright.nest.model;

import java.util.Comparator;
import java.util.List;

/**
 * The shop's order of two nests of one request, best first: every piece placed (fewest unplaced copies), then the
 * cheapest stock, then the least stock area (remnants before sheets of the same cost), then the fewest layouts, then
 * the shortest used length on the last layout (the largest clean offcut left there). Costs, areas and lengths
 * within {@link NestPrecision#RELATIVE_TIE} of each other tie. The first engine ranks its layouts the same way.
 */
public final class NestRanking {
    /** Best first. */
    public static final Comparator<NestResult> BEST_FIRST = NestRanking::compare;

    private NestRanking() {
    }

    static int compare(NestResult a, NestResult b) {
        int c = Integer.compare(a.unplaced().size(), b.unplaced().size());
        if (c != 0) {
            return c;
        }
        c = NestPrecision.compareTotals(cost(a), cost(b));
        if (c != 0) {
            return c;
        }
        c = NestPrecision.compareTotals(area(a), area(b));
        if (c != 0) {
            return c;
        }
        c = Integer.compare(a.sheets().size(), b.sheets().size());
        if (c != 0) {
            return c;
        }
        return NestPrecision.compareTotals(lastLength(a), lastLength(b));
    }

    /** Total cost of the stock a nest uses. */
    public static double cost(NestResult r) {
        return r.sheets().stream().mapToDouble(NestRanking::cost).sum();
    }

    /** Cost of the stock a layout uses: a sheet's or remnant's price, a coil's by the length cut off. */
    public static double cost(SheetLayout l) {
        return l.stock().match(Sheet::cost, Remnant::cost, coil -> coil.costPerLength() * l.usedLength());
    }

    private static double area(NestResult r) {
        return r.sheets().stream().mapToDouble(SheetLayout::stockArea).sum();
    }

    private static double lastLength(NestResult r) {
        List<SheetLayout> s = r.sheets();
        return s.isEmpty() ? 0 : s.get(s.size() - 1).usedLength();
    }
}
