package dev.sheetwright.dxf;

/**
 * A one-line label whose baseline starts at (x, y); {@code height} is the height of capital letters in drawing
 * units. Any string is accepted: each writer makes it safe for its format (see {@link DxfWriter}, {@link SvgWriter}).
 */
public record Text(String layer, double x, double y, double height, String value) implements Shape {

    public Text {
        Checks.notNull("Text.layer", layer);
        Checks.finite("Text.x", x);
        Checks.finite("Text.y", y);
        Checks.positive("Text.height", height);
        Checks.notNull("Text.value", value);
        if (value.isBlank()) {
            throw new IllegalArgumentException("Text.value must not be blank, got \"" + value + "\"");
        }
    }

    /** The insertion point only: glyph widths depend on the font of whatever reads the file. */
    @Override
    public Bounds bounds() {
        return Bounds.of(x, y);
    }
}
