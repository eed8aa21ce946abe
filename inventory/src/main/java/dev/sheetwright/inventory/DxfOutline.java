package dev.sheetwright.inventory;

import dev.sheetwright.core.units.LengthUnit;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a remnant outline from an ASCII DXF file: the largest closed polyline ({@code POLYLINE} with
 * {@code VERTEX}/{@code SEQEND}, or {@code LWPOLYLINE}) on a layer of the ENTITIES section. Arc segments
 * (bulges) are flattened to chords no further than a chord tolerance from the arc.
 *
 * <p>Coordinates are taken as millimetres unless the header's {@code $INSUNITS} says inches (1),
 * centimetres (5) or metres (6). Only what an offcut outline needs is read; everything else is skipped.
 */
public final class DxfOutline {
    /** Layers tried, in order, by {@link #read(Path)}. */
    public static final List<String> DEFAULT_LAYERS = List.of("SHEET", "CUT");
    /** Default largest distance between an arc and the chords replacing it, mm. */
    public static final double DEFAULT_CHORD_TOLERANCE_MM = 0.1;

    private static final double CLOSE_MM = 1e-6;

    private DxfOutline() {
    }

    /** Reads the largest closed polyline on layer SHEET, or else on layer CUT. */
    public static RemnantOutline read(Path dxf) {
        List<Polyline> all = parse(dxf);
        for (String layer : DEFAULT_LAYERS) {
            if (all.stream().anyMatch(p -> p.isClosed() && p.layer.equalsIgnoreCase(layer))) {
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
        return largest(dxf, parse(dxf), layer, chordToleranceMm);
    }

    private static RemnantOutline largest(Path dxf, List<Polyline> all, String layer, double tolerance) {
        RemnantOutline best = null;
        for (Polyline p : all) {
            if (!p.isClosed() || !p.layer.equalsIgnoreCase(layer)) {
                continue;
            }
            RemnantOutline outline;
            try {
                outline = RemnantOutline.of(p.flatten(tolerance));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("dxf: " + dxf + " line " + p.line + ", layer " + p.layer
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

    /** A polyline as read: vertices in mm, with the bulge of the segment leaving each vertex. */
    private static final class Polyline {
        final int line;
        final boolean lightweight;
        final List<double[]> vertices = new ArrayList<>();
        String layer = "0";
        boolean closed;

        Polyline(int line, boolean lightweight) {
            this.line = line;
            this.lightweight = lightweight;
        }

        /** Flagged closed, or drawn back to its first point. */
        boolean isClosed() {
            int n = vertices.size();
            return closed || (n >= 4 && Math.hypot(vertices.get(0)[0] - vertices.get(n - 1)[0],
                    vertices.get(0)[1] - vertices.get(n - 1)[1]) < CLOSE_MM);
        }

        List<OutlinePoint> flatten(double tolerance) {
            List<double[]> v = new ArrayList<>(vertices);
            int n = v.size();
            if (n > 1 && Math.hypot(v.get(0)[0] - v.get(n - 1)[0], v.get(0)[1] - v.get(n - 1)[1]) < CLOSE_MM) {
                v.remove(n - 1);
                n--;
            }
            List<OutlinePoint> out = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                double[] a = v.get(i);
                double[] b = v.get((i + 1) % n);
                add(out, a[0], a[1]);
                if (a[2] != 0.0) {
                    arc(out, a, b, tolerance);
                }
            }
            return out;
        }

        private static void arc(List<OutlinePoint> out, double[] a, double[] b, double tolerance) {
            double dx = b[0] - a[0];
            double dy = b[1] - a[1];
            double c = Math.hypot(dx, dy);
            if (c < CLOSE_MM) {
                return;
            }
            double bulge = a[2];
            double sweep = 4.0 * Math.atan(bulge);
            double h = c * (1.0 - bulge * bulge) / (4.0 * bulge);
            double cx = (a[0] + b[0]) / 2.0 - h * dy / c;
            double cy = (a[1] + b[1]) / 2.0 + h * dx / c;
            double r = Math.hypot(a[0] - cx, a[1] - cy);
            double step = tolerance >= r ? Math.PI : 2.0 * Math.acos(1.0 - tolerance / r);
            int segments = Math.max(1, (int) Math.ceil(Math.abs(sweep) / step));
            double start = Math.atan2(a[1] - cy, a[0] - cx);
            for (int k = 1; k < segments; k++) {
                double t = start + sweep * k / segments;
                add(out, cx + r * Math.cos(t), cy + r * Math.sin(t));
            }
        }

        private static void add(List<OutlinePoint> out, double x, double y) {
            if (!out.isEmpty()) {
                OutlinePoint last = out.get(out.size() - 1);
                if (Math.hypot(last.x() - x, last.y() - y) < CLOSE_MM) {
                    return;
                }
            }
            out.add(OutlinePoint.of(x, y));
        }
    }

    private static List<Polyline> parse(Path dxf) {
        List<String> lines;
        try {
            lines = Files.readAllLines(dxf, StandardCharsets.ISO_8859_1);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException("dxf: no such file " + dxf);
        } catch (IOException e) {
            throw new UncheckedIOException("dxf: cannot read " + dxf + ": " + e.getMessage(), e);
        }
        if (lines.size() % 2 != 0) {
            lines = lines.subList(0, lines.size() - 1);
        }
        int count = lines.size() / 2;
        int[] codes = new int[count];
        String[] values = new String[count];
        for (int i = 0; i < count; i++) {
            try {
                codes[i] = Integer.parseInt(lines.get(2 * i).strip());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("dxf: " + dxf + " line " + (2 * i + 1) + ": '"
                        + lines.get(2 * i).strip() + "' is not a group code; is this an ASCII DXF file?");
            }
            values[i] = lines.get(2 * i + 1).strip();
        }
        double scale = 1.0;
        String section = "";
        List<Polyline> found = new ArrayList<>();
        Polyline open = null;
        Polyline current = null;
        boolean inVertex = false;
        double[] vertex = null;
        for (int i = 0; i < count; i++) {
            int code = codes[i];
            String value = values[i];
            if (code == 0) {
                if (inVertex && vertex != null && open != null) {
                    open.vertices.add(vertex);
                }
                inVertex = false;
                vertex = null;
                current = null;
                String type = value.toUpperCase(Locale.ROOT);
                if (type.equals("SECTION") && i + 1 < count && codes[i + 1] == 2) {
                    section = values[i + 1].toUpperCase(Locale.ROOT);
                } else if (type.equals("ENDSEC")) {
                    section = "";
                } else if (section.equals("ENTITIES")) {
                    switch (type) {
                        case "POLYLINE" -> {
                            open = new Polyline(2 * i + 1, false);
                            current = open;
                            found.add(open);
                        }
                        case "LWPOLYLINE" -> {
                            current = new Polyline(2 * i + 1, true);
                            found.add(current);
                        }
                        case "VERTEX" -> {
                            inVertex = open != null;
                            vertex = new double[3];
                        }
                        case "SEQEND" -> open = null;
                        default -> { }
                    }
                }
                continue;
            }
            if (section.equals("HEADER") && code == 9 && value.equalsIgnoreCase("$INSUNITS")
                    && i + 1 < count && codes[i + 1] == 70) {
                scale = unitScale(dxf, values[i + 1]);
            }
            if (inVertex && vertex != null) {
                switch (code) {
                    case 10 -> vertex[0] = number(dxf, i, value) * scale;
                    case 20 -> vertex[1] = number(dxf, i, value) * scale;
                    case 42 -> vertex[2] = number(dxf, i, value);
                    default -> { }
                }
            } else if (current != null) {
                readPolylineField(dxf, current, i, code, value, scale);
            }
        }
        return found;
    }

    private static void readPolylineField(Path dxf, Polyline p, int i, int code, String value, double scale) {
        switch (code) {
            case 8 -> p.layer = value;
            case 70 -> p.closed = (((int) number(dxf, i, value)) & 1) != 0;
            case 10 -> {
                if (p.lightweight) {
                    p.vertices.add(new double[] {number(dxf, i, value) * scale, 0.0, 0.0});
                }
            }
            case 20 -> {
                if (p.lightweight) {
                    last(dxf, p, i)[1] = number(dxf, i, value) * scale;
                }
            }
            case 42 -> {
                if (p.lightweight) {
                    last(dxf, p, i)[2] = number(dxf, i, value);
                }
            }
            default -> { }
        }
    }

    private static double[] last(Path dxf, Polyline p, int i) {
        if (p.vertices.isEmpty()) {
            throw new IllegalArgumentException("dxf: " + dxf + " line " + (2 * i + 1)
                    + ": a polyline coordinate comes before its x (group 10)");
        }
        return p.vertices.get(p.vertices.size() - 1);
    }

    private static double number(Path dxf, int pair, String value) {
        try {
            return Double.parseDouble(value);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("dxf: " + dxf + " line " + (2 * pair + 2) + ": '" + value
                    + "' is not a number");
        }
    }

    private static double unitScale(Path dxf, String code) {
        return switch (code.strip()) {
            case "0", "4" -> 1.0;
            case "1" -> LengthUnit.INCH.mmPerUnit();
            case "5" -> 10.0;
            case "6" -> 1000.0;
            default -> throw new IllegalArgumentException("dxf: " + dxf + " $INSUNITS " + code
                    + " is not supported; use 0 (unitless, read as mm), 1 (in), 4 (mm), 5 (cm) or 6 (m)");
        };
    }
}
