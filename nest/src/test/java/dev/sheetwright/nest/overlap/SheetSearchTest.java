package dev.sheetwright.nest.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Stock;
import dev.sheetwright.nest.testing.Shapes;

class SheetSearchTest {
    /** An invented case: six 4 x 3 plates and two triangles on 12 x 10 sheets, gap 0.25, margin 0.5. */
    private static NestRequest request(RotationRule rotation, List<Stock> stock) {
        List<NestPiece> pieces = List.of(
                NestPiece.of("PL", "plate", 6, Shapes.rect(0, 0, 4, 3)),
                NestPiece.of("TR", "gusset", 2, Shapes.wkt("POLYGON ((0 0, 5 0, 0 4, 0 0))")));
        NestRules rules = new NestRules(0.25, 0.5, rotation, false, 0.01);
        return new NestRequest(pieces, stock, rules, NestPrecision.ofScale(NestPrecision.scaleOf(pieces, stock)));
    }

    private static final Sheet SHEET = Sheet.unlimited("12x10", 12, 10, 20);

    /** {@code pieces} on 12 x 10 sheets, gap 0.25, margin 0.5, quarter turns. */
    private static NestRequest onSheets(List<NestPiece> pieces) {
        List<Stock> stock = List.of(SHEET);
        return new NestRequest(pieces, stock, new NestRules(0.25, 0.5, RotationRule.quarter(), false, 0.01),
                NestPrecision.ofScale(NestPrecision.scaleOf(pieces, stock)));
    }

    /** A feasible but wasteful first layout: the eight parts spread over four sheets, two on each. */
    private static NestResult wasteful(List<Stock> extraFirst) {
        List<SheetLayout> layouts = new ArrayList<>();
        for (Stock s : extraFirst) {
            layouts.add(new SheetLayout(s, layouts.size(), 0, List.of(), null, 0));
        }
        String[][] order = {{"PL", "plate", "1"}, {"PL", "plate", "2"}, {"PL", "plate", "3"}, {"PL", "plate", "4"},
            {"PL", "plate", "5"}, {"PL", "plate", "6"}, {"TR", "gusset", "1"}, {"TR", "gusset", "2"}};
        for (int s = 0; s < 4; s++) {
            List<Placement> parts = new ArrayList<>();
            for (int k = 0; k < 2; k++) {
                String[] o = order[2 * s + k];
                parts.add(new Placement(o[0], o[1], Integer.parseInt(o[2]) - 1, 0.5 + 5.5 * k, 0.5, 0, false));
            }
            layouts.add(new SheetLayout(SHEET, layouts.size(), 11.5, parts, null, 0.2));
        }
        return new NestResult(layouts, List.of());
    }

    /** A start of {@code layouts} with nothing unplaced, which the checker must pass. */
    private static NestResult feasibleStart(NestRequest req, SheetLayout... layouts) {
        NestResult start = new NestResult(List.of(layouts), List.of());
        assertTrue(NestChecker.check(req, start).isEmpty(), "feasible start: " + NestChecker.check(req, start));
        return start;
    }

    private static long sheetsOf(NestResult r) {
        return r.sheets().stream().filter(l -> l.stock() instanceof Sheet).count();
    }

    @Test
    void emptiesSheetsOfAWastefulLayoutAndPassesTheChecker() {
        NestRequest req = request(RotationRule.quarter(), List.of(SHEET));
        NestResult start = wasteful(List.of());
        assertTrue(NestChecker.check(req, start).isEmpty(), "the constructed start is feasible: " + NestChecker.check(req, start));
        NestResult r = SheetSearch.eliminate(req, start, NestOptions.steps(4000, 3, 2), Long.MAX_VALUE);
        assertTrue(sheetsOf(r) <= 2, "eight small parts fit on two 12 x 10 sheets, got " + sheetsOf(r));
        assertEquals(8, r.placedCount());
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
        for (int i = 0; i < r.sheets().size(); i++) {
            assertEquals(i, r.sheets().get(i).index());
        }
    }

    @Test
    void aCountedRunGivesTheSameNestOnOneAndOnTwoThreads() {
        NestRequest req = request(RotationRule.free(), List.of(SHEET));
        NestResult one = SheetSearch.eliminate(req, wasteful(List.of()), NestOptions.steps(3000, 7, 1), Long.MAX_VALUE);
        NestResult two = SheetSearch.eliminate(req, wasteful(List.of()), NestOptions.steps(3000, 7, 2), Long.MAX_VALUE);
        assertEquals(one, two);
        assertTrue(sheetsOf(one) < 4);
        assertTrue(NestChecker.check(req, one).isEmpty(), "checker: " + NestChecker.check(req, one));
    }

    @Test
    void remnantLayoutsStayAsTheyWereAndNoSheetIsAdded() {
        Remnant rem = new Remnant("R1", Shapes.rect(0, 0, 6, 5), 0);
        NestRequest req = request(RotationRule.quarter(), List.of(rem, SHEET));
        NestResult start = wasteful(List.of(rem));
        NestResult r = SheetSearch.eliminate(req, start, NestOptions.steps(4000, 5, 1), Long.MAX_VALUE);
        assertEquals(rem, r.sheets().get(0).stock());
        assertEquals(start.sheets().get(0).parts(), r.sheets().get(0).parts());
        assertTrue(sheetsOf(r) < 4);
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
    }

    @Test
    void aStepRuleGivesExactlyItsMultiples() {
        NestRequest req = request(RotationRule.step(30), List.of(SHEET));
        NestResult r = SheetSearch.eliminate(req, wasteful(List.of()), NestOptions.steps(3000, 9, 2), Long.MAX_VALUE);
        assertTrue(sheetsOf(r) < 4);
        for (SheetLayout l : r.sheets()) {
            for (Placement p : l.parts()) {
                double k = p.rotationDeg() / 30;
                assertEquals(Math.rint(k), k, 1e-9, "angle " + p.rotationDeg() + " is a multiple of 30");
                assertTrue(!p.mirrored(), "mirror is not allowed");
            }
        }
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
    }

    @Test
    void aPartHoldingAnotherInItsHoleStaysWithItsGuest() {
        List<NestPiece> pieces = List.of(
                NestPiece.of("PL", "plate", 4, Shapes.rect(0, 0, 4, 3)),
                NestPiece.of("FR", "frame", 1, Shapes.frame(6, 4)),
                NestPiece.of("PG", "plug", 1, Shapes.rect(0, 0, 2, 2)));
        NestRequest req = onSheets(pieces);
        Placement frame = new Placement("FR", "frame", 0, 0.5, 0.5, 0, false);
        Placement plug = new Placement("PG", "plug", 0, 2.5, 2.5, 0, false);
        List<SheetLayout> layouts = new ArrayList<>();
        layouts.add(new SheetLayout(SHEET, 0, 11.5, List.of(frame, plug,
                new Placement("PL", "plate", 0, 7, 0.5, 0, false)), null, 0.3));
        for (int s = 1; s < 4; s++) {
            layouts.add(new SheetLayout(SHEET, s, 4.5, List.of(new Placement("PL", "plate", s, 0.5, 0.5, 0, false)),
                    null, 0.1));
        }
        NestResult start = new NestResult(layouts, List.of());
        assertTrue(NestChecker.check(req, start).isEmpty(), "feasible start: " + NestChecker.check(req, start));
        NestResult r = SheetSearch.eliminate(req, start, NestOptions.steps(3000, 4, 1), Long.MAX_VALUE);
        assertTrue(sheetsOf(r) < 4);
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
        SheetLayout withFrame = r.sheets().stream().filter(l -> l.parts().contains(frame)).findFirst().orElseThrow();
        assertTrue(withFrame.parts().contains(plug), "the plug stays in the frame's hole, the frame where it was");
    }

    @Test
    void noStepsLeaveTheNestAsItWas() {
        NestRequest req = request(RotationRule.quarter(), List.of(SHEET));
        NestResult start = wasteful(List.of());
        assertEquals(start, SheetSearch.eliminate(req, start, NestOptions.steps(0, 1, 1), Long.MAX_VALUE));
    }

    @Test
    void aPartThatFitsNoHoleGetsInOnceTheOthersOnTheSheetMove() {
        // sheet A: two 4 x 8 plates with a gap of 2 between them and 1 free on the right; sheet B: one 2.4 x 8 slat.
        // The slat needs 2.9 with its gaps: it fits on A only once a plate moves over.
        List<NestPiece> pieces = List.of(
                NestPiece.of("PL", "plate", 2, Shapes.rect(0, 0, 4, 8)),
                NestPiece.of("SL", "slat", 1, Shapes.rect(0, 0, 2.4, 8)));
        NestRequest req = onSheets(pieces);
        NestResult start = feasibleStart(req,
                new SheetLayout(SHEET, 0, 10.5, List.of(new Placement("PL", "plate", 0, 0.5, 0.5, 0, false),
                        new Placement("PL", "plate", 1, 6.5, 0.5, 0, false)), null, 0.53),
                new SheetLayout(SHEET, 1, 2.9, List.of(new Placement("SL", "slat", 0, 0.5, 0.5, 0, false)), null, 0.16));
        NestResult r = SheetSearch.eliminate(req, start, NestOptions.steps(3000, 2, 1), Long.MAX_VALUE);
        assertEquals(1, sheetsOf(r), "the plates make room for the slat");
        assertEquals(3, r.placedCount());
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
    }

    /** Two threads: one worker trying sheets two at a time; three: the same and the first engine again on the third. */
    @ParameterizedTest
    @ValueSource(ints = {2, 3})
    void aTimedRunOnSeveralThreadsPlacesEveryPartAndPassesTheChecker(int threads) {
        NestRequest req = request(RotationRule.free(), List.of(SHEET));
        NestResult r = SheetSearch.nest(req, NestOptions.timed(java.time.Duration.ofMillis(1500), 1, threads));
        assertEquals(8, r.placedCount());
        assertTrue(r.unplaced().isEmpty());
        assertTrue(sheetsOf(r) <= 2, "eight small parts fit on two sheets, got " + sheetsOf(r));
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
    }

    @Test
    void sheetsAreSearchedByDefaultOnlyOnTimedRunsOfAtLeastHalfAMinute() {
        assertTrue(SheetSearch.byDefault(NestOptions.timed(java.time.Duration.ofSeconds(30), 1, 2)));
        assertTrue(SheetSearch.byDefault(NestOptions.timed(java.time.Duration.ofSeconds(60), 1, 1)));
        assertTrue(!SheetSearch.byDefault(NestOptions.timed(java.time.Duration.ofSeconds(10), 1, 2)));
        assertTrue(!SheetSearch.byDefault(NestOptions.steps(100000, 1, 2)));
    }

    @Test
    void aPartTooLargeForAnyHoleTradesPlacesWithASmallerOne() {
        // sheet A: a 7 x 8 plate and a 3 x 3 square in the strip right of it; sheet B: a 3.4 x 8 slat. The slat fits
        // that strip only once the square has gone, and the square fits nowhere else on A: the two trade sheets.
        List<NestPiece> pieces = List.of(
                NestPiece.of("PL", "plate", 1, Shapes.rect(0, 0, 7, 8)),
                NestPiece.of("SQ", "square", 1, Shapes.rect(0, 0, 3, 3)),
                NestPiece.of("SL", "slat", 1, Shapes.rect(0, 0, 3.4, 8)));
        NestRequest req = onSheets(pieces);
        NestResult start = feasibleStart(req,
                new SheetLayout(SHEET, 0, 11.5, List.of(new Placement("PL", "plate", 0, 0.5, 0.5, 0, false),
                        new Placement("SQ", "square", 0, 8, 0.5, 0, false)), null, 0.54),
                new SheetLayout(SHEET, 1, 4.4, List.of(new Placement("SL", "slat", 0, 0.5, 0.5, 0, false)), null, 0.23));
        NestResult r = SheetSearch.eliminate(req, start, NestOptions.steps(20000, 2, 1), Long.MAX_VALUE);
        assertEquals(2, sheetsOf(r), "the three parts need two sheets");
        assertTrue(NestChecker.check(req, r).isEmpty(), "checker: " + NestChecker.check(req, r));
        List<String> first = r.sheets().get(0).parts().stream().map(Placement::fitting).sorted().toList();
        List<String> last = r.sheets().get(1).parts().stream().map(Placement::fitting).toList();
        assertEquals(List.of("PL", "SL"), first, "the slat went onto the plate's sheet");
        assertEquals(List.of("SQ"), last, "the square went to the last sheet");
        assertTrue(r.sheets().get(1).usedLength() < start.sheets().get(1).usedLength(), "a larger offcut is left");
    }
}
