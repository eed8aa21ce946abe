package dev.sheetwright.nest.model;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.locationtech.jts.geom.Polygon;

/**
 * What to nest, on what, under which rules, and the one precision every tolerance of the nest derives from. Piece
 * labels (fitting/piece) must be unique. Outlines are kept with no edge shorter than the precision
 * ({@link NestPrecision#clean}): draw placed copies from {@link #pieces()}.
 */
public record NestRequest(List<NestPiece> pieces, List<Stock> stock, NestRules rules, NestPrecision precision) {
    public NestRequest {
        Checks.requireNonNull("pieces", pieces);
        Checks.requireNonNull("stock", stock);
        Checks.requireNonNull("rules", rules);
        Checks.requireNonNull("precision", precision);
        pieces = cleaned(pieces, precision);
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

    /** The pieces with outlines cleaned by the precision (no edge shorter than it): what the engine places. */
    private static List<NestPiece> cleaned(List<NestPiece> pieces, NestPrecision precision) {
        List<NestPiece> out = new ArrayList<>(pieces.size());
        for (NestPiece p : pieces) {
            Checks.requireNonNull("pieces[" + out.size() + "]", p);
            Polygon clean = precision.clean(p.shape());
            out.add(clean == p.shape() ? p : new NestPiece(p.fitting(), p.piece(), p.copies(), clean));
        }
        return List.copyOf(out);
    }

    /** Total number of copies requested. */
    public int totalCopies() {
        return pieces.stream().mapToInt(NestPiece::copies).sum();
    }
}
