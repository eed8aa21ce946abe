package dev.sheetwright.inventory;

import dev.sheetwright.core.material.GaugeRow;
import dev.sheetwright.core.material.GaugeTable;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.units.LengthUnit;
import java.util.stream.Collectors;

/**
 * A remnant about to be added to the store (it has no id yet).
 *
 * @param material    the material
 * @param gauge       the gauge number ({@value #MIN_GAUGE} to {@value #MAX_GAUGE}), or null if only the
 *                    thickness is known
 * @param thicknessMm the thickness in mm (over 0, at most {@value #MAX_THICKNESS_MM}), or null if only the
 *                    gauge is known; at least one of gauge and thickness must be given
 * @param outline     the shape, in mm
 * @param location    where it is kept (e.g. a rack slot); one line of at most {@value #MAX_LOCATION_LENGTH}
 *                    characters; null is stored as empty
 * @param source      where it came from
 */
public record NewRemnant(MaterialType material, Integer gauge, Double thicknessMm, RemnantOutline outline,
                         String location, RemnantSource source) {
    public static final int MIN_GAUGE = 1;
    public static final int MAX_GAUGE = 38;
    public static final double MAX_THICKNESS_MM = 25.0;
    public static final int MAX_LOCATION_LENGTH = 100;

    public NewRemnant {
        if (material == null) {
            throw new IllegalArgumentException("material: is missing; valid words: " + MaterialType.validWords());
        }
        if (gauge == null && thicknessMm == null) {
            throw new IllegalArgumentException("gauge/thickness_mm: both are missing; give a gauge or a thickness");
        }
        if (gauge != null && (gauge < MIN_GAUGE || gauge > MAX_GAUGE)) {
            throw new IllegalArgumentException("gauge: " + gauge + " is out of range; must be "
                    + MIN_GAUGE + " to " + MAX_GAUGE);
        }
        if (gauge != null) {
            checkGauge(material, gauge, thicknessMm);
        }
        if (thicknessMm != null && (!Double.isFinite(thicknessMm) || thicknessMm <= 0.0
                || thicknessMm > MAX_THICKNESS_MM)) {
            throw new IllegalArgumentException("thickness_mm: " + thicknessMm
                    + " is out of range; must be > 0 and at most " + MmFormat.format(MAX_THICKNESS_MM) + " mm");
        }
        if (outline == null) {
            throw new IllegalArgumentException("outline: is missing; give a size or a polygon");
        }
        location = location == null ? "" : location.strip();
        if (location.length() > MAX_LOCATION_LENGTH || location.chars().anyMatch(Character::isISOControl)) {
            throw new IllegalArgumentException("location: '" + location + "' must be one line of at most "
                    + MAX_LOCATION_LENGTH + " characters");
        }
        if (source == null) {
            source = RemnantSource.manual();
        }
    }

    /**
     * The gauge must be in the material's gauge table (core's {@code GaugeTable}, each row with its source, e.g.
     * [S:SMACNA-GALV]); with a thickness too, the two must agree: within the table's minimum and maximum for that
     * gauge when it gives them, else the thickness must be nearer that gauge's nominal thickness than any other
     * gauge's (common practice).
     */
    private static void checkGauge(MaterialType material, int gauge, Double thicknessMm) {
        GaugeTable table = GaugeTable.of(material);
        GaugeRow row = table.find(gauge).orElseThrow(() -> new IllegalArgumentException("gauge: " + gauge
                + " is not in the " + material.word() + " gauge table (" + table.system() + "); valid gauges: "
                + table.gauges().stream().map(String::valueOf).collect(Collectors.joining(", "))));
        if (thicknessMm == null || !Double.isFinite(thicknessMm)) {
            return;
        }
        double mmPerIn = LengthUnit.INCH.mmPerUnit();
        double t = thicknessMm / mmPerIn;
        boolean agrees;
        String range;
        if (row.minIn().isPresent() && row.maxIn().isPresent()) {
            double low = row.minIn().getAsDouble();
            double high = row.maxIn().getAsDouble();
            agrees = t >= low && t <= high;
            range = mm3(low * mmPerIn) + " to " + mm3(high * mmPerIn) + " mm";
        } else {
            GaugeRow nearest = table.rows().stream()
                    .min(java.util.Comparator.comparingDouble(r -> Math.abs(r.nominalIn() - t))).orElseThrow();
            agrees = nearest.gauge() == gauge;
            range = "nearest to it of all gauges";
        }
        if (!agrees) {
            throw new IllegalArgumentException("gauge/thickness_mm: " + material.word() + " " + gauge + " ga is "
                    + mm3(row.nominalIn() * mmPerIn) + " mm (" + range + ") in the " + table.system()
                    + " table, but the thickness given is " + mm3(thicknessMm) + " mm; give the gauge or the"
                    + " thickness that is right");
        }
    }

    private static String mm3(double mm) {
        return String.format(java.util.Locale.ROOT, "%.3f", mm);
    }

    /** A hand-entered remnant with a gauge and no thickness. */
    public static NewRemnant manual(MaterialType material, int gauge, RemnantOutline outline, String location) {
        return new NewRemnant(material, gauge, null, outline, location, RemnantSource.manual());
    }

    /** A hand-entered remnant with a thickness in mm and no gauge. */
    public static NewRemnant manualMm(MaterialType material, double thicknessMm, RemnantOutline outline,
                                      String location) {
        return new NewRemnant(material, null, thicknessMm, outline, location, RemnantSource.manual());
    }

    /** The offcut left from sheet {@code sheet} of job {@code job}, same material as the sheet. */
    public static NewRemnant offcut(MaterialType material, Integer gauge, Double thicknessMm,
                                    RemnantOutline outline, String location, String job, int sheet) {
        return new NewRemnant(material, gauge, thicknessMm, outline, location, RemnantSource.job(job, sheet));
    }
}
