package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class BulgeArcTest {

    private static final double EPS = 1e-12;

    @Test
    void cubicBeziers_halfCircle_twoQuartersEndingAtTheChordEnd() {
        // bulge 1 = half circle from (0,0) to (2,0), counter-clockwise: below the chord, centre (1,0), radius 1
        List<double[]> pieces = BulgeArc.of(0, 0, 2, 0, 1).cubicBeziers();
        assertEquals(2, pieces.size());
        double[] mid = pieces.get(0);
        assertEquals(1, mid[4], EPS);
        assertEquals(-1, mid[5], EPS);
        double[] end = pieces.get(1);
        assertEquals(2, end[4], EPS);
        assertEquals(0, end[5], EPS);
        // control arm of a quarter turn: 4/3 tan(pi/8) r
        double k = 4.0 / 3 * Math.tan(Math.PI / 8);
        assertEquals(0, mid[0], EPS);
        assertEquals(-k, mid[1], EPS);
    }
}
