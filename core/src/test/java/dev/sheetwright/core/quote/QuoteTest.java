package dev.sheetwright.core.quote;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CutChartRow;
import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.PipeSpec;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import dev.sheetwright.core.cutpath.CutPathSettings;
import dev.sheetwright.core.cutpath.CutPlanner;
import dev.sheetwright.core.cutpath.KerfCompensation;
import dev.sheetwright.core.geom.Box2;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class QuoteTest {

    private static final double EPS = 1e-9;

    private static Pattern square(String id, double x, double y, double side) {
        Contour c = Contour.polygon(List.of(new Point2(x, y), new Point2(x + side, y), new Point2(x + side, y + side),
                new Point2(x, y + side)), Tolerance.INCH);
        return new Pattern(id, "blank", 1, c, List.of(), List.of(), new Point2(x + side / 2, y + side / 2));
    }

    /** The figures of a real plan of the parts: no leads, no compensation, so the loops are the contours. */
    private static CutFigures plainCut(List<Pattern> parts) {
        List<String> labels = parts.stream().map(Pattern::key).toList();
        return CutFigures.of(CutPlanner.plan(parts, labels, new Box2(0, 0, 120, 48),
                new CutPathSettings(0.06, 0, 0, KerfCompensation.NONE), Tolerance.INCH));
    }

    private static QuoteRequest oneSheet(Material material, QuoteTerms terms, ShopSettings shop, double sheetCost) {
        List<Pattern> parts = List.of(square("A", 1, 1, 24));
        StockUse sheet = StockUse.sheet("48x120", 120, 48, sheetCost, parts, plainCut(parts));
        return new QuoteRequest(LengthUnit.INCH, material, CuttingProcess.PLASMA, CutChart.defaults(), terms, shop,
                List.of(sheet), List.of(), List.of());
    }

    @Test
    void of_one48x120Sheet24gaGalvanized_weighs46point24lb() {
        // 40 ft2 x 1.156 lb/ft2 = 46.24 lb [S:LONG p.102] [S:SMACNA-GALV]; trade-reference §8.3 check (computed)
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), QuoteTerms.NONE, ShopSettings.NONE,
                62.50));

        assertEquals(46.24, q.totals().stockWeight(), 1e-9);
        assertEquals(40.0, q.totals().stockArea(), EPS);
        assertEquals("lb", q.weightUnit().symbol());
        assertEquals("ft2", q.areaUnit());
        assertEquals(1, q.stock().size());
        assertEquals(1, q.stock().get(0).count());
        assertEquals(62.50, q.totals().materialCost(), EPS);
        assertEquals("by piece (job stock list)", q.stock().get(0).costBasis());
    }

    @Test
    void of_26gaGalvanizedSheet_uses0point906lbPerFt2() {
        // 26 ga galvanized 0.906 lb/ft2 [S:SMACNA-GALV]: 40 ft2 -> 36.24 lb (computed)
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 26), QuoteTerms.NONE, ShopSettings.NONE,
                0));
        assertEquals(36.24, q.totals().stockWeight(), 1e-9);
        assertEquals(0.906, q.rate("weightPerArea").orElseThrow().value(), EPS);
    }

    @Test
    void of_10gaUncoatedSteelSheet_uses5point625lbPerFt2() {
        // MSG 10 ga = 0.1345 in = 5.625 lb/ft2 [S:MSG-OFF]; the table computes 41.82 x 0.1345 = 5.62479 [S:MSG-ROOF],
        // so 40 ft2 weighs 225.0 lb to the table's 3 decimals (within 40 x 0.0005 lb)
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.STEEL, 10), QuoteTerms.NONE, ShopSettings.NONE, 0));
        assertEquals(225.0, q.totals().stockWeight(), 40 * 0.0005);
        assertEquals(5.625, q.rate("weightPerArea").orElseThrow().value(), 0.0005);
    }

    @Test
    void of_pricePerLbFromJob_pricesStockByWeight() {
        // $8.75 per 100 lb on 24 ga gives $0.10115 per ft2 [S:LONG p.102, problem 25A] (computed): 40 ft2 -> $4.046
        QuoteTerms terms = new QuoteTerms(Optional.of("USD"), Optional.of(new WeightPrice(0.0875, MassUnit.LB,
                Sourced.JOB)), OptionalDouble.empty());
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), terms, ShopSettings.NONE, 62.50));
        assertEquals(40 * 0.10115, q.totals().materialCost(), 1e-9);
        assertEquals(Optional.of("USD"), q.currency());
        assertEquals("by weight (job)", q.stock().get(0).costBasis());
    }

    @Test
    void of_pricePerKgInAnInchJob_convertsByTheExactPound() {
        // 1 lb = 0.45359237 kg exactly: 2.00 per kg = 0.90718474 per lb
        QuoteTerms terms = new QuoteTerms(Optional.of("EUR"), Optional.of(new WeightPrice(2.00, MassUnit.KG,
                Sourced.JOB)), OptionalDouble.empty());
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), terms, ShopSettings.NONE, 0));
        assertEquals(46.24 * 2.00 * 0.45359237, q.totals().materialCost(), 1e-9);
    }

    @Test
    void of_workedCutTimeExample_is7point20MinutesPlusLoading() {
        // trade-reference §9.5 and §11 C12 (computed): 1200 in of cut at 200 in/min, 20 pierces x (0.3 s + 1.5 s),
        // 600 in of rapids at 1000 in/min -> 6.00 + 0.60 + 0.60 = 7.20 min, plus loading (2 min, common practice)
        // 20 squares of 15 in (60 in of cut each) on a coil; the program's figures are given as the example's
        List<Pattern> parts = new ArrayList<>();
        for (int k = 1; k <= 20; k++) {
            parts.add(square("S" + k, 30 * k, 0, 15));
        }
        Material galv24 = Material.ofGauge(MaterialType.GALVANIZED, 24);
        CutChartRow machine = new CutChartRow(CuttingProcess.PLASMA, MaterialType.GALVANIZED, galv24.thicknessMm(),
                200 * 25.4, 0.3, 1.5, CutChart.SHOP);
        ShopSettings shop = new ShopSettings(List.of(machine), Map.of(CuttingProcess.PLASMA, 1000 * 25.4),
                OptionalDouble.of(2.0), OptionalDouble.of(90), Optional.empty(), Optional.of("USD"));
        QuoteRequest r = new QuoteRequest(LengthUnit.INCH, galv24, CuttingProcess.PLASMA, CutChart.defaults(),
                QuoteTerms.NONE, shop, List.of(StockUse.coil("coil 48", 48, 630, 0, parts,
                        new CutFigures(1200, 0, 20, 600))), List.of(), List.of());

        Quote q = Quote.of(r);

        assertEquals(1200, q.totals().cutLength(), 1e-9);
        assertEquals(20, q.totals().pierces());
        assertEquals(600, q.totals().rapidLength(), 1e-9);
        var t = q.cutTime().orElseThrow();
        assertEquals(6.00, t.cuttingMinutes(), 1e-9);
        assertEquals(0.60, t.piercingMinutes(), 1e-9);
        assertEquals(0.60, t.rapidMinutes(), 1e-9);
        assertEquals(7.20, t.cuttingMinutes() + t.piercingMinutes() + t.rapidMinutes(), 1e-9);
        assertEquals(9.20, q.totals().cutMinutes().getAsDouble(), 1e-9);
        assertEquals(9.20 / 60 * 90, q.totals().machineCost().getAsDouble(), 1e-9);
        assertEquals("shop", q.rate("cutSpeed").orElseThrow().source());
        assertEquals("shop", q.rate("machineRate").orElseThrow().source());
        assertTrue(q.warnings().stream().noneMatch(w -> w.contains("interpolated")), q.warnings()::toString);
    }

    @Test
    void of_cutFigures_comeFromEachSheetsPlanAndAddUp() {
        Material galv24 = Material.ofGauge(MaterialType.GALVANIZED, 24);
        StockUse a = StockUse.sheet("48x120", 120, 48, 0, List.of(), new CutFigures(100, 2.5, 10, 300));
        StockUse b = StockUse.sheet("48x120", 120, 48, 0, List.of(), new CutFigures(40, 0.5, 3, 70));
        Quote q = Quote.of(new QuoteRequest(LengthUnit.INCH, galv24, CuttingProcess.PLASMA, CutChart.defaults(),
                QuoteTerms.NONE, ShopSettings.NONE, List.of(a, b), List.of(), List.of()));
        assertEquals(140, q.totals().contourLength(), EPS);
        assertEquals(3.0, q.totals().leadInLength(), EPS);
        assertEquals(143, q.totals().cutLength(), EPS);
        assertEquals(13, q.totals().pierces());
        assertEquals(370, q.totals().rapidLength(), EPS);
    }

    @Test
    void of_oneSquareSheet_cutsItsPerimeterWithOnePierce() {
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), QuoteTerms.NONE, ShopSettings.NONE,
                0));
        assertEquals(96, q.totals().contourLength(), EPS);
        assertEquals(0, q.totals().leadInLength(), EPS);
        assertEquals(1, q.totals().pierces());
    }

    @Test
    void of_thicknessBetweenChartRows_interpolatesAndSaysSo() {
        // 24 ga galvanized, 0.701 mm [S:SMACNA-GALV], lies between the 0.3 mm and 1.0 mm rows of the default chart
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), QuoteTerms.NONE, ShopSettings.NONE,
                0));
        assertTrue(q.cutTime().isPresent());
        assertTrue(q.warnings().stream().anyMatch(w -> w.contains("interpolated between the 0.300 mm and 1.000 mm")),
                q.warnings()::toString);
        assertTrue(q.rate("cutSpeed").orElseThrow().source().contains("interpolated"));
    }

    @Test
    void of_thicknessOutsideTheChart_leavesCutTimeUnknownWithAWarning() {
        Material plate = Material.ofThickness(MaterialType.STEEL, 0.25); // 6.35 mm, the chart stops at 4.0 mm
        QuoteTerms terms = new QuoteTerms(Optional.of("USD"), Optional.empty(), OptionalDouble.of(120));
        Quote q = Quote.of(oneSheet(plate, terms, ShopSettings.NONE, 100));

        assertTrue(q.cutTime().isEmpty());
        assertTrue(q.totals().cutMinutes().isEmpty());
        assertTrue(q.totals().machineCost().isEmpty());
        assertTrue(q.totals().totalCost().isEmpty());
        assertEquals(100, q.totals().materialCost(), EPS);
        assertTrue(q.warnings().stream().anyMatch(w -> w.startsWith("cut time unknown") && w.contains("6.350")),
                q.warnings()::toString);
        assertTrue(q.rate("cutSpeed").isEmpty());
    }

    @Test
    void of_partsAndStock_scrapAndUtilizationAddUp() {
        Quote q = Quote.of(oneSheet(Material.ofGauge(MaterialType.GALVANIZED, 24), QuoteTerms.NONE, ShopSettings.NONE,
                0));
        var t = q.totals();
        assertEquals(576.0 / 144, t.partArea(), EPS);
        assertEquals(576.0 / 5760, t.utilization(), EPS);
        assertEquals(4 * 1.156, t.partWeight(), 1e-9);
        assertEquals(t.stockWeight() - t.partWeight(), t.scrapWeight(), EPS);
        assertTrue(q.warnings().stream().anyMatch(w -> w.contains("no price")), q.warnings()::toString);
    }

    @Test
    void of_millimetreJob_givesKilogramsAndSquareMetres() {
        // 24 ga galvanized 5.64 kg/m2 [S:SMACNA-GALV]; from 1.156 lb/ft2 x 4.88242764 = 5.6441 (computed)
        Material galv24 = Material.ofGauge(MaterialType.GALVANIZED, 24);
        StockUse sheet = StockUse.sheet("1250x2500", 2500, 1250, 0, List.of(), CutFigures.NONE);
        Quote q = Quote.of(new QuoteRequest(LengthUnit.MILLIMETRE, galv24, CuttingProcess.LASER, CutChart.defaults(),
                QuoteTerms.NONE, ShopSettings.NONE, List.of(sheet), List.of(), List.of()));
        assertEquals("kg", q.weightUnit().symbol());
        assertEquals("m2", q.areaUnit());
        assertEquals(3.125, q.totals().stockArea(), EPS);
        assertEquals(3.125 * 5.64, q.totals().stockWeight(), 3.125 * 0.005);
    }

    @Test
    void of_snapLockOn10ga_warnsOnceWithTheSource() {
        AllowanceTable table = AllowanceTable.in(LengthUnit.INCH);
        Allowances snap = new Allowances(table.parseSeam("snap-lock"), EndAllowance.NONE, EndAllowance.NONE, false);
        List<FittingSpec> fittings = List.of(new PipeSpec("P1", 1, 8, 24, 1, snap),
                new PipeSpec("P2", 2, 6, 24, 1, snap));
        QuoteRequest r = new QuoteRequest(LengthUnit.INCH, Material.ofGauge(MaterialType.GALVANIZED, 10),
                CuttingProcess.PLASMA, CutChart.defaults(), QuoteTerms.NONE, ShopSettings.NONE,
                List.of(StockUse.sheet("48x120", 120, 48, 0, List.of(), CutFigures.NONE)), fittings, List.of("dev warning", "dev warning"));

        Quote q = Quote.of(r);

        List<String> snapWarnings = q.warnings().stream().filter(w -> w.contains("snap-lock")).toList();
        assertEquals(1, snapWarnings.size(), q.warnings()::toString);
        assertTrue(snapWarnings.get(0).contains("P1, P2") && snapWarnings.get(0).contains("[S:MH p.1445]"));
        assertEquals(1, q.warnings().stream().filter("dev warning"::equals).count(), "each warning once");
        assertFalse(Quote.of(new QuoteRequest(LengthUnit.INCH, Material.ofGauge(MaterialType.GALVANIZED, 24),
                CuttingProcess.PLASMA, CutChart.defaults(), QuoteTerms.NONE, ShopSettings.NONE, r.stock(), fittings,
                List.of())).warnings().stream().anyMatch(w -> w.contains("snap-lock")), "24 ga is in range");
    }
}
