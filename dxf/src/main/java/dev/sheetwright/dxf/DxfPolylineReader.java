package dev.sheetwright.dxf;

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
 * Reads the polylines of an ASCII DXF file's ENTITIES section ({@code POLYLINE} with {@code VERTEX}/{@code SEQEND},
 * or {@code LWPOLYLINE}), in millimetres. Everything else is skipped.
 *
 * <p>The drawing unit is the header's {@code $INSUNITS} when it says inches (1), millimetres (4), centimetres (5)
 * or metres (6), or the unit comment this module's writer puts at the top of R12 files
 * ({@link DrawingUnit#fromDxfComment}); otherwise millimetres.
 */
public final class DxfPolylineReader {
    /** Points nearer than this are one point, mm. */
    public static final double JOIN_MM = 1e-6;

    private static final double MM_PER_INCH = 25.4;

    private DxfPolylineReader() {
    }

    /**
     * Every polyline of the file, in file order.
     *
     * @throws IllegalArgumentException naming the file and line when the file is missing or not an ASCII DXF
     * @throws UncheckedIOException     when it cannot be read
     */
    public static List<ReadPolyline> read(Path dxf) {
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
        return new Parse(dxf, codes, values).run();
    }

    /** One pass over the group pairs. */
    private static final class Parse {
        private final Path dxf;
        private final int[] codes;
        private final String[] values;
        private final List<Building> found = new ArrayList<>();
        private double scale = 1.0;

        Parse(Path dxf, int[] codes, String[] values) {
            this.dxf = dxf;
            this.codes = codes;
            this.values = values;
        }

        List<ReadPolyline> run() {
            String section = "";
            Building open = null;
            Building current = null;
            double[] vertex = null;
            for (int i = 0; i < codes.length; i++) {
                int code = codes[i];
                String value = values[i];
                if (code == 999 && i == 0) {
                    DrawingUnit u = DrawingUnit.fromDxfComment(value);
                    scale = u == DrawingUnit.INCH ? MM_PER_INCH : 1.0;
                }
                if (code == 0) {
                    if (vertex != null && open != null) {
                        open.vertices.add(vertex);
                    }
                    vertex = null;
                    current = null;
                    String type = value.toUpperCase(Locale.ROOT);
                    if (type.equals("SECTION") && i + 1 < codes.length && codes[i + 1] == 2) {
                        section = values[i + 1].toUpperCase(Locale.ROOT);
                    } else if (type.equals("ENDSEC")) {
                        section = "";
                    } else if (section.equals("ENTITIES")) {
                        switch (type) {
                            case "POLYLINE" -> {
                                open = new Building(2 * i + 1, false);
                                current = open;
                                found.add(open);
                            }
                            case "LWPOLYLINE" -> {
                                current = new Building(2 * i + 1, true);
                                found.add(current);
                            }
                            case "VERTEX" -> vertex = open != null ? new double[3] : null;
                            case "SEQEND" -> open = null;
                            default -> { }
                        }
                    }
                    continue;
                }
                if (section.equals("HEADER") && code == 9 && value.equalsIgnoreCase("$INSUNITS")
                        && i + 1 < codes.length && codes[i + 1] == 70) {
                    scale = unitScale(values[i + 1]);
                }
                if (vertex != null) {
                    switch (code) {
                        case 10 -> vertex[0] = number(i, value) * scale;
                        case 20 -> vertex[1] = number(i, value) * scale;
                        case 42 -> vertex[2] = number(i, value);
                        default -> { }
                    }
                } else if (current != null) {
                    polylineField(current, i, code, value);
                }
            }
            List<ReadPolyline> out = new ArrayList<>();
            for (Building b : found) {
                List<Vertex> vs = new ArrayList<>();
                for (double[] v : b.vertices) {
                    vs.add(new Vertex(v[0], v[1], v[2]));
                }
                out.add(new ReadPolyline(b.layer, b.line, b.closed, vs, JOIN_MM));
            }
            return out;
        }

        private void polylineField(Building p, int i, int code, String value) {
            switch (code) {
                case 8 -> p.layer = value;
                case 70 -> p.closed = (((int) number(i, value)) & 1) != 0;
                case 10 -> {
                    if (p.lightweight) {
                        p.vertices.add(new double[] {number(i, value) * scale, 0.0, 0.0});
                    }
                }
                case 20 -> {
                    if (p.lightweight) {
                        last(p, i)[1] = number(i, value) * scale;
                    }
                }
                case 42 -> {
                    if (p.lightweight) {
                        last(p, i)[2] = number(i, value);
                    }
                }
                default -> { }
            }
        }

        private double[] last(Building p, int i) {
            if (p.vertices.isEmpty()) {
                throw new IllegalArgumentException("dxf: " + dxf + " line " + (2 * i + 1)
                        + ": a polyline coordinate comes before its x (group 10)");
            }
            return p.vertices.get(p.vertices.size() - 1);
        }

        private double number(int pair, String value) {
            try {
                double v = Double.parseDouble(value);
                if (!Double.isFinite(v)) {
                    throw new NumberFormatException(value);
                }
                return v;
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("dxf: " + dxf + " line " + (2 * pair + 2) + ": '" + value
                        + "' is not a number");
            }
        }

        private double unitScale(String code) {
            return switch (code.strip()) {
                case "0", "4" -> 1.0;
                case "1" -> MM_PER_INCH;
                case "5" -> 10.0;
                case "6" -> 1000.0;
                default -> throw new IllegalArgumentException("dxf: " + dxf + " $INSUNITS " + code
                        + " is not supported; use 0 (unitless, read as mm), 1 (in), 4 (mm), 5 (cm) or 6 (m)");
            };
        }
    }

    /** A polyline being read. */
    private static final class Building {
        final int line;
        final boolean lightweight;
        final List<double[]> vertices = new ArrayList<>();
        String layer = "0";
        boolean closed;

        Building(int line, boolean lightweight) {
            this.line = line;
            this.lightweight = lightweight;
        }
    }
}
