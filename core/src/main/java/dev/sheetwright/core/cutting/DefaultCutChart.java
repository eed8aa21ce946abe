package dev.sheetwright.core.cutting;

import dev.sheetwright.core.material.MaterialType;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The built-in cut chart: every default number of the cutting package is written here and nowhere else
 * (trade-reference §9.2, §9.3, §9.5). These are starting values for estimates; a machine's own chart overrides them.
 *
 * <p>Coverage: both processes, all four material families, 0.3 to 4.0 mm, so galvanized 30 ga (0.399 mm) to 10 ga
 * (3.510 mm) can be quoted. The 0.3 mm and 4.0 mm rows are outside the published table and are marked from memory.
 */
final class DefaultCutChart {

    // ----- plasma ----------------------------------------------------------------------------------------------------

    /** Production speed as a fraction of the published maximum speed: 60-80 % (common practice, §9.2). */
    static final double PLASMA_PRODUCTION_FRACTION = 0.70;

    /** Plasma initial-height-sensing cycle per start, seconds: 1-3 s (from memory, §9.3). */
    static final double PLASMA_HEIGHT_SENSE_S = 1.5;

    private static final String PLASMAMAN = "speed [S:PLASMAMAN] 40 A max x 0.70 (common practice); starts from memory";
    private static final String PLASMA_RECALLED = "speed from memory x 0.70 (common practice); starts from memory";

    /**
     * Carbon steel, 40 A air plasma, MAXIMUM speeds in mm/min [S:PLASMAMAN] (§9.2: 1.0 mm 12.6, 1.5 mm 9.4, 2.0 mm 6.3,
     * 3.0 mm 4.0 m/min). Pierce delays 0-0.3 s on up to 3 mm (from memory, §9.3).
     * 0.3 mm: from memory, no faster than the 1.0 mm row (thin sheet is limited by distortion and table dynamics).
     * 4.0 mm: from memory, following the trend of the published rows; added so 10 ga galvanized is covered.
     */
    private static final List<BaseRow> PLASMA_STEEL_MAXIMUM = List.of(
            //          mm    mm/min   pierce s
            new BaseRow(0.3, 12_600, 0.1, PLASMA_RECALLED),
            new BaseRow(1.0, 12_600, 0.1, PLASMAMAN),
            new BaseRow(1.5, 9_400, 0.2, PLASMAMAN),
            new BaseRow(2.0, 6_300, 0.2, PLASMAMAN),
            new BaseRow(3.0, 4_000, 0.3, PLASMAMAN),
            new BaseRow(4.0, 2_800, 0.4, PLASMA_RECALLED));

    /**
     * Plasma speed of each material as a fraction of carbon steel (from memory; §9.4 notes galvanized often needs a
     * slightly slower speed). Pierce and sensing are taken as for steel.
     */
    private static final Map<MaterialType, Double> PLASMA_MATERIAL_FACTOR = Map.of(
            MaterialType.STEEL, 1.00,
            MaterialType.GALVANIZED, 0.90,
            MaterialType.STAINLESS, 0.80,
            MaterialType.ALUMINUM, 0.90);

    /** Plasma gantry rapid traverse, mm/min: 10-30 m/min (from memory, §9.3). */
    static final double PLASMA_RAPID_MM_PER_MIN = 20_000;

    // ----- fibre laser -----------------------------------------------------------------------------------------------

    /** Fibre laser: sensing is continuous while moving, no touch-off per start (from memory). */
    static final double LASER_HEIGHT_SENSE_S = 0.0;

    private static final String LASER_RECALLED =
            "speed from memory (2-6 kW, N2/air; below the 12 kW figures of [S:LASERART]); starts from memory";

    /**
     * Carbon steel, 2-6 kW fibre laser with nitrogen or air, production speeds in mm/min (from memory, §9.2:
     * 1 mm 15-35, 2 mm 8-15, 3 mm 4-8 m/min; [S:LASERART] gives 1 mm 30-50 and 3 mm 10-20 m/min at 12 kW, so these
     * are deliberately lower). Pierce 0.05-0.5 s on up to 3 mm (from memory, §9.3). 0.3 mm: no faster than 1.0 mm.
     */
    private static final List<BaseRow> LASER_STEEL = List.of(
            //          mm    mm/min   pierce s
            new BaseRow(0.3, 25_000, 0.05, LASER_RECALLED),
            new BaseRow(1.0, 25_000, 0.1, LASER_RECALLED),
            new BaseRow(2.0, 11_000, 0.2, LASER_RECALLED),
            new BaseRow(3.0, 6_000, 0.4, LASER_RECALLED),
            new BaseRow(4.0, 4_000, 0.6, LASER_RECALLED));

    /** Laser speed of each material as a fraction of carbon steel (from memory). */
    private static final Map<MaterialType, Double> LASER_MATERIAL_FACTOR = Map.of(
            MaterialType.STEEL, 1.00,
            MaterialType.GALVANIZED, 0.95,
            MaterialType.STAINLESS, 0.90,
            MaterialType.ALUMINUM, 0.80);

    /** Laser rapid traverse, mm/min: 60-150 m/min (from memory, §9.3). */
    static final double LASER_RAPID_MM_PER_MIN = 100_000;

    // ----- handling --------------------------------------------------------------------------------------------------

    /** Manual sheet load and unload, minutes per sheet: 1-3 min (common practice, §9.5). */
    static final double LOAD_MINUTES_PER_SHEET = 2.0;

    static final CutChart CHART = build();

    private DefaultCutChart() {
    }

    private static CutChart build() {
        List<CutChartRow> rows = new ArrayList<>();
        for (MaterialType m : MaterialType.values()) {
            double plasmaFactor = PLASMA_MATERIAL_FACTOR.get(m);
            for (BaseRow b : PLASMA_STEEL_MAXIMUM) {
                rows.add(new CutChartRow(CuttingProcess.PLASMA, m, b.thicknessMm(),
                        b.speedMmPerMin() * PLASMA_PRODUCTION_FRACTION * plasmaFactor, b.pierceSeconds(),
                        PLASMA_HEIGHT_SENSE_S, withFactor(b.source(), m, plasmaFactor)));
            }
            double laserFactor = LASER_MATERIAL_FACTOR.get(m);
            for (BaseRow b : LASER_STEEL) {
                rows.add(new CutChartRow(CuttingProcess.LASER, m, b.thicknessMm(),
                        b.speedMmPerMin() * laserFactor, b.pierceSeconds(), LASER_HEIGHT_SENSE_S,
                        withFactor(b.source(), m, laserFactor)));
            }
        }
        Map<CuttingProcess, ProcessSettings> settings = new EnumMap<>(CuttingProcess.class);
        settings.put(CuttingProcess.PLASMA, new ProcessSettings(CuttingProcess.PLASMA, PLASMA_RAPID_MM_PER_MIN,
                "from memory", LOAD_MINUTES_PER_SHEET, "common practice"));
        settings.put(CuttingProcess.LASER, new ProcessSettings(CuttingProcess.LASER, LASER_RAPID_MM_PER_MIN,
                "from memory", LOAD_MINUTES_PER_SHEET, "common practice"));
        return new CutChart(rows, settings);
    }

    private static String withFactor(String source, MaterialType m, double factor) {
        return m == MaterialType.STEEL ? source
                : source + "; x " + String.format(java.util.Locale.ROOT, "%.2f", factor) + " for " + m.word()
                        + " (from memory)";
    }

    /** A carbon-steel row before material factors: thickness, speed, pierce delay and the speed's source. */
    private record BaseRow(double thicknessMm, double speedMmPerMin, double pierceSeconds, String source) {
    }
}
