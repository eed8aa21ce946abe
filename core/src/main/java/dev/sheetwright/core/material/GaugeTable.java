package dev.sheetwright.core.material;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/**
 * One gauge series for one material family: the rows (gauge to nominal thickness and weight) and the weight basis in
 * lb/ft² per inch of thickness used for any thickness not given by gauge.
 *
 * <p>Each table's numbers are written once, in the factory method for that table below, with their sources
 * (tags from the trade reference, §8). Get a table with {@link #of(MaterialType)}.
 */
public record GaugeTable(MaterialType type, String system, double lbPerFt2PerIn, String basisSource,
                         List<GaugeRow> rows) {

    private static final GaugeTable GALVANIZED_TABLE = galvanized();
    private static final GaugeTable STEEL_TABLE = manufacturersStandardGauge();
    private static final GaugeTable STAINLESS_TABLE = usStandardStainless();
    private static final GaugeTable ALUMINUM_TABLE = brownAndSharpeAluminum();

    public GaugeTable {
        Objects.requireNonNull(type, "type");
        if (system == null || system.isBlank()) {
            throw new IllegalArgumentException("system must not be blank");
        }
        if (!(lbPerFt2PerIn > 0) || !Double.isFinite(lbPerFt2PerIn)) {
            throw new IllegalArgumentException("lbPerFt2PerIn must be finite and > 0, was " + lbPerFt2PerIn);
        }
        if (basisSource == null || basisSource.isBlank()) {
            throw new IllegalArgumentException("basisSource must not be blank");
        }
        List<GaugeRow> sorted = new ArrayList<>(rows);
        sorted.sort(Comparator.comparingInt(GaugeRow::gauge));
        for (int i = 1; i < sorted.size(); i++) {
            if (sorted.get(i).gauge() == sorted.get(i - 1).gauge()) {
                throw new IllegalArgumentException("gauge " + sorted.get(i).gauge() + " appears twice in the "
                        + type.word() + " gauge table");
            }
        }
        if (sorted.isEmpty()) {
            throw new IllegalArgumentException("rows must not be empty");
        }
        rows = List.copyOf(sorted);
    }

    /** The built-in table for a material family. */
    public static GaugeTable of(MaterialType type) {
        Objects.requireNonNull(type, "type");
        return switch (type) {
            case GALVANIZED -> GALVANIZED_TABLE;
            case STEEL -> STEEL_TABLE;
            case STAINLESS -> STAINLESS_TABLE;
            case ALUMINUM -> ALUMINUM_TABLE;
        };
    }

    /** The row for a gauge, if the table has it. */
    public Optional<GaugeRow> find(int gauge) {
        return rows.stream().filter(r -> r.gauge() == gauge).findFirst();
    }

    /**
     * The row for a gauge.
     *
     * @throws IllegalArgumentException naming the material, the gauge and the gauges the table has
     */
    public GaugeRow row(int gauge) {
        return find(gauge).orElseThrow(() -> new IllegalArgumentException(
                "gauge " + gauge + " is not in the " + type.word() + " gauge table (" + system
                        + "); valid gauges: " + gauges().stream().map(String::valueOf)
                        .collect(Collectors.joining(", "))));
    }

    /** The gauge numbers in the table, ascending. */
    public List<Integer> gauges() {
        return rows.stream().map(GaugeRow::gauge).toList();
    }

    /** Weight in lb/ft² of a sheet of the given thickness on this table's basis. */
    public double lbPerFt2Of(double thicknessIn) {
        return lbPerFt2PerIn * thicknessIn;
    }

    // ---------------------------------------------------------------------------------------------------------------
    // Table data. Each table's numbers appear here and nowhere else.
    // ---------------------------------------------------------------------------------------------------------------

    /**
     * Galvanized sheet gauge, ASTM A653 / A924 [S:SMACNA-GALV] via trade-reference §8.1.
     * Even gauges: nominal, minimum and maximum thickness and nominal weight as tabulated.
     * Odd gauges: nominal thickness [S:SMACNA-GALV]; weight = 41.82 × t (computed; matches [S:COATED]).
     * Weight basis 41.82 lb/ft² per inch [S:MSG-ROOF] [S:GAUGENOTE].
     */
    private static GaugeTable galvanized() {
        final double basis = 41.82;
        final String tabulated = "[S:SMACNA-GALV]";
        final String oddGauge = "[S:SMACNA-GALV] thickness; weight 41.82 x t (computed)";
        List<GaugeRow> rows = new ArrayList<>();
        //        gauge  nominal  min      max      lb/ft2
        rows.add(even(30, 0.0157, 0.0127, 0.0187, 0.656, tabulated));
        rows.add(even(28, 0.0187, 0.0157, 0.0217, 0.781, tabulated));
        rows.add(even(26, 0.0217, 0.0187, 0.0247, 0.906, tabulated));
        rows.add(even(24, 0.0276, 0.0236, 0.0316, 1.156, tabulated));
        rows.add(even(22, 0.0336, 0.0296, 0.0376, 1.406, tabulated));
        rows.add(even(20, 0.0396, 0.0356, 0.0436, 1.656, tabulated));
        rows.add(even(18, 0.0516, 0.0466, 0.0566, 2.156, tabulated));
        rows.add(even(16, 0.0635, 0.0575, 0.0695, 2.656, tabulated));
        rows.add(even(14, 0.0785, 0.0705, 0.0865, 3.281, tabulated));
        rows.add(even(12, 0.1084, 0.0994, 0.1174, 4.531, tabulated));
        rows.add(even(10, 0.1382, 0.1292, 0.1472, 5.781, tabulated));
        //             gauge  nominal
        rows.add(computed(29, 0.0172, basis, oddGauge));
        rows.add(computed(27, 0.0202, basis, oddGauge));
        rows.add(computed(25, 0.0247, basis, oddGauge));
        rows.add(computed(23, 0.0306, basis, oddGauge));
        rows.add(computed(21, 0.0366, basis, oddGauge));
        rows.add(computed(19, 0.0456, basis, oddGauge));
        rows.add(computed(17, 0.0575, basis, oddGauge));
        rows.add(computed(15, 0.0710, basis, oddGauge));
        rows.add(computed(13, 0.0934, basis, oddGauge));
        rows.add(computed(11, 0.1233, basis, oddGauge));
        return new GaugeTable(MaterialType.GALVANIZED, "galvanized sheet gauge", basis,
                "41.82 lb/ft2 per in x t (computed) [S:MSG-ROOF] [S:GAUGENOTE]", rows);
    }

    /**
     * Manufacturers' Standard Gauge for uncoated carbon steel. Weight basis 41.82 lb/ft² per inch, 10 ga = 0.1345 in
     * [S:MSG-OFF] [S:MSG-ROOF] via trade-reference §8.1. The other thicknesses are the standard MSG series, not in the
     * trade reference: from memory. Weights = 41.82 × t (computed).
     */
    private static GaugeTable manufacturersStandardGauge() {
        final double basis = 41.82;
        final String published = "[S:MSG-OFF] [S:MSG-ROOF]; weight 41.82 x t (computed)";
        final String recalled = "from memory (standard MSG series); weight 41.82 x t (computed)";
        List<GaugeRow> rows = new ArrayList<>();
        rows.add(computed(10, 0.1345, basis, published));
        rows.add(computed(11, 0.1196, basis, recalled));
        rows.add(computed(12, 0.1046, basis, recalled));
        rows.add(computed(13, 0.0897, basis, recalled));
        rows.add(computed(14, 0.0747, basis, recalled));
        rows.add(computed(15, 0.0673, basis, recalled));
        rows.add(computed(16, 0.0598, basis, recalled));
        rows.add(computed(17, 0.0538, basis, recalled));
        rows.add(computed(18, 0.0478, basis, recalled));
        rows.add(computed(19, 0.0418, basis, recalled));
        rows.add(computed(20, 0.0359, basis, recalled));
        rows.add(computed(21, 0.0329, basis, recalled));
        rows.add(computed(22, 0.0299, basis, recalled));
        rows.add(computed(23, 0.0269, basis, recalled));
        rows.add(computed(24, 0.0239, basis, recalled));
        rows.add(computed(25, 0.0209, basis, recalled));
        rows.add(computed(26, 0.0179, basis, recalled));
        rows.add(computed(27, 0.0164, basis, recalled));
        rows.add(computed(28, 0.0149, basis, recalled));
        rows.add(computed(29, 0.0135, basis, recalled));
        rows.add(computed(30, 0.0120, basis, recalled));
        return new GaugeTable(MaterialType.STEEL, "Manufacturers' Standard Gauge", basis,
                "41.82 lb/ft2 per in x t (computed) [S:MSG-ROOF]", rows);
    }

    /**
     * U.S. Standard gauge as used for stainless sheet [S:SSGA] [S:USC206] via trade-reference §8.2 (even gauges only).
     * Weight basis 41.6 lb/ft² per inch for 300-series stainless (chart basis [S:SSGA]); weights computed.
     */
    private static GaugeTable usStandardStainless() {
        final double basis = 41.6;
        final String source = "[S:SSGA] [S:USC206]; weight 41.6 x t (computed)";
        List<GaugeRow> rows = new ArrayList<>();
        rows.add(computed(30, 0.0125, basis, source));
        rows.add(computed(28, 0.0156, basis, source));
        rows.add(computed(26, 0.0187, basis, source));
        rows.add(computed(24, 0.0250, basis, source));
        rows.add(computed(22, 0.0312, basis, source));
        rows.add(computed(20, 0.0375, basis, source));
        rows.add(computed(18, 0.0500, basis, source));
        rows.add(computed(16, 0.0625, basis, source));
        rows.add(computed(14, 0.0781, basis, source));
        rows.add(computed(12, 0.1094, basis, source));
        rows.add(computed(10, 0.1406, basis, source));
        return new GaugeTable(MaterialType.STAINLESS, "U.S. Standard gauge", basis,
                "41.6 lb/ft2 per in x t (computed) [S:SSGA]", rows);
    }

    /**
     * Brown &amp; Sharpe (AWG) series for aluminium sheet [S:EICAC] [S:THELEN] via trade-reference §8.2 (even gauges
     * only). Weight basis 14.05 lb/ft² per inch from 2.70 g/cm³ (computed in trade-reference §8.2).
     */
    private static GaugeTable brownAndSharpeAluminum() {
        final double basis = 14.05;
        final String source = "[S:EICAC] [S:THELEN]; weight 14.05 x t (computed)";
        List<GaugeRow> rows = new ArrayList<>();
        rows.add(computed(30, 0.0100, basis, source));
        rows.add(computed(28, 0.0126, basis, source));
        rows.add(computed(26, 0.0159, basis, source));
        rows.add(computed(24, 0.0201, basis, source));
        rows.add(computed(22, 0.0253, basis, source));
        rows.add(computed(20, 0.0320, basis, source));
        rows.add(computed(18, 0.0403, basis, source));
        rows.add(computed(16, 0.0508, basis, source));
        rows.add(computed(14, 0.0641, basis, source));
        rows.add(computed(12, 0.0808, basis, source));
        rows.add(computed(10, 0.1019, basis, source));
        return new GaugeTable(MaterialType.ALUMINUM, "Brown & Sharpe gauge", basis,
                "14.05 lb/ft2 per in x t (computed from 2.70 g/cm3)", rows);
    }

    private static GaugeRow even(int gauge, double nominalIn, double minIn, double maxIn, double lbPerFt2,
                                 String source) {
        return new GaugeRow(gauge, nominalIn, OptionalDouble.of(minIn), OptionalDouble.of(maxIn), lbPerFt2, source);
    }

    private static GaugeRow computed(int gauge, double nominalIn, double basis, String source) {
        return new GaugeRow(gauge, nominalIn, OptionalDouble.empty(), OptionalDouble.empty(), basis * nominalIn,
                source);
    }
}
