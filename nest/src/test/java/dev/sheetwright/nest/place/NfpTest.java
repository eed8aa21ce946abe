package dev.sheetwright.nest.place;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The boundary chains of a union of convex sums, used for candidate positions. */
class NfpTest {
    /** The placer's precision at these sizes (coordinates up to about 20). */
    private static final double EPS = 2e-8;
    private static ConvexPolygon square(double x, double y, double s) {
        return ConvexPolygon.of(new double[] {x, x + s, x + s, x}, new double[] {y, y, y + s, y + s});
    }

    private static double closedLength(List<ConvexPolygon> chains) {
        double len = 0;
        for (ConvexPolygon c : chains) {
            for (int i = 0; i < c.size(); i++) {
                if (!c.isOpen(i)) {
                    int j = (i + 1) % c.size();
                    len += Math.hypot(c.xs[j] - c.xs[i], c.ys[j] - c.ys[i]);
                }
            }
        }
        return len;
    }

    @Test
    void unionBoundary_rowOfOverlappingSquares_isTheOuterRectangle() {
        // 20 unit squares, each overlapping the next by half: the union is the rectangle [0, 10.5] x [0, 1]
        List<ConvexPolygon> parts = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            parts.add(square(i * 0.5, 0, 1));
        }
        List<ConvexPolygon> chains = Nfp.unionBoundary(parts, EPS);
        assertNotNull(chains);
        // every kept edge lies on the rectangle's sides (overlapping collinear top and bottom edges are all kept)
        double vertical = 0;
        for (ConvexPolygon c : chains) {
            for (int i = 0; i < c.size(); i++) {
                if (c.isOpen(i)) {
                    continue;
                }
                int j = (i + 1) % c.size();
                boolean horizontalSide = c.ys[i] == c.ys[j] && (c.ys[i] == 0 || c.ys[i] == 1);
                boolean verticalSide = c.xs[i] == c.xs[j] && (c.xs[i] == 0 || c.xs[i] == 10.5);
                assertTrue(horizontalSide || verticalSide, "edge inside the union: " + c.xs[i] + "," + c.ys[i]);
                vertical += verticalSide ? Math.abs(c.ys[j] - c.ys[i]) : 0;
            }
        }
        assertEquals(2, vertical, 1e-9);
        assertEquals(2 * 20 + 2, closedLength(chains), 1e-9);
    }

    @Test
    void unionBoundary_squareInsideAnother_givesOnlyTheOuterOne() {
        List<ConvexPolygon> parts = new ArrayList<>();
        parts.add(square(0, 0, 10));
        for (int i = 0; i < 3; i++) {
            parts.add(square(1 + 2 * i, 1, 1));
        }
        List<ConvexPolygon> chains = Nfp.unionBoundary(parts, EPS);
        assertNotNull(chains);
        assertEquals(40, closedLength(chains), 1e-9);
    }

    @Test
    void unionBoundary_squaresSideBySide_sharedEdgesCutAway() {
        // 20 unit squares touching along their sides: the union is [0, 20] x [0, 1], its inner sides are no boundary
        List<ConvexPolygon> parts = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            parts.add(square(i, 0, 1));
        }
        List<ConvexPolygon> chains = Nfp.unionBoundary(parts, EPS);
        assertNotNull(chains);
        assertEquals(2 * 20 + 2, closedLength(chains), 1e-9);
        for (ConvexPolygon c : chains) {
            for (int i = 0; i < c.size(); i++) {
                int j = (i + 1) % c.size();
                if (!c.isOpen(i) && c.xs[i] == c.xs[j]) {
                    assertTrue(c.xs[i] == 0 || c.xs[i] == 20, "inner side kept at x = " + c.xs[i]);
                }
            }
        }
    }
}
