package dev.sheetwright.nest.place;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalInt;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.testing.Shapes;

/** Behaviour of the nester on small hand-made jobs. Gap/margin values are test choices (common practice sizes). */
class NesterTest {
    private static final double EPS = 1e-9;
    private static final NestRules TOUCH = NestRules.touching(RotationRule.none());

    private static NestResult nestChecked(NestRequest req, NestOptions opt) {
        NestResult r = Nester.nest(req, opt);
        assertEquals(List.of(), NestChecker.check(req, r));
        assertEquals(req.totalCopies(), r.placedCount() + r.unplaced().size());
        return r;
    }

    @Test
    void nest_smallPartFitsOnlyInsideRingHole_usesOneSheet() {
        // sheet 13 x 13 holds the 12 x 12 frame; the 5 x 5 plate can only go into the 6 x 6 hole
        Sheet sheet = new Sheet("s", 13, 13, OptionalInt.empty(), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("duct", "flange-ring", 1, Shapes.frame(12, 6)),
                NestPiece.of("duct", "blank", 1, Shapes.rect(0, 0, 5, 5))), List.of(sheet),
                new NestRules(0.25, 0, RotationRule.quarter(), false, 0.01));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(1, r.sheets().size());
        assertEquals(2, r.sheets().get(0).parts().size());
        Placement blank = r.sheets().get(0).parts().stream().filter(p -> p.piece().equals("blank")).findFirst().orElseThrow();
        Polygon placed = blank.apply(Shapes.rect(0, 0, 5, 5));
        assertTrue(Shapes.rect(3, 3, 9, 9).covers(placed), placed.toString());
    }

    @Test
    void nest_combsMustInterlock_fitOnOneSheet() {
        // two combs with 3 teeth 2 wide, gaps 2 wide, 4 deep: side by side they need 2 x 10 = 20 wide; interlocked
        // (one turned 180 deg) they take a 10 x 8 box after shifting one tooth over
        Polygon comb = Shapes.wkt("POLYGON ((0 0, 10 0, 10 8, 8 8, 8 4, 6 4, 6 8, 4 8, 4 4, 2 4, 2 8, 0 8, 0 0))");
        Sheet sheet = new Sheet("s", 12, 12, OptionalInt.of(1), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("x", "comb", 2, comb)), List.of(sheet),
                NestRules.touching(RotationRule.angles(0, 180)));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(List.of(), r.unplaced());
        assertEquals(1, r.sheets().size());
    }

    @Test
    void nest_pieceLargerThanEveryStock_unplacedWithReason() {
        Sheet sheet = new Sheet("48x120", 120, 48, OptionalInt.empty(), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("plenum", "wrap", 1, Shapes.rect(0, 0, 130.2, 40)),
                NestPiece.of("plenum", "cap", 1, Shapes.rect(0, 0, 10, 10))), List.of(sheet),
                new NestRules(0, 0, RotationRule.none(), false, 0));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(1, r.unplaced().size());
        assertEquals("larger than every stock (needs 130.2 x 40 with margin; largest sheet 120 x 48)", r.unplaced().get(0).reason());
        assertEquals(1, r.placedCount());
    }

    @Test
    void nest_longPieceTooLargeUnderFreeRotation_reportsItsOwnExtentNotATurnedBox() {
        // 189 x 60 turned 45 degrees has a box of about 176 x 176; the reason must give the piece's own size
        Sheet sheet = new Sheet("60x120", 120, 60, OptionalInt.empty(), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("plenum", "wrap", 1, Shapes.rect(0, 0, 189, 60))),
                List.of(sheet), new NestRules(0, 0, RotationRule.free(), false, 0));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(1, r.unplaced().size());
        assertEquals("larger than every stock (needs 189 x 60 with margin; largest sheet 120 x 60)",
                r.unplaced().get(0).reason());
    }

    @Test
    void nest_sheetLimitReached_restUnplaced() {
        Sheet sheet = new Sheet("s", 10, 10, OptionalInt.of(2), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("f", "p", 3, Shapes.rect(0, 0, 8, 8))), List.of(sheet), TOUCH);
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(2, r.sheets().size());
        assertEquals(1, r.unplaced().size());
        assertTrue(r.unplaced().get(0).reason().startsWith("no room left"), r.unplaced().get(0).reason());
    }

    @Test
    void nest_remnantGiven_usedBeforeSheets() {
        Polygon lShape = Shapes.wkt("POLYGON ((0 0, 30 0, 30 10, 10 10, 10 30, 0 30, 0 0))");
        NestRequest req = new NestRequest(List.of(NestPiece.of("f", "p", 2, Shapes.rect(0, 0, 8, 8))),
                List.of(Sheet.unlimited("big", 100, 100, 50), new Remnant("R7", lShape, 0)),
                new NestRules(0.5, 0.5, RotationRule.quarter(), false, 0));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertEquals(1, r.sheets().size());
        assertEquals("R7", r.sheets().get(0).stock().label());
    }

    @Test
    void nest_coil_lengthIsLastPartPlusMargin() {
        NestRequest req = new NestRequest(List.of(NestPiece.of("f", "p", 4, Shapes.rect(0, 0, 10, 4))),
                List.of(new Coil("c", 10, 2)), new NestRules(0, 1, RotationRule.none(), false, 0));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        // coil 10 wide, margin 1 leaves 8: two 4-high strips side by side, two deep: 1 + 10 + 10 + 1
        SheetLayout l = r.sheets().get(0);
        assertEquals(22, l.usedLength(), EPS);
        assertEquals(160 / 220.0, l.utilization(), EPS);
    }

    @Test
    void nest_lastSheetCompacted_offcutReported() {
        Sheet sheet = new Sheet("s", 120, 48, OptionalInt.empty(), 1);
        NestRequest req = new NestRequest(List.of(NestPiece.of("f", "p", 4, Shapes.rect(0, 0, 20, 20))), List.of(sheet),
                new NestRules(0.5, 0.5, RotationRule.none(), false, 0));
        NestResult r = nestChecked(req, NestOptions.constructiveOnly());
        assertNotNull(r.sheets().get(0).offcut());
        // 2 x 2 squares: x from 0.5 to 41 (plus the spacing safety, 1 % of the gap, between the two columns);
        // offcut from there + gap 0.5 to 120, full height
        double spacing = 0.5 * (1 + Problem.GAP_SAFETY);
        double start = 0.5 + 20 + spacing + 20 + 0.5;
        assertEquals(start, r.sheets().get(0).offcut().x(), 1e-9);
        assertEquals((120 - start) * 48, r.sheets().get(0).offcut().area(), 1e-6);
    }

    @Test
    void nest_sameSeedAndIterations_sameResult() {
        Polygon comb = Shapes.wkt("POLYGON ((0 0, 10 0, 10 8, 8 8, 8 4, 6 4, 6 8, 4 8, 4 4, 2 4, 2 8, 0 8, 0 0))");
        NestRequest req = new NestRequest(List.of(NestPiece.of("x", "comb", 3, comb), NestPiece.of("x", "tri", 4,
                Shapes.wkt("POLYGON ((0 0, 7 0, 0 5, 0 0))")), NestPiece.of("x", "sq", 3, Shapes.rect(0, 0, 3, 3))),
                List.of(new Coil("c", 20, 1)), NestRules.touching(RotationRule.quarter()));
        NestResult a = nestChecked(req, NestOptions.steps(40, 7, 2));
        NestResult b = nestChecked(req, NestOptions.steps(40, 7, 2));
        assertEquals(a, b);
    }

    @Test
    void nest_noTimeAtAll_everyCopyPlacedFeasibly() {
        // a zero budget: the constructive pass places everything without new no-fit polygons (box ones instead)
        NestRequest req = dev.sheetwright.nest.bench.SheetBenchmark.job(40, 3);
        NestResult r = nestChecked(req, NestOptions.timed(java.time.Duration.ZERO, 1, 2));
        assertEquals(req.totalCopies(), r.placedCount());
    }

    @Test
    void nest_shortTimeOnCurvedJob_everyCopyPlacedFeasibly() {
        // a time limit far below what the constructive pass needs still yields a complete, checked nest; how long
        // it takes is measured by bench/run-job-benchmark.sh, not here
        NestRequest req = dev.sheetwright.nest.bench.SheetBenchmark.job(80, 5);
        NestResult r = nestChecked(req, NestOptions.timed(java.time.Duration.ofMillis(500), 1, 2));
        assertEquals(req.totalCopies(), r.placedCount());
    }

    @Test
    void nest_freeRotation_placedAtQuarterTurns() {
        Polygon l = Shapes.wkt("POLYGON ((0 0, 10 0, 10 2, 2 2, 2 6, 0 6, 0 0))");
        NestRequest req = new NestRequest(List.of(NestPiece.of("a", "l", 5, l), NestPiece.of("b", "l", 5, l)),
                List.of(new Sheet("s", 40, 20, OptionalInt.empty(), 1)), new NestRules(0.25, 0.5, RotationRule.free(), false, 0.01));
        NestResult r = nestChecked(req, NestOptions.steps(20, 3, 2));
        for (SheetLayout s : r.sheets()) {
            for (Placement p : s.parts()) {
                assertEquals(0, p.rotationDeg() % 90, 1e-9);
            }
        }
    }

    @Test
    void nest_nullRequest_rejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Nester.nest(null, NestOptions.constructiveOnly()));
        assertEquals("request must not be null", e.getMessage());
    }

    @Test
    void nest_fixedSteps_sameNestWhateverTheThreadCount() {
        NestRequest req = dev.sheetwright.nest.bench.SheetBenchmark.job(30, 4);
        NestResult one = nestChecked(req, NestOptions.steps(30, 11, 1));
        NestResult two = nestChecked(req, NestOptions.steps(30, 11, 2));
        NestResult three = nestChecked(req, NestOptions.steps(30, 11, 3));
        assertEquals(one, two);
        assertEquals(one, three);
    }

    @Test
    void placeOnShelves_afterHalfPlacedExactly_restBeyondWithGapKept() {
        // the first half by no-fit polygons, the rest on shelves after them (what a run out of time does)
        NestRequest req = dev.sheetwright.nest.bench.SheetBenchmark.job(60, 2);
        Nester nester = new Nester(req, NestOptions.constructiveOnly());
        int n = req.totalCopies();
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Layouter lay = new Layouter(nester.pb);
        lay.run(java.util.Arrays.copyOf(order, n / 2), 0);
        lay.placeOnShelves(order, n / 2);
        NestResult r = nester.toResult(lay.snapshot(lay.score()));
        assertEquals(List.of(), NestChecker.check(req, r));
        assertEquals(n, r.placedCount());
    }

    @Test
    void placeOnShelves_coil_everyCopyAfterTheFrontier() {
        NestRequest req = new NestRequest(List.of(NestPiece.of("x", "tri", 7, Shapes.wkt("POLYGON ((0 0, 7 0, 0 5, 0 0))")),
                NestPiece.of("x", "sq", 9, Shapes.rect(0, 0, 3, 3))), List.of(new Coil("c", 10, 1)),
                new NestRules(0.25, 0.5, RotationRule.quarter(), false, 0.01));
        Nester nester = new Nester(req, NestOptions.constructiveOnly());
        int[] order = new int[req.totalCopies()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Layouter lay = new Layouter(nester.pb);
        lay.run(java.util.Arrays.copyOf(order, 5), 0);
        lay.placeOnShelves(order, 5);
        NestResult r = nester.toResult(lay.snapshot(lay.score()));
        assertEquals(List.of(), NestChecker.check(req, r));
        assertEquals(order.length, r.placedCount());
        assertEquals(1, r.sheets().size());
    }
}
