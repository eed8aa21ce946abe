package dev.sheetwright.nest.check;

/** One thing wrong with a nest, found by {@link NestChecker}. */
public record Violation(Kind kind, String message) {
    /** What kind of rule is broken. */
    public enum Kind {
        OVERLAP, TOO_CLOSE, OUTSIDE_STOCK, MARGIN, ROTATION, MIRROR, MISSING, DUPLICATE, UNKNOWN_PIECE, COIL_LENGTH
    }

    public Violation {
        if (kind == null || message == null || message.isBlank()) {
            throw new IllegalArgumentException("kind and message must be given, got " + kind + ", " + message);
        }
    }

    @Override
    public String toString() {
        return kind + ": " + message;
    }
}
