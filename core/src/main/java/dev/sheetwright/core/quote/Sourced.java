package dev.sheetwright.core.quote;

/**
 * A number with where it came from: a {@code [S:...]} tag, {@code common practice}, {@code from memory}, {@code shop}
 * (the shop settings file), {@code job} or {@code not priced}.
 */
public record Sourced(double value, String source) {

    /** Source of values read from the job file's {@code quote:} section or stock list. */
    public static final String JOB = "job";
    /** Source of values read from the shop settings file. */
    public static final String SHOP = "shop";

    public Sourced {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be finite and >= 0, was " + value);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("source must not be blank");
        }
    }
}
