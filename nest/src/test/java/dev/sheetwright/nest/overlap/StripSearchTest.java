package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import dev.sheetwright.nest.bench.StripInstance;
import dev.sheetwright.nest.bench.StripPacker;
import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.testing.Shapes;

class StripSearchTest {
    /** An invented strip: L-shapes, triangles and bars, any angle allowed. */
    private static StripInstance mixed(List<Double> rotations) {
        List<StripInstance.Item> items = new ArrayList<>();
        items.add(new StripInstance.Item(1, 4, Shapes.wkt("POLYGON ((0 0, 6 0, 6 2, 2 2, 2 5, 0 5, 0 0))")));
        items.add(new StripInstance.Item(2, 5, Shapes.wkt("POLYGON ((0 0, 5 0, 1 4, 0 0))")));
        items.add(new StripInstance.Item(3, 3, Shapes.rect(0, 0, 7, 1.5)));
        return new StripInstance("mixed", 10, rotations, items);
    }

    @Test
    void aCountedRunGivesTheSameLayoutOnOneAndOnTwoThreads() {
        StripInstance inst = mixed(List.of(0.0, 90.0, 180.0, 270.0));
        StripPacker.StripResult one = StripPacker.packWithOverlapSearch(inst, NestOptions.steps(600, 11, 1));
        StripPacker.StripResult two = StripPacker.packWithOverlapSearch(inst, NestOptions.steps(600, 11, 2));
        assertEquals(one.placements(), two.placements());
        assertEquals(one.length(), two.length());
        assertTrue(NestChecker.check(inst.toRequest(), one.nest()).isEmpty());
    }

    @Test
    void anyAngleLayoutsPassTheChecker() {
        StripInstance inst = mixed(null);
        assertTrue(inst.rotationRule() instanceof RotationRule.Free);
        StripPacker.StripResult r = StripPacker.packWithOverlapSearch(inst, NestOptions.steps(800, 5, 2));
        assertEquals(inst.pieceCount(), r.placements().size());
        assertTrue(NestChecker.check(inst.toRequest(), r.nest()).isEmpty(), "checker: " + NestChecker.check(inst.toRequest(), r.nest()));
        StripPacker.StripResult first = StripPacker.pack(inst, NestOptions.constructiveOnly());
        assertTrue(r.length() <= first.length() + 1e-9, "never longer than the first layout");
    }

    @Test
    void posesAtAnyAngleBecomePlacementsTheCheckerAccepts() {
        StripInstance inst = mixed(null);
        var request = inst.toRequest();
        var start = dev.sheetwright.nest.place.Nester.nest(request, NestOptions.constructiveOnly());
        StripSearch search = StripSearch.over(request, start);
        int n = search.pieceCount();
        double[][] poses = new double[n][];
        for (int i = 0; i < n; i++) {
            // one piece every 10 units along the strip, mid-height, each turned by an odd angle
            poses[i] = new double[] {0, 6 + 10 * i, 5, 17.5 * i + 3.25};
        }
        var result = search.toResult(poses);
        assertTrue(NestChecker.check(request, result).isEmpty(), "checker: " + NestChecker.check(request, result));
        List<Placement> parts = result.sheets().get(0).parts();
        for (int i = 0; i < n; i++) {
            double expected = dev.sheetwright.nest.model.RotationRule.normalize(17.5 * i + 3.25);
            assertEquals(expected, parts.get(i).rotationDeg(), 1e-12, "the placement carries the real angle");
        }
    }

    @Test
    void aLooseLayoutIsShortenedAndStillPassesTheChecker() {
        // eight 2 x 2 squares one after another along a strip 4 high: 16 long; two rows of four fit in 8
        List<StripInstance.Item> items = List.of(new StripInstance.Item(1, 8, Shapes.rect(0, 0, 2, 2)));
        StripInstance inst = new StripInstance("squares", 4, List.of(0.0), items);
        var request = inst.toRequest();
        List<Placement> spread = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            spread.add(new Placement("squares", StripInstance.pieceName(1), i, 2 * i, 0, 0, false));
        }
        var coil = request.stock().get(0);
        var start = new dev.sheetwright.nest.model.NestResult(List.of(new dev.sheetwright.nest.model.SheetLayout(coil, 0, 16,
                spread, null, 0.5)), List.of());
        assertTrue(NestChecker.check(request, start).isEmpty());
        var shorter = StripSearch.shorten(request, start, NestOptions.steps(4000, 1, 2), Long.MAX_VALUE / 4);
        double length = shorter.sheets().get(0).usedLength();
        assertTrue(length < 12, "the search must shorten the strip well below 16, got " + length);
        assertTrue(length >= 8 - 1e-9, "no layout is shorter than the area bound 8, got " + length);
        assertTrue(NestChecker.check(request, shorter).isEmpty(), "checker: " + NestChecker.check(request, shorter));
    }

    @Test
    void resultsPlaceEveryCopyOnce() {
        StripInstance inst = mixed(List.of(0.0, 180.0));
        StripPacker.StripResult r = StripPacker.packWithOverlapSearch(inst, NestOptions.steps(400, 3, 2));
        List<String> seen = new ArrayList<>();
        for (Placement p : r.placements()) {
            String key = p.label() + "#" + p.copy();
            assertTrue(!seen.contains(key), key + " twice");
            seen.add(key);
        }
        assertEquals(inst.pieceCount(), seen.size());
    }
}
