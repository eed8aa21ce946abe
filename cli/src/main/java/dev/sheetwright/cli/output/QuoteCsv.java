package dev.sheetwright.cli.output;

import dev.sheetwright.core.quote.Quote;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** {@code quote.csv}: one row per stock line and one totals row, RFC 4180 quoting, units in the header. */
public final class QuoteCsv {

    /** The {@code line} column value of the totals row. */
    public static final String TOTAL = "total";

    private QuoteCsv() {
    }

    public static String text(Quote q) {
        String money = q.currency().orElse("money");
        String[] header = {"line", "name", "count", "area (" + q.areaUnit() + ")", "weight (" + q.weightUnit().symbol()
                + ")", "cost (" + money + ")", "basis"};
        StringWriter out = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(header).get())) {
            for (Quote.StockLine l : q.stock()) {
                p.printRecord(l.kind().word(), l.name(), l.count(), fixed(l.area(), 3), fixed(l.weight(), 2),
                        fixed(l.cost(), 2), l.costBasis());
            }
            Quote.QuoteTotals t = q.totals();
            p.printRecord(TOTAL, "all stock", t.sheets(), fixed(t.stockArea(), 3), fixed(t.stockWeight(), 2),
                    fixed(t.materialCost(), 2), "material cost");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    public static void write(Quote q, Path file) {
        try {
            Files.writeString(file, text(q), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    private static String fixed(double v, int places) {
        return String.format(Locale.ROOT, "%." + places + "f", v);
    }
}
