package dev.sheetwright.dxf;

import java.util.regex.Pattern;

/**
 * A named layer with an AutoCAD Color Index (ACI) colour, 1..255 (1 red, 2 yellow, 3 green, 4 cyan, 5 blue,
 * 6 magenta, 7 black or white). Names are kept to what every R12 reader accepts: 1 to 31 characters of
 * {@code A-Z 0-9 _ - $}.
 */
public record Layer(String name, int color) {

    private static final Pattern NAME = Pattern.compile("[A-Z0-9_$-]{1,31}");

    public Layer {
        Checks.notNull("Layer.name", name);
        if (!NAME.matcher(name).matches()) {
            throw new IllegalArgumentException(
                    "Layer.name must be 1 to 31 characters of A-Z 0-9 _ - $, got \"" + name + "\"");
        }
        if (color < 1 || color > 255) {
            throw new IllegalArgumentException("Layer.color must be an ACI colour 1..255, got " + color);
        }
    }

    public static Layer of(String name, int color) {
        return new Layer(name, color);
    }
}
