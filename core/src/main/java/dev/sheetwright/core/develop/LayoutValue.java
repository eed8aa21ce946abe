package dev.sheetwright.core.develop;

/**
 * One dimension a layout mechanic would use by hand (apex height, slant radius, pattern angle...).
 *
 * @param key machine-readable name used in patterns.json
 * @param label words for people
 * @param value the number, in the job's length unit, square units for areas, or degrees for angles
 */
public record LayoutValue(String key, String label, double value, Kind kind) {

    /** How the value is shown. */
    public enum Kind { LENGTH, AREA, ANGLE, NUMBER }

    public LayoutValue {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("layout value '" + key + "' must be finite, got " + value);
        }
    }

    public static LayoutValue length(String key, String label, double value) {
        return new LayoutValue(key, label, value, Kind.LENGTH);
    }

    /** An area in square job units (in2 or mm2). */
    public static LayoutValue area(String key, String label, double value) {
        return new LayoutValue(key, label, value, Kind.AREA);
    }

    public static LayoutValue angle(String key, String label, double degrees) {
        return new LayoutValue(key, label, degrees, Kind.ANGLE);
    }

    public static LayoutValue number(String key, String label, double value) {
        return new LayoutValue(key, label, value, Kind.NUMBER);
    }
}
