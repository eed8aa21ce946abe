package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.UnitFactors;

/**
 * The work on one or more sheets of one material that a cut time is estimated for: total cut length (outer and inner
 * contours plus lead-ins and lead-outs), number of pierces, total rapid travel and number of sheets handled.
 */
public record CutWork(double cutLengthMm, int pierceCount, double rapidLengthMm, int sheetCount) {

    public CutWork {
        requireLength("cutLengthMm", cutLengthMm);
        requireLength("rapidLengthMm", rapidLengthMm);
        if (pierceCount < 0) {
            throw new IllegalArgumentException("pierceCount must be >= 0, was " + pierceCount);
        }
        if (sheetCount < 0) {
            throw new IllegalArgumentException("sheetCount must be >= 0, was " + sheetCount);
        }
    }

    /** The same work with lengths given in inches. */
    public static CutWork ofInches(double cutLengthIn, int pierceCount, double rapidLengthIn, int sheetCount) {
        requireLength("cutLengthIn", cutLengthIn);
        requireLength("rapidLengthIn", rapidLengthIn);
        return new CutWork(cutLengthIn * UnitFactors.MM_PER_IN, pierceCount, rapidLengthIn * UnitFactors.MM_PER_IN,
                sheetCount);
    }

    private static void requireLength(String name, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite and >= 0, was " + value);
        }
    }
}
