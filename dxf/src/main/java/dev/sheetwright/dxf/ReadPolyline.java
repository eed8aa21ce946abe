package dev.sheetwright.dxf;

import java.util.ArrayList;
import java.util.List;

/**
 * A polyline as read from a DXF file by {@link DxfPolylineReader}: its layer, the line of the file where it starts,
 * whether it is flagged closed, and its vertices in millimetres with the bulge of the segment leaving each.
 * Vertices may repeat (files from other programs do that); {@link #flatten} drops repeats.
 *
 * @param closeMm points nearer than this are one point (the reader's join distance)
 */
public record ReadPolyline(String layer, int line, boolean flaggedClosed, List<Vertex> vertices, double closeMm) {

    public ReadPolyline {
        Checks.notNull("ReadPolyline.layer", layer);
        vertices = Checks.copy("ReadPolyline.vertices", vertices);
    }

    /** Flagged closed, or drawn back to its first point. */
    public boolean isClosed() {
        int n = vertices.size();
        return flaggedClosed || (n >= 4 && distance(vertices.get(0), vertices.get(n - 1)) < closeMm);
    }

    /**
     * The outline as points in mm, arcs replaced by chords no further than {@code chordToleranceMm} from the arc
     * (through {@link BulgeArc}); a last point repeating the first is dropped, as are repeated points.
     */
    public List<double[]> flatten(double chordToleranceMm) {
        List<Vertex> v = new ArrayList<>(vertices);
        int n = v.size();
        if (n > 1 && distance(v.get(0), v.get(n - 1)) < closeMm) {
            v.remove(n - 1);
            n--;
        }
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Vertex a = v.get(i);
            Vertex b = v.get((i + 1) % n);
            add(out, a.x(), a.y());
            if (a.bulge() != 0.0 && distance(a, b) >= closeMm) {
                for (double[] p : BulgeArc.of(a.x(), a.y(), b.x(), b.y(), a.bulge()).innerPoints(chordToleranceMm)) {
                    add(out, p[0], p[1]);
                }
            }
        }
        return out;
    }

    private void add(List<double[]> out, double x, double y) {
        if (!out.isEmpty()) {
            double[] last = out.get(out.size() - 1);
            if (Math.hypot(last[0] - x, last[1] - y) < closeMm) {
                return;
            }
        }
        out.add(new double[] {x, y});
    }

    private static double distance(Vertex a, Vertex b) {
        return Math.hypot(a.x() - b.x(), a.y() - b.y());
    }
}
