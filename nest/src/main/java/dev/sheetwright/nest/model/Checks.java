package dev.sheetwright.nest.model;

/** Argument checks shared by the model records; messages name the field, the value and the valid range. */
final class Checks {
    private Checks() {
    }

    static String requireText(String field, String value) {
        if (value == null || value.isBlank()) {
            throw new IllegalArgumentException(field + " must be a non-blank text, got " + (value == null ? "null" : "'" + value + "'"));
        }
        return value;
    }

    static double requireFinite(String field, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be a finite number, got " + value);
        }
        return value;
    }

    static double requirePositive(String field, double value) {
        if (!Double.isFinite(value) || value <= 0) {
            throw new IllegalArgumentException(field + " must be finite and > 0, got " + value);
        }
        return value;
    }

    static double requireNonNegative(String field, double value) {
        if (!Double.isFinite(value) || value < 0) {
            throw new IllegalArgumentException(field + " must be finite and >= 0, got " + value);
        }
        return value;
    }

    static <T> T requireNonNull(String field, T value) {
        if (value == null) {
            throw new IllegalArgumentException(field + " must not be null");
        }
        return value;
    }

    static org.locationtech.jts.geom.Polygon requireArea(String field, org.locationtech.jts.geom.Polygon p) {
        requireNonNull(field, p);
        if (p.isEmpty() || !(p.getArea() > 0)) {
            throw new IllegalArgumentException(field + " must be a non-empty polygon with area > 0, got area " + p.getArea());
        }
        if (!p.isValid()) {
            throw new IllegalArgumentException(field + " must be a valid simple polygon (JTS isValid), got "
                    + new org.locationtech.jts.operation.valid.IsValidOp(p).getValidationError());
        }
        return p;
    }
}
