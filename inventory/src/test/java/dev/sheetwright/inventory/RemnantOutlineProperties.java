package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

class RemnantOutlineProperties {
    private static final double EPS = 1e-6;

    @Property
    void rectangle_sizeAndAreaMatch(@ForAll @DoubleRange(min = 0.5, max = 6000) double w,
                                    @ForAll @DoubleRange(min = 0.5, max = 6000) double h) {
        RemnantOutline o = RemnantOutline.rectangle(w, h);

        assertTrue(o.isRectangle());
        assertEquals(w, o.widthMm());
        assertEquals(h, o.heightMm());
        assertEquals(w * h, o.areaMm2(), w * h * EPS);
    }

    @Property
    void toText_parsesBackToTheSameOutline(@ForAll("starPolygons") List<OutlinePoint> corners) {
        RemnantOutline o = RemnantOutline.of(corners);

        assertEquals(o, RemnantOutline.parse(o.toText()));
    }

    @Property
    void of_translatedOrReversedCorners_giveTheSameShapeAtTheOrigin(
            @ForAll("starPolygons") List<OutlinePoint> corners,
            @ForAll @DoubleRange(min = -5000, max = 5000) double dx,
            @ForAll @DoubleRange(min = -5000, max = 5000) double dy) {
        RemnantOutline o = RemnantOutline.of(corners);
        List<OutlinePoint> moved = new ArrayList<>();
        for (OutlinePoint p : corners) {
            moved.add(OutlinePoint.of(p.x() + dx, p.y() + dy));
        }
        java.util.Collections.reverse(moved);

        RemnantOutline m = RemnantOutline.of(moved);

        assertEquals(o.widthMm(), m.widthMm(), EPS);
        assertEquals(o.heightMm(), m.heightMm(), EPS);
        assertEquals(o.areaMm2(), m.areaMm2(), o.areaMm2() * EPS);
        assertEquals(0.0, m.vertices().stream().mapToDouble(OutlinePoint::x).min().orElseThrow(), 0.0);
        assertEquals(0.0, m.vertices().stream().mapToDouble(OutlinePoint::y).min().orElseThrow(), 0.0);
        assertTrue(m.toPolygon().isValid());
    }

    /** Star-shaped polygons: corners at increasing angles around a centre, so the ring never crosses itself. */
    @Provide
    Arbitrary<List<OutlinePoint>> starPolygons() {
        return Arbitraries.integers().between(3, 12).flatMap(n ->
                Combinators.combine(
                        Arbitraries.doubles().between(50, 2000).list().ofSize(n),
                        Arbitraries.doubles().between(0.1, 0.9).list().ofSize(n))
                        .as((radii, jitter) -> {
                            List<OutlinePoint> pts = new ArrayList<>();
                            for (int i = 0; i < n; i++) {
                                double a = 2 * Math.PI * (i + jitter.get(i)) / n;
                                pts.add(OutlinePoint.of(3000 + radii.get(i) * Math.cos(a),
                                        3000 + radii.get(i) * Math.sin(a)));
                            }
                            return pts;
                        }));
    }
}
