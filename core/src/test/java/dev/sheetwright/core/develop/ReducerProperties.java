package dev.sheetwright.core.develop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.SimplePolygons;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** Properties of radial-line development over realistic duct reducer sizes (inches). */
class ReducerProperties {

    record Size(double large, double small, double height, int pieces) {
    }

    @Provide
    Arbitrary<Size> sizes() {
        // duct reducers: small end 3 to 40 in, large end 1 to 30 in bigger, 2 to 48 in tall
        Arbitrary<Double> small = Arbitraries.doubles().between(3, 40);
        Arbitrary<Double> step = Arbitraries.doubles().between(1, 30);
        Arbitrary<Double> height = Arbitraries.doubles().between(2, 48);
        Arbitrary<Integer> pieces = Arbitraries.integers().between(1, 4);
        return Combinators.combine(small, step, height, pieces).as((d, e, h, k) -> new Size(d + e, d, h, k));
    }

    private static Development develop(Size s, Allowances a) {
        return ReducerDeveloper.develop(new ReducerSpec("R", 1, s.large(), s.small(), s.height(), s.pieces(), a),
                new DevelopContext(LengthUnit.INCH, 0, DimensionFace.MEAN, Tolerance.INCH));
    }

    @Property
    void netArea_equalsFrustumLateralArea(@ForAll("sizes") Size s) {
        // trade-reference §1.1: lateral area = pi (R1 + R2) s  [S:LONG p.91, p.128]
        Pattern p = develop(s, Allowances.NET).pieces().get(0).pattern();
        double r1 = s.large() / 2;
        double r2 = s.small() / 2;
        double lateral = Math.PI * (r1 + r2) * Math.hypot(r1 - r2, s.height());
        assertEquals(lateral / s.pieces(), p.area(), 1e-9 * lateral);
    }

    @Property
    void netArcs_equalEndCircumferences(@ForAll("sizes") Size s) {
        Pattern p = develop(s, Allowances.NET).pieces().get(0).pattern();
        double arcs = p.outer().edges().stream().filter(e -> e instanceof Arc).mapToDouble(Edge::length).sum();
        assertEquals(Math.PI * (s.large() + s.small()) / s.pieces(), arcs, 1e-9 * s.large());
    }

    @Property
    void outline_isClosedAndSimple_withAndWithoutNotches(@ForAll("sizes") Size s,
            @ForAll boolean notch) {
        AllowanceTable t = AllowanceTable.in(LengthUnit.INCH);
        Allowances a = new Allowances(t.seam(SeamKind.GROOVE, 0.25), t.parseEnd("crimp 1"),
                t.parseEnd("bead 3/8"), notch);
        Development d;
        try {
            d = develop(s, a);
        } catch (dev.sheetwright.core.fitting.FittingException e) {
            // refused only when the seam strips would overlap: a pattern angle past a half turn
            assertEquals("pieces", e.field());
            assertTrue(pieceAngle(s) > Math.PI - 1e-9);
            return;
        }
        Pattern p = d.pieces().get(0).pattern();
        // closed: Contour.of refuses an open loop; simple: no two chords of the flattened outline cross
        assertTrue(SimplePolygons.isSimple(p.outer().flatten(0.01)));
        assertTrue(p.outer().isCounterClockwise());
    }

    @Property
    void notchedAllowances_addExactlyTheirStrips(@ForAll("sizes") Size s,
            @ForAll("widths") double wr, @ForAll("widths") double wl,
            @ForAll("widths") double ea, @ForAll("widths") double eb) {
        net.jqwik.api.Assume.that(pieceAngle(s) < Math.toRadians(170)); // wider pieces are split in practice
        Allowances a = new Allowances(new dev.sheetwright.core.fitting.SeamAllowance(SeamKind.LAP, wr, wl),
                ea == 0 ? EndAllowance.NONE : new EndAllowance(EndKind.LAP, ea),
                eb == 0 ? EndAllowance.NONE : new EndAllowance(EndKind.LAP, eb), true);
        Development d = develop(s, a);
        Layout l = d.pieces().get(0).layout();
        double l1 = l.get("largeRadius");
        double l2 = l.get("smallRadius");
        double theta = Math.toRadians(l.get("pieceAngle"));
        double net = develop(s, Allowances.NET).pieces().get(0).pattern().area();
        double expected = net + (wr + wl) * (l1 - l2)
                + theta / 2 * ((l1 + ea) * (l1 + ea) - l1 * l1)
                + theta / 2 * (l2 * l2 - (l2 - eb) * (l2 - eb));
        assertEquals(expected, d.pieces().get(0).pattern().area(), 1e-9 * expected);
    }

    /** Pattern angle of one piece, radians: 2 pi (R1 - R2) / s / k (trade-reference §1.1). */
    private static double pieceAngle(Size s) {
        double dr = (s.large() - s.small()) / 2;
        return 2 * Math.PI * dr / Math.hypot(dr, s.height()) / s.pieces();
    }

    @Provide
    Arbitrary<Double> widths() {
        return Arbitraries.of(0.0, 0.1875, 0.25, 0.375, 0.5, 1.0);
    }
}
