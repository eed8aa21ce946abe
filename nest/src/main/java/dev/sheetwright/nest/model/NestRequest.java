package dev.sheetwright.nest.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * What to nest, on what, under which rules, and the one precision every tolerance of the nest derives from. Piece
 * labels (fitting/piece) must be unique.
 */
public record NestRequest(List<NestPiece> pieces, List<Stock> stock, NestRules rules, NestPrecision precision) {
    public NestRequest {
        Checks.requireNonNull("pieces", pieces);
        Checks.requireNonNull("stock", stock);
        Checks.requireNonNull("rules", rules);
        Checks.requireNonNull("precision", precision);
        pieces = List.copyOf(pieces);
        stock = List.copyOf(stock);
        if (stock.isEmpty()) {
            throw new IllegalArgumentException("stock must list at least one sheet, remnant or coil, got none");
        }
        Set<String> seen = new HashSet<>();
        for (NestPiece p : pieces) {
            if (!seen.add(p.label())) {
                throw new IllegalArgumentException("pieces must have unique fitting/piece labels, got '" + p.label() + "' twice");
            }
        }
    }

    /** A request whose precision comes from its own scale (no job tolerance: benchmarks, tests). */
    public NestRequest(List<NestPiece> pieces, List<Stock> stock, NestRules rules) {
        this(pieces, stock, rules, NestPrecision.ofScale(NestPrecision.scaleOf(pieces, stock)));
    }

    /** Total number of copies requested. */
    public int totalCopies() {
        return pieces.stream().mapToInt(NestPiece::copies).sum();
    }
}
