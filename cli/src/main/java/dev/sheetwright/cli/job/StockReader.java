package dev.sheetwright.cli.job;

import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.job.ShopDefaults;
import dev.sheetwright.core.job.Stock;
import dev.sheetwright.core.job.StockCoil;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.job.StockSheet;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.core.units.Lengths;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;

/** The job file's {@code stock:} section: sheets, remnants and coil; the shop default sheets when absent. */
final class StockReader {

    private StockReader() {
    }

    static Stock read(Fields s, LengthUnit unit) {
        if (s == null) {
            return ShopDefaults.stock(unit);
        }
        double largest = ShopDefaults.largestLength(unit);
        s.allowOnly(Set.of("sheets", "remnants", "coil"));
        List<StockSheet> sheets = new ArrayList<>();
        if (s.has("sheets")) {
            for (Fields sh : s.listOfMaps("sheets")) {
                sh.allowOnly(Set.of("size", "count", "cost"));
                double[] wl = size(sh, "size", largest, unit);
                OptionalInt count = sh.has("count") ? OptionalInt.of(sh.integer("count", 0, 0, 100000))
                        : OptionalInt.empty();
                sheets.add(new StockSheet(sh.string("size"), wl[0], wl[1], count, sh.notNegative("cost", 0)));
            }
        }
        List<StockRemnant> remnants = new ArrayList<>();
        if (s.has("remnants")) {
            for (Fields r : s.listOfMaps("remnants")) {
                r.allowOnly(Set.of("id", "size", "polygon", "cost"));
                String id = r.string("id");
                double cost = r.notNegative("cost", 0);
                if (r.has("size") == r.has("polygon")) {
                    throw r.error("size", "give either size (W x L) or polygon (a list of [x, y] corners)");
                }
                if (r.has("size")) {
                    double[] wl = size(r, "size", largest, unit);
                    remnants.add(StockRemnant.rectangle(id, wl[0], wl[1], cost));
                } else {
                    remnants.add(new StockRemnant(id, polygon(r, "polygon", largest, unit), cost));
                }
            }
        }
        Optional<StockCoil> coil = Optional.empty();
        if (s.has("coil")) {
            Fields c = s.map("coil");
            c.allowOnly(Set.of("width", "cost"));
            double w = c.positive("width");
            if (w > largest) {
                throw c.error("width", tooLarge(largest, unit, w));
            }
            coil = Optional.of(new StockCoil("coil " + w, w, c.notNegative("cost", 0)));
        }
        if (sheets.isEmpty() && remnants.isEmpty() && coil.isEmpty()) {
            throw s.error("sheets", "stock lists no sheets, remnants or coil");
        }
        return new Stock(sheets, remnants, coil);
    }

    private static String tooLarge(double largest, LengthUnit unit, double v) {
        return "must be at most " + largest + " " + unit.symbol() + " (a sanity bound), got " + v;
    }

    private static double[] size(Fields f, String key, double largest, LengthUnit unit) {
        double[] wl;
        try {
            wl = Lengths.parseSize(f.string(key));
        } catch (IllegalArgumentException e) {
            throw f.error(key, e.getMessage());
        }
        if (!(wl[0] > 0 && wl[1] > 0)) {
            throw f.error(key, "both sides must be positive, got '" + f.string(key) + "'");
        }
        if (Math.max(wl[0], wl[1]) > largest) {
            throw f.error(key, tooLarge(largest, unit, Math.max(wl[0], wl[1])));
        }
        return wl;
    }

    private static List<Point2> polygon(Fields f, String key, double largest, LengthUnit unit) {
        Object o = f.raw(key);
        if (!(o instanceof List<?> list) || list.size() < 3) {
            throw f.error(key, "must be a list of at least 3 [x, y] corners");
        }
        List<Point2> pts = new ArrayList<>();
        for (Object p : list) {
            if (!(p instanceof List<?> xy) || xy.size() != 2 || !(xy.get(0) instanceof Number)
                    || !(xy.get(1) instanceof Number)) {
                throw f.error(key, "each corner must be [x, y] with two numbers, got " + p);
            }
            double x = ((Number) xy.get(0)).doubleValue();
            double y = ((Number) xy.get(1)).doubleValue();
            if (!Double.isFinite(x) || !Double.isFinite(y) || Math.max(Math.abs(x), Math.abs(y)) > largest) {
                throw f.error(key, "each corner must be within " + largest + " " + unit.symbol()
                        + " of the origin (a sanity bound), got " + p);
            }
            pts.add(new Point2(x, y));
        }
        return pts;
    }
}
