package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.OffsetSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.fitting.SeamPosition;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import org.junit.jupiter.api.Test;

class OffsetDeveloperTest {

    private static final double EPS4 = 5e-5; // reference values are given to 4 decimals
    private static final DevelopContext MEAN = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN,
            Tolerance.INCH);

    /** 10 in pipe, R = 15 in, as in trade-reference §3.6. */
    private static Development develop(double offset, double angle, double length) {
        return OffsetDeveloper.develop(new OffsetSpec("OF", 1, 10, offset, angle, length, 15, 0, SeamPosition.SIDE,
                Allowances.NET, SeamAllowance.NONE), MEAN);
    }

    private static Layout layout(Development d) {
        return d.pieces().get(0).layout();
    }

    @Test
    void two45s_straight12_offsetAndAdvance() {
        // trade-reference §3.6 (computed), check value C5: two 45 deg elbows, R 15, S 12 -> O 17.2721, advance 29.6985
        Layout l = layout(develop(17.2721, 45, 0));
        assertEquals(12.0, l.get("straightLength"), EPS4 / Math.sin(Math.PI / 4));
        assertEquals(29.6985, l.get("advance"), EPS4);
    }

    @Test
    void two45s_noStraight_offsetAndAdvance() {
        // trade-reference §3.6 (computed): S = 0 -> O 8.7868, advance 21.2132; no straight piece is cut
        Development d = develop(8.7868, 45, 0);
        assertEquals(0, layout(d).get("straightLength"), 1e-4);
        assertEquals(21.2132, layout(d).get("advance"), EPS4);
        assertTrue(d.pieces().stream().noneMatch(p -> p.pattern().piece().equals("straight")));
    }

    @Test
    void offset24_straightAndAdvance_andTheStraightBlank() {
        // trade-reference §3.6 (computed): O = 24 -> S 21.5147, advance 36.4264
        Development d = develop(24, 45, 0);
        assertEquals(21.5147, layout(d).get("straightLength"), EPS4);
        assertEquals(36.4264, layout(d).get("advance"), EPS4);
        Pattern straight = d.pieces().stream().map(DevelopedPiece::pattern).filter(p -> p.piece().equals("straight"))
                .findFirst().orElseThrow();
        assertEquals(Math.PI * 10 * 21.5147, straight.area(), 1e-3);
    }

    @Test
    void advanceGiven_angleSolved() {
        // trade-reference §3.6 (computed): O 24 with an advance of 36.4264 is two 45 deg elbows and S 21.5147
        Layout l = layout(develop(24, 0, 36.4264));
        assertEquals(45.0, l.get("offsetAngle"), 1e-3);
        assertEquals(21.5147, l.get("straightLength"), 1e-3);
        assertEquals(36.4264, l.get("advance"), 1e-9);
    }

    @Test
    void bothElbows_piecesCountedTogether() {
        // 45 deg elbows default to 3 pieces (common practice, [S:UFGS15810N] for over 8 in): 6 gores in all
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.seam(SeamKind.GROOVE, 0.25), t.parseEnd("crimp 1"), t.parseEnd("crimp 1"),
                true);
        Development d = OffsetDeveloper.develop(new OffsetSpec("OF", 1, 10, 24, 45, 0, 15, 0, SeamPosition.SIDE, a,
                t.defaultMiterSeam()), MEAN);
        int gores = d.pieces().stream().filter(p -> !p.pattern().piece().equals("straight"))
                .mapToInt(p -> p.pattern().count()).sum();
        assertEquals(6, gores);
        assertTrue(d.pieces().stream().anyMatch(p -> p.pattern().count() > 1), "identical pieces are counted");
    }

    @Test
    void angleTooLargeForTheOffset_rejectedSuggestingSmaller() {
        FittingException e = assertThrows(FittingException.class, () -> develop(5, 45, 0));
        assertEquals("angle", e.field());
        assertTrue(e.getMessage().contains("smaller"), e.getMessage());
    }

    @Test
    void advanceTooShort_rejected() {
        FittingException e = assertThrows(FittingException.class, () -> develop(24, 0, 10));
        assertEquals("length", e.field());
    }

    @Test
    void angleAndLengthTogether_rejected() {
        FittingException e = assertThrows(FittingException.class, () -> new OffsetSpec("OF", 1, 10, 24, 45, 36, 15, 0,
                SeamPosition.SIDE, Allowances.NET, SeamAllowance.NONE));
        assertEquals("length", e.field());
    }
}
