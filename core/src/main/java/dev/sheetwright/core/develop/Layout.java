package dev.sheetwright.core.develop;

import java.util.List;

/** The hand-layout dimensions of one piece: single values and tables. */
public record Layout(List<LayoutValue> values, List<LayoutTable> tables) {

    public Layout {
        values = List.copyOf(values);
        tables = List.copyOf(tables);
    }

    public static Layout of(LayoutValue... values) {
        return new Layout(List.of(values), List.of());
    }

    /** The value with this key. */
    public double get(String key) {
        return values.stream().filter(v -> v.key().equals(key)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no layout value '" + key + "'")).value();
    }
}
