package dev.sheetwright.inventory;

import dev.sheetwright.dxf.DxfPolylineReader;
import dev.sheetwright.dxf.ReadPolyline;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A remnant outline from an ASCII DXF file: the largest closed polyline on a layer, read through the dxf module's
 * {@link DxfPolylineReader} (which also says how the drawing unit is found), arcs flattened to chords no further
 * than a chord tolerance from the arc.
 */
public final class DxfOutline {
    /** Layers tried, in order, by {@link #read(Path)}. */
    public static final List<String> DEFAULT_LAYERS = List.of("SHEET", "CUT");
    /** Default largest distance between an arc and the chords replacing it, mm. */
    public static final double DEFAULT_CHORD_TOLERANCE_MM = 0.1;

    private DxfOutline() {
    }

    /** Reads the largest closed polyline on layer SHEET, or else on layer CUT. */
    public static RemnantOutline read(Path dxf) {
        List<ReadPolyline> all = DxfPolylineReader.read(dxf);
        for (String layer : DEFAULT_LAYERS) {
            if (all.stream().anyMatch(p -> p.isClosed() && p.layer().equalsIgnoreCase(layer))) {
                return largest(dxf, all, layer, DEFAULT_CHORD_TOLERANCE_MM);
            }
        }
        throw new IllegalArgumentException("dxf: " + dxf + " has no closed polyline on layer "
                + String.join(" or ", DEFAULT_LAYERS));
    }

    /** Reads the largest closed polyline on {@code layer} (case-insensitive), flattening arcs within 0.1 mm. */
    public static RemnantOutline read(Path dxf, String layer) {
        return read(dxf, layer, DEFAULT_CHORD_TOLERANCE_MM);
    }

    /**
     * Reads the largest closed polyline on {@code layer}, flattening arcs to within {@code chordToleranceMm}.
     *
     * @throws IllegalArgumentException if the file is missing or malformed, the layer has no closed
     *                                  polyline, or the outline is not a simple polygon
     */
    public static RemnantOutline read(Path dxf, String layer, double chordToleranceMm) {
        if (layer == null || layer.isBlank()) {
            throw new IllegalArgumentException("layer: '" + layer + "' must be a layer name");
        }
        if (!(chordToleranceMm > 0.0) || !Double.isFinite(chordToleranceMm)) {
            throw new IllegalArgumentException("chordToleranceMm: " + chordToleranceMm + " must be > 0");
        }
        return largest(dxf, DxfPolylineReader.read(dxf), layer, chordToleranceMm);
    }

    private static RemnantOutline largest(Path dxf, List<ReadPolyline> all, String layer, double tolerance) {
        RemnantOutline best = null;
        for (ReadPolyline p : all) {
            if (!p.isClosed() || !p.layer().equalsIgnoreCase(layer)) {
                continue;
            }
            RemnantOutline outline;
            try {
                outline = RemnantOutline.of(points(p.flatten(tolerance)));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("dxf: " + dxf + " line " + p.line() + ", layer " + p.layer()
                        + ": " + e.getMessage(), e);
            }
            if (best == null || outline.areaMm2() > best.areaMm2()) {
                best = outline;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("dxf: " + dxf + " has no closed polyline on layer " + layer);
        }
        return best;
    }

    private static List<OutlinePoint> points(List<double[]> xy) {
        List<OutlinePoint> out = new ArrayList<>();
        for (double[] p : xy) {
            out.add(OutlinePoint.of(p[0], p[1]));
        }
        return out;
    }
}
