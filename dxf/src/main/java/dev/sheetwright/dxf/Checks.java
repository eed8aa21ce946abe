package dev.sheetwright.dxf;

import java.util.List;
import java.util.Objects;

/** Argument checks shared by the value records; every message names the field, the value and the valid range. */
final class Checks {

    private Checks() {
    }

    static double finite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, got " + value);
        }
        return value;
    }

    static double positive(String field, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be finite and > 0, got " + value);
        }
        return value;
    }

    static <T> T notNull(String field, T value) {
        return Objects.requireNonNull(value, field + " must not be null");
    }

    /** An unmodifiable copy of {@code list}; rejects a null list and null elements, naming the element's index. */
    static <T> List<T> copy(String field, List<T> list) {
        notNull(field, list);
        for (int i = 0; i < list.size(); i++) {
            notNull(field + "[" + i + "]", list.get(i));
        }
        return List.copyOf(list);
    }
}
