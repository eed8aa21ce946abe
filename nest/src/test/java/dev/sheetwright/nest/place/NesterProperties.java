package dev.sheetwright.nest.place;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Random;
import java.util.Set;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.Stock;
import dev.sheetwright.nest.model.Unplaced;
import dev.sheetwright.nest.testing.Shapes;

/**
 * Random jobs of convex, concave and holed parts (sizes 2 to 60 on a 48 x 120 sheet or a 48-wide coil; gap, margin
 * and chord allowance in the ranges of common practice): the checker finds nothing wrong and no copy is lost.
 */
class NesterProperties {

    /** Generation parameters of one random job. */
    record Job(long seed, int types, int rules, int stock) {
    }

    @Provide
    Arbitrary<Job> jobs() {
        return Combinators.combine(Arbitraries.longs(), Arbitraries.integers().between(1, 6),
                Arbitraries.integers().between(0, 5), Arbitraries.integers().between(0, 2)).as(Job::new);
    }

    static NestRequest request(Job job) {
        Random r = new Random(job.seed());
        List<NestPiece> pieces = new ArrayList<>();
        for (int t = 0; t < job.types(); t++) {
            pieces.add(NestPiece.of("fit" + t, "p" + t, 1 + r.nextInt(4), randomShape(r)));
        }
        NestRules rules = switch (job.rules()) {
            case 0 -> NestRules.touching(RotationRule.none());
            case 1 -> new NestRules(0.25, 0.5, RotationRule.quarter(), false, 0.01);
            case 2 -> new NestRules(0.125, 0, RotationRule.step(45), true, 0.005);
            case 3 -> new NestRules(0, 0.25, RotationRule.angles(0, 180), false, 0);
            case 4 -> new NestRules(0.5, 0.5, new RotationRule.Free(45), false, 0.02);
            default -> new NestRules(0.2, 0.3, RotationRule.quarter(), true, 0);
        };
        List<Stock> stock = switch (job.stock()) {
            case 0 -> List.of(new Sheet("48x120", 120, 48, OptionalInt.empty(), 60));
            case 1 -> List.of(new Sheet("48x96", 96, 48, OptionalInt.of(2), 45), new Sheet("small", 30, 30, OptionalInt.empty(), 5));
            default -> List.of(new Coil("coil", 48, 1));
        };
        return new NestRequest(pieces, stock, rules);
    }

    /** Convex (hull of random points), star-shaped concave, or a part with a hole; 2 to 60 units across. */
    static Polygon randomShape(Random r) {
        double size = 2 + r.nextDouble() * (r.nextInt(5) == 0 ? 58 : 20);
        int kind = r.nextInt(4);
        if (kind == 0) {
            Coordinate[] pts = new Coordinate[8];
            for (int i = 0; i < pts.length; i++) {
                pts[i] = new Coordinate(r.nextDouble() * size, r.nextDouble() * size * (0.2 + r.nextDouble()));
            }
            Polygon hull = (Polygon) Shapes.GF.createMultiPointFromCoords(pts).convexHull();
            return hull.getArea() > 0.01 * size * size ? hull : Shapes.rect(0, 0, size, size / 2);
        }
        int n = 5 + r.nextInt(9);
        Coordinate[] ring = new Coordinate[n + 1];
        for (int i = 0; i < n; i++) {
            double a = 2 * Math.PI * i / n;
            double rad = size / 2 * (0.45 + 0.55 * r.nextDouble());
            ring[i] = new Coordinate(size / 2 + rad * Math.cos(a), size / 2 + rad * Math.sin(a));
        }
        ring[n] = ring[0].copy();
        LinearRing shell = Shapes.GF.createLinearRing(ring);
        if (kind == 3) {
            double h = size * 0.08;
            LinearRing hole = Shapes.GF.createLinearRing(Shapes.rect(size / 2 - h, size / 2 - h, size / 2 + h, size / 2 + h)
                    .getExteriorRing().getCoordinates());
            return Shapes.GF.createPolygon(shell, new LinearRing[] {hole});
        }
        return Shapes.GF.createPolygon(shell);
    }

    static void assertAccounted(NestRequest req, NestResult res) {
        Set<String> seen = new HashSet<>();
        for (var l : res.sheets()) {
            for (Placement p : l.parts()) {
                assertEquals(true, seen.add(p.label() + "#" + p.copy()), "placed twice: " + p);
            }
        }
        for (Unplaced u : res.unplaced()) {
            assertEquals(true, seen.add(u.label() + "#" + u.copy()), "listed twice: " + u);
        }
        assertEquals(req.totalCopies(), seen.size());
    }

    @Property(tries = 20)
    void nest_randomJob_checkerFindsNoViolationAndNothingLost(@ForAll("jobs") Job job) {
        NestRequest req = request(job);
        NestResult res = Nester.nest(req, NestOptions.steps(4, job.seed(), 2));
        assertEquals(List.of(), NestChecker.check(req, res));
        assertAccounted(req, res);
    }

    @Property(tries = 15)
    void nest_rotatedAndReorderedInput_neverLosesAPiece(@ForAll("jobs") Job job) {
        NestRequest req = request(job);
        Random r = new Random(job.seed() ^ 0x5DEECE66DL);
        List<NestPiece> moved = new ArrayList<>();
        for (NestPiece p : req.pieces()) {
            AffineTransformation t = AffineTransformation.rotationInstance(r.nextDouble() * 2 * Math.PI).translate(r.nextDouble() * 50 - 25, 3);
            moved.add(NestPiece.of(p.fitting(), p.piece(), p.copies(), (Polygon) t.transform(p.shape())));
        }
        Collections.shuffle(moved, r);
        NestRequest req2 = new NestRequest(moved, req.stock(), req.rules());
        NestResult res = Nester.nest(req2, NestOptions.constructiveOnly());
        assertEquals(List.of(), NestChecker.check(req2, res));
        assertAccounted(req2, res);
    }
}
