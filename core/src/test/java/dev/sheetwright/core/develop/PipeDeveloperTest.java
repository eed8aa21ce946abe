package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.PipeSpec;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import org.junit.jupiter.api.Test;

class PipeDeveloperTest {

    private static final double EPS4 = 5e-5;

    @Test
    void groovedPipe8in26Gauge_blankWidth() {
        // trade-reference §6 example (computed), check value C10: 8 in inside, 26 ga (t = 0.0217 in), grooved seam
        // with a 1/4 in lock: pi x 8.0217 + 3 x 1/4 = 25.9509 in [S:NAVY ch.2] [S:TALL] for the 3W rule
        Allowances a = new Allowances(AllowanceTable.in(LengthUnit.INCH).parseSeam("groove 1/4"),
                EndAllowance.NONE, EndAllowance.NONE, false);
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0.0217, DimensionFace.INSIDE, Tolerance.INCH);
        Development d = PipeDeveloper.develop(new PipeSpec("P8", 1, 8, 24, 1, a), ctx);
        assertEquals(25.9509, d.pieces().get(0).pattern().bounds().width(), EPS4);
        assertEquals(25.2009, d.pieces().get(0).layout().get("stretchOut"), EPS4);
    }

    @Test
    void circumferenceOf7inCircle() {
        // [S:LONG p.32] via trade-reference §6: 7 x 3.1416 = 21.9912 in (the book's pi is 3.1416)
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH);
        Development d = PipeDeveloper.develop(new PipeSpec("C7", 1, 7, 10, 1, Allowances.NET), ctx);
        assertEquals(21.9912, d.pieces().get(0).layout().get("stretchOut"), 1e-4);
    }

    @Test
    void shellFromInsideAndOutside_quarterInchPlate() {
        // [S:CYC] via trade-reference §0.2, check value C11: 48 in shell, 1/4 in plate
        Development inside = PipeDeveloper.develop(new PipeSpec("S", 1, 48, 60, 1, Allowances.NET),
                new DevelopContext(LengthUnit.INCH, 0.25, DimensionFace.INSIDE, Tolerance.INCH));
        Development outside = PipeDeveloper.develop(new PipeSpec("S", 1, 48, 60, 1, Allowances.NET),
                new DevelopContext(LengthUnit.INCH, 0.25, DimensionFace.OUTSIDE, Tolerance.INCH));
        assertEquals(151.5818, inside.pieces().get(0).layout().get("stretchOut"), EPS4);
        assertEquals(150.0110, outside.pieces().get(0).layout().get("stretchOut"), EPS4);
    }

    @Test
    void netPipe_isExactlyStretchOutByLength() {
        DevelopContext ctx = new DevelopContext(LengthUnit.MILLIMETRE, 0, DimensionFace.MEAN, Tolerance.MM);
        Development d = PipeDeveloper.develop(new PipeSpec("P", 1, 200, 1000, 1, Allowances.NET), ctx);
        assertEquals(Math.PI * 200 * 1000, d.pieces().get(0).pattern().area(), 1e-6);
        assertEquals(2 * (Math.PI * 200 + 1000), d.pieces().get(0).pattern().cutLength(), 1e-9);
    }

    @Test
    void endAllowancesLongerThanPipe_rejected() {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.parseSeam("none"), t.parseEnd("crimp 2"), t.parseEnd("bead 1"), true);
        DevelopContext ctx = new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH);
        FittingException e = assertThrows(FittingException.class,
                () -> PipeDeveloper.develop(new PipeSpec("short", 1, 6, 2.5, 1, a), ctx));
        assertEquals("allowances.ends", e.field());
    }
}
