package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DxfOutlineTest {
    private static final double EPS = 1e-9;

    @TempDir
    Path dir;

    /** Joins group code / value pairs into DXF text, one item per line. */
    private Path dxf(String name, String... pairs) throws Exception {
        return Files.writeString(dir.resolve(name), String.join("\r\n", pairs) + "\r\n");
    }

    private static String[] polyline(String layer, int flags, double... xy) {
        List<String> out = new java.util.ArrayList<>(List.of("0", "POLYLINE", "8", layer, "66", "1",
                "10", "0.0", "20", "0.0", "30", "0.0", "70", Integer.toString(flags)));
        for (int i = 0; i < xy.length; i += 2) {
            out.addAll(List.of("0", "VERTEX", "8", layer, "10", Double.toString(xy[i]),
                    "20", Double.toString(xy[i + 1]), "30", "0.0"));
        }
        out.addAll(List.of("0", "SEQEND", "8", layer));
        return out.toArray(String[]::new);
    }

    private static String[] file(String[]... entities) {
        List<String> out = new java.util.ArrayList<>(List.of("0", "SECTION", "2", "HEADER", "9", "$ACADVER",
                "1", "AC1009", "0", "ENDSEC", "0", "SECTION", "2", "ENTITIES"));
        for (String[] e : entities) {
            out.addAll(List.of(e));
        }
        out.addAll(List.of("0", "ENDSEC", "0", "EOF"));
        return out.toArray(String[]::new);
    }

    @Test
    void read_r12Polylines_takesLargestClosedOnSheetLayer() throws Exception {
        Path f = dxf("offcut.dxf", file(
                polyline("CUT", 1, 0, 0, 3000, 0, 3000, 3000, 0, 3000),
                polyline("SHEET", 1, 10, 10, 110, 10, 110, 60, 10, 60),
                polyline("SHEET", 1, 100, 200, 1300, 200, 1300, 500, 700, 500, 700, 800, 100, 800),
                polyline("SHEET", 0, 0, 0, 5000, 0, 5000, 5000)));

        RemnantOutline o = DxfOutline.read(f);

        assertEquals(1200, o.widthMm(), EPS);
        assertEquals(600, o.heightMm(), EPS);
        assertEquals(1200 * 300 + 600 * 300, o.areaMm2(), EPS);
        assertEquals(6, o.vertices().size());
        assertEquals(OutlinePoint.of(0, 0), o.vertices().get(0));
    }

    @Test
    void read_noSheetLayer_fallsBackToCut() throws Exception {
        Path f = dxf("cut.dxf", file(polyline("cut", 1, 0, 0, 500, 0, 500, 250, 0, 250)));

        RemnantOutline o = DxfOutline.read(f);

        assertTrue(o.isRectangle());
        assertEquals(500, o.widthMm(), EPS);
        assertEquals(250, o.heightMm(), EPS);
    }

    @Test
    void read_lwpolylineWithBulge_flattensArcWithinTolerance() throws Exception {
        // 200 x 100 with the top edge replaced by a half circle of radius 100 bulging upward.
        Path f = dxf("arc.dxf", file(new String[] {"0", "LWPOLYLINE", "8", "SHEET", "90", "4", "70", "1",
                "10", "0", "20", "0", "10", "200", "20", "0", "10", "200", "20", "100", "42", "1.0",
                "10", "0", "20", "100"}));

        RemnantOutline o = DxfOutline.read(f, "SHEET", 0.1);

        double exact = 200 * 100 + Math.PI * 100 * 100 / 2;
        assertEquals(200, o.widthMm(), EPS);
        assertEquals(200, o.heightMm(), 0.1);
        assertTrue(o.areaMm2() < exact && o.areaMm2() > exact - 0.1 * 200 * Math.PI / 2 * 2,
                "area " + o.areaMm2() + " vs arc " + exact);
        for (OutlinePoint p : o.vertices()) {
            if (p.y() > 100) {
                assertEquals(100, Math.hypot(p.x() - 100, p.y() - 100), 1e-6);
            }
        }
        assertTrue(o.vertices().size() > 20, "arc was not flattened: " + o.vertices().size());
    }

    @Test
    void read_inchDrawing_isConvertedToMm() throws Exception {
        Path f = dxf("inch.dxf", "0", "SECTION", "2", "HEADER", "9", "$INSUNITS", "70", "1", "0", "ENDSEC",
                "0", "SECTION", "2", "ENTITIES", "0", "LWPOLYLINE", "8", "SHEET", "70", "1",
                "10", "0", "20", "0", "10", "48", "20", "0", "10", "48", "20", "30", "10", "0", "20", "30",
                "0", "ENDSEC", "0", "EOF");

        RemnantOutline o = DxfOutline.read(f);

        assertEquals(1219.2, o.widthMm(), EPS);
        assertEquals(762, o.heightMm(), EPS);
    }

    @Test
    void read_noClosedPolylineOnLayer_namesFileAndLayer() throws Exception {
        Path f = dxf("open.dxf", file(polyline("SHEET", 0, 0, 0, 100, 0, 100, 100)));

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DxfOutline.read(f, "SHEET"));

        assertEquals("dxf: " + f + " has no closed polyline on layer SHEET", e.getMessage());
    }

    @Test
    void read_selfIntersectingOutline_isRejected() throws Exception {
        Path f = dxf("bow.dxf", file(polyline("SHEET", 1, 0, 0, 100, 100, 100, 0, 0, 100)));

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DxfOutline.read(f));

        assertTrue(e.getMessage().startsWith("dxf: " + f + " line "), e.getMessage());
        assertTrue(e.getMessage().contains("is not a simple polygon"), e.getMessage());
    }

    @Test
    void read_binaryOrGarbage_namesTheLine() throws Exception {
        Path f = dxf("junk.dxf", "hello", "world");

        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DxfOutline.read(f));

        assertEquals("dxf: " + f + " line 1: 'hello' is not a group code; is this an ASCII DXF file?",
                e.getMessage());
    }
}
