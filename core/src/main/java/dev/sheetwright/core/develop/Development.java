package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.FittingSpec;
import java.util.List;

/** A fitting turned into flat patterns: its distinct pieces, and warnings a mechanic should read. */
public record Development(FittingSpec fitting, List<DevelopedPiece> pieces, List<String> warnings) {

    public Development {
        pieces = List.copyOf(pieces);
        warnings = List.copyOf(warnings);
        if (pieces.isEmpty()) {
            throw new IllegalArgumentException("a development needs at least one piece");
        }
    }
}
