package dev.sheetwright.core.quote;

import dev.sheetwright.core.geom.Pattern;
import java.util.List;
import java.util.Objects;

/**
 * One piece of stock used by a nest and the exact parts placed on it (patterns already moved to sheet coordinates,
 * origin at the machine's home corner).
 *
 * @param name sheet size name, remnant id or coil name; stock lines are grouped by kind and name
 * @param area stock area used, job units squared (a coil: width x used length)
 * @param listedCost what the job's stock list says this piece costs (a sheet's price, a remnant's cost, a coil's cost
 *                   per length x used length); 0 when the list gives no cost
 * @param cut what its cut program does (from the same plan the program is written from)
 */
public record StockUse(StockKind kind, String name, double area, double listedCost, List<Pattern> parts,
                       CutFigures cut) {

    public StockUse {
        Objects.requireNonNull(kind, "kind");
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("stock name must not be blank");
        }
        if (!(area > 0) || !Double.isFinite(area)) {
            throw new IllegalArgumentException("stock " + name + ": area must be finite and > 0, was " + area);
        }
        if (!(listedCost >= 0) || !Double.isFinite(listedCost)) {
            throw new IllegalArgumentException("stock " + name + ": cost must be finite and >= 0, was " + listedCost);
        }
        parts = List.copyOf(parts);
        Objects.requireNonNull(cut, "cut");
    }

    /** A standard sheet of width x length at a price each. */
    public static StockUse sheet(String name, double width, double length, double pricePerSheet, List<Pattern> parts,
                                 CutFigures cut) {
        return new StockUse(StockKind.SHEET, name, width * length, pricePerSheet, parts, cut);
    }

    /** A remnant of the given polygon area and cost. */
    public static StockUse remnant(String id, double polygonArea, double cost, List<Pattern> parts, CutFigures cut) {
        return new StockUse(StockKind.REMNANT, id, polygonArea, cost, parts, cut);
    }

    /** A length cut off a coil: width x used length, cost per unit length x used length. */
    public static StockUse coil(String name, double width, double usedLength, double costPerLength,
                                List<Pattern> parts, CutFigures cut) {
        if (!(costPerLength >= 0) || !Double.isFinite(costPerLength)) {
            throw new IllegalArgumentException("coil " + name + ": cost per length must be finite and >= 0, was "
                    + costPerLength);
        }
        return new StockUse(StockKind.COIL, name, width * usedLength, costPerLength * usedLength, parts, cut);
    }
}
