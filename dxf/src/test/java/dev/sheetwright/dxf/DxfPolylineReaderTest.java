package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading polylines back: what the writer writes comes back in mm; bulges flatten within the tolerance. */
class DxfPolylineReaderTest {
    private static final double EPS = 1e-9;

    @TempDir
    Path dir;

    @Test
    void read_inchDrawingFromOurWriter_comesBackInMillimetres() {
        Path f = dir.resolve("a.dxf");
        DxfWriter.write(Drawing.of("in", List.of(Layer.of("SHEET", 7)), List.of(new Polyline("SHEET",
                List.of(Vertex.of(0, 0), Vertex.of(10, 0), Vertex.of(10, 5), Vertex.of(0, 5)), true))), f);
        List<ReadPolyline> read = DxfPolylineReader.read(f);
        assertEquals(1, read.size());
        ReadPolyline p = read.get(0);
        assertEquals("SHEET", p.layer());
        assertTrue(p.isClosed());
        List<double[]> pts = p.flatten(0.1);
        assertEquals(4, pts.size());
        assertEquals(10 * 25.4, pts.get(1)[0], EPS);
        assertEquals(5 * 25.4, pts.get(2)[1], EPS);
    }

    @Test
    void flatten_halfCircleBulge_everyChordWithinTolerance() throws Exception {
        // a 100 mm wide slot end: from (100, 0) to (0, 0) with bulge 1 is a half circle of radius 50 about (50, 0)
        Path f = dir.resolve("b.dxf");
        Files.writeString(f, String.join("\n", "0", "SECTION", "2", "ENTITIES", "0", "LWPOLYLINE", "8", "CUT",
                "70", "1", "10", "0", "20", "0", "10", "100", "20", "0", "42", "1", "0", "ENDSEC", "0", "EOF", ""));
        double tol = 0.1;
        List<double[]> pts = DxfPolylineReader.read(f).get(0).flatten(tol);
        assertTrue(pts.size() > 10, "arc flattened to " + pts.size() + " points");
        for (int i = 1; i < pts.size(); i++) {
            double[] a = pts.get(i);
            assertEquals(50, Math.hypot(a[0] - 50, a[1]), 1e-6, "point on the circle");
            double[] b = pts.get((i + 1) % pts.size());
            if (b[1] != 0 || a[1] != 0) {
                double mx = (a[0] + b[0]) / 2 - 50;
                double my = (a[1] + b[1]) / 2;
                assertTrue(50 - Math.hypot(mx, my) <= tol + EPS, "sagitta within tolerance");
            }
        }
    }

    @Test
    void read_textThatIsNoDxf_namesTheFileAndLine() throws Exception {
        Path f = dir.resolve("c.dxf");
        Files.writeString(f, "hello\nworld\n");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DxfPolylineReader.read(f));
        assertTrue(e.getMessage().contains(f + " line 1"), e.getMessage());
    }
}
