package dev.sheetwright.core.fitting;

/**
 * Rectangular S offset: the centre line moves sideways by {@code offset} in the plane of the width over the
 * advance {@code length}, on two equal reverse arcs (trade-reference §13.5).
 */
public record RectOffsetSpec(String id, int qty, double width, double depth, double offset, double length,
        Allowances allowances) implements FittingSpec {

    public RectOffsetSpec {
        RectFittings.requireCommon(id, qty, width, depth, allowances);
        FittingSpec.requirePositive(id, "offset", offset);
        FittingSpec.requirePositive(id, "length", length);
        if (!(offset < length)) {
            throw new FittingException(id, "offset", "two reverse arcs reach an offset only below the length: "
                    + "offset " + offset + " must be less than length " + length);
        }
    }

    /** Centre-line radius of each arc, R = (L^2 + O^2) / (4 O) (trade-reference §13.5, computed). */
    public double radius() {
        return (length * length + offset * offset) / (4 * offset);
    }

    /** Angle of each arc in radians, 2 atan(O / L) (trade-reference §13.5, computed). */
    public double arcAngle() {
        return 2 * Math.atan(offset / length);
    }

    @Override
    public int pieces() {
        return 1;
    }

    @Override
    public String type() {
        return "rect-offset";
    }
}
