package dev.sheetwright.core.cutting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

class RapidPathProperties {

    private static final double REL_EPS = 1e-9;
    private static final PiercePoint ORIGIN = new PiercePoint(0, 0);

    /** Pierce points on a 1500 x 3000 mm sheet. */
    @Provide
    Arbitrary<List<PiercePoint>> points() {
        return Combinators.combine(Arbitraries.doubles().between(0, 1500), Arbitraries.doubles().between(0, 3000))
                .as(PiercePoint::new).list().ofMaxSize(40);
    }

    @Property
    void nearestNeighbour_visitsEveryPointOnce(@ForAll("points") List<PiercePoint> points) {
        Comparator<PiercePoint> byXy = Comparator.comparingDouble(PiercePoint::x).thenComparingDouble(PiercePoint::y);
        List<PiercePoint> expected = new ArrayList<>(points);
        List<PiercePoint> visited = new ArrayList<>(RapidPath.nearestNeighbour(points).order());
        expected.sort(byXy);
        visited.sort(byXy);
        assertEquals(expected, visited);
    }

    @Property
    void nearestNeighbour_lengthIsSumOfLegsFromOrigin(@ForAll("points") List<PiercePoint> points) {
        RapidPath path = RapidPath.nearestNeighbour(points);
        double sum = 0;
        PiercePoint at = ORIGIN;
        for (PiercePoint p : path.order()) {
            sum += at.distanceTo(p);
            at = p;
        }
        assertEquals(sum, path.length(), REL_EPS * Math.max(1, sum));
    }

    @Property
    void nearestNeighbour_reachesTheFarthestPoint(@ForAll("points") List<PiercePoint> points) {
        double farthest = points.stream().mapToDouble(ORIGIN::distanceTo).max().orElse(0);
        double length = RapidPath.length(points);
        assertTrue(length >= farthest * (1 - REL_EPS), length + " < " + farthest);
    }

    @Property
    void nearestNeighbour_eachLegIsTheShortestAvailable(@ForAll("points") List<PiercePoint> points) {
        List<PiercePoint> order = RapidPath.nearestNeighbour(points).order();
        PiercePoint at = ORIGIN;
        for (int i = 0; i < order.size(); i++) {
            PiercePoint from = at;
            double leg = from.distanceTo(order.get(i));
            double shortest = order.subList(i, order.size()).stream().mapToDouble(from::distanceTo).min()
                    .orElseThrow();
            assertEquals(shortest, leg);
            at = order.get(i);
        }
    }
}
