package dev.sheetwright.core.job;

import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What a job gets when its file leaves the cutting rules or the stock out: kerf, part gap and sheet-edge margin
 * for each cutting process, and the sheet size. Each value says where it comes from ({@link #SOURCE}); a shop
 * with measured values puts them in the job's {@code cutting:} and {@code stock:} sections.
 */
public final class ShopDefaults {

    /** Where the defaults come from. */
    public static final String SOURCE = "common practice, trade-reference §8.3, §9.1, §9.4";

    private ShopDefaults() {
    }

    /** Kerf: plasma 0.06 in (1.5 mm, the thin end of standard air plasma, from memory, §9.1); laser 0.2 mm [S:LASERART]. */
    public static double kerf(CuttingProcess process, LengthUnit unit) {
        return process == CuttingProcess.LASER
                ? unit.convert(0.2, LengthUnit.MILLIMETRE)
                : unit.convert(0.06, LengthUnit.INCH);
    }

    /**
     * Part-to-part gap for a kerf (common practice, §9.4): plasma max(2 x kerf, 1/4 in); laser max(kerf + 1 mm,
     * 2 mm).
     */
    public static double gap(CuttingProcess process, double kerf, LengthUnit unit) {
        return process == CuttingProcess.LASER
                ? Math.max(kerf + unit.convert(1, LengthUnit.MILLIMETRE), unit.convert(2, LengthUnit.MILLIMETRE))
                : Math.max(2 * kerf, unit.convert(0.25, LengthUnit.INCH));
    }

    /** Sheet-edge margin (common practice, §9.4: plasma 6-12 mm, laser about 5 mm): plasma 3/8 in, laser 5 mm. */
    public static double margin(CuttingProcess process, LengthUnit unit) {
        return process == CuttingProcess.LASER
                ? unit.convert(5, LengthUnit.MILLIMETRE)
                : unit.convert(0.375, LengthUnit.INCH);
    }

    /**
     * Lead-in (common practice, §9.4: 3-6 mm on thin plasma work, 1-3 mm laser): plasma 3/16 in, laser 1 mm, never
     * longer than the gap less the kerf, so a lead cannot reach a neighbouring part.
     */
    public static double leadIn(CuttingProcess process, double gap, double kerf, LengthUnit unit) {
        double asked = process == CuttingProcess.LASER
                ? unit.convert(1, LengthUnit.MILLIMETRE)
                : unit.convert(0.1875, LengthUnit.INCH);
        return Math.max(0, Math.min(asked, gap - kerf));
    }

    /** Lead-out (common practice, §9.4: short or none on plasma, 0.5-1 mm laser): plasma none, laser 0.5 mm. */
    public static double leadOut(CuttingProcess process, double leadIn, LengthUnit unit) {
        return process == CuttingProcess.LASER ? Math.min(leadIn, unit.convert(0.5, LengthUnit.MILLIMETRE)) : 0;
    }

    /**
     * The largest length a job file may give for a fitting, a stock size or a cutting rule: 1000 in or 25,000 mm
     * (a sanity bound, common practice; well beyond any duct or sheet, far below sizes that break arithmetic).
     */
    public static double largestLength(LengthUnit unit) {
        return unit == LengthUnit.INCH ? 1000 : 25000;
    }

    /** The rules of a job without a {@code cutting:} section: plasma, its kerf, gap and margin, any rotation. */
    public static CuttingRules cutting(LengthUnit unit) {
        CuttingProcess p = CuttingProcess.PLASMA;
        double kerf = kerf(p, unit);
        return new CuttingRules(p, kerf, gap(p, kerf, unit), margin(p, unit), RotationMode.FREE, 0, false);
    }

    /** The stock of a job without a {@code stock:} section: as many 48 x 120 in or 1250 x 2500 mm sheets as needed (§8.3). */
    public static Stock stock(LengthUnit unit) {
        StockSheet sheet = unit == LengthUnit.INCH
                ? new StockSheet("48x120", 48, 120, OptionalInt.empty(), 0)
                : new StockSheet("1250x2500", 1250, 2500, OptionalInt.empty(), 0);
        return new Stock(List.of(sheet), List.of(), Optional.empty());
    }
}
