package dev.sheetwright.core.develop;

import dev.sheetwright.core.geom.Pattern;

/** One distinct piece of a developed fitting: its exact pattern and its hand-layout dimensions. */
public record DevelopedPiece(Pattern pattern, Layout layout) {

    public DevelopedPiece {
        if (pattern == null || layout == null) {
            throw new IllegalArgumentException("developed piece needs a pattern and a layout");
        }
    }
}
