package dev.sheetwright.core.develop;

import java.util.List;

/**
 * A table of layout dimensions (e.g. gore ordinates per division, element lengths). Every cell is a length in
 * the job's unit unless the column header says degrees.
 */
public record LayoutTable(String key, String label, List<String> columns, List<List<Double>> rows) {

    public LayoutTable {
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        for (List<Double> r : rows) {
            if (r.size() != columns.size()) {
                throw new IllegalArgumentException("layout table '" + key + "' row has " + r.size()
                        + " cells for " + columns.size() + " columns");
            }
        }
    }
}
