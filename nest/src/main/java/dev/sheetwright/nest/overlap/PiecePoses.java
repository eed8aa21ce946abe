package dev.sheetwright.nest.overlap;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.AffineTransformation;

import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.RotationRule;

/**
 * The link between placements and search poses: one search shape per piece and side (mirrored or not), built once,
 * and the conversion of a placement (mirror, turn about the origin, move) to a pose (the search shape's reference
 * point and the angle) and back.
 */
final class PiecePoses {
    private final Map<String, NestPiece> byLabel = new HashMap<>();
    private final Map<String, SearchShape> cache = new HashMap<>();
    private final double grow;
    private final double precision;

    PiecePoses(List<NestPiece> pieces, double grow, double precision) {
        for (NestPiece p : pieces) {
            byLabel.put(p.label(), p);
        }
        this.grow = grow;
        this.precision = precision;
    }

    /**
     * How far search shapes are grown past the outlines: half the gap, the chord allowance and the precision (with no
     * gap: the chord allowance), so that search shapes apart keep the true outlines at least the gap apart.
     */
    static double growFor(NestRules rules, double precision) {
        double gap = rules.gap();
        return gap > 0 ? gap / 2 + rules.chordTolerance() + precision : rules.chordTolerance();
    }

    /** The piece a placement places. */
    NestPiece piece(Placement p) {
        NestPiece piece = byLabel.get(p.label());
        if (piece == null) {
            throw new IllegalArgumentException("the layout places " + p.label() + ", which the request does not list");
        }
        return piece;
    }

    /** The search shape of a placement's piece on the side it lies. */
    SearchShape shape(Placement p) {
        String key = p.label() + (p.mirrored() ? "\u0000m" : "");
        return cache.computeIfAbsent(key, k -> {
            Polygon shape = piece(p).shape();
            Polygon oriented = p.mirrored() ? (Polygon) AffineTransformation.scaleInstance(-1, 1).transform(shape) : shape;
            return SearchShape.of(oriented, grow, precision);
        });
    }

    /** Where the reference point of {@code s} lies under placement {@code p}: {x, y}. */
    static double[] reference(Placement p, SearchShape s) {
        double c = Turn.cos(p.rotationDeg());
        double sn = Turn.sin(p.rotationDeg());
        return new double[] {p.x() + c * s.refX - sn * s.refY, p.y() + sn * s.refX + c * s.refY};
    }

    /** The placement of {@code old}'s copy whose search shape {@code s} has its reference point at x, y turned by angle. */
    static Placement placement(Placement old, SearchShape s, double x, double y, double angle) {
        double c = Turn.cos(angle);
        double sn = Turn.sin(angle);
        double tx = x - (c * s.refX - sn * s.refY);
        double ty = y - (sn * s.refX + c * s.refY);
        return new Placement(old.fitting(), old.piece(), old.copy(), tx, ty, RotationRule.normalize(angle), old.mirrored());
    }
}
