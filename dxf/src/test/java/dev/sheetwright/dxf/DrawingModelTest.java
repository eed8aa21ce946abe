package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Validation of the value records: every rejected input gets an exact message. */
class DrawingModelTest {

    private static void assertRejected(String message, Executable construct) {
        assertEquals(message, assertThrows(IllegalArgumentException.class, construct).getMessage());
    }

    @Test
    void vertex_nonFiniteNumbers_rejected() {
        assertRejected("Vertex.x must be a finite number, got NaN", () -> Vertex.of(Double.NaN, 0));
        assertRejected("Vertex.y must be a finite number, got Infinity", () -> Vertex.of(0, Double.POSITIVE_INFINITY));
        assertRejected("Vertex.bulge must be a finite number, got -Infinity",
                () -> Vertex.of(0, 0, Double.NEGATIVE_INFINITY));
    }

    @Test
    void polyline_tooFewVertices_rejected() {
        assertRejected("Polyline.vertices must hold at least 2 vertices, got 1",
                () -> new Polyline("CUT", List.of(Vertex.of(0, 0)), false));
    }

    @Test
    void polyline_repeatedVertex_rejectedAsZeroLengthSegment() {
        assertRejected("Polyline.vertices[2] repeats vertices[1] at (1.0, 0.0): zero-length segment",
                () -> new Polyline("CUT", List.of(Vertex.of(0, 0), Vertex.of(1, 0), Vertex.of(1, 0, 0.5)), false));
    }

    @Test
    void polyline_closedRepeatingFirstVertex_rejected() {
        assertRejected("Polyline.vertices[3] repeats vertices[0] at (0.0, 0.0): a closed polyline must not repeat"
                        + " its first vertex, the closed flag makes the closing segment",
                () -> new Polyline("CUT", List.of(Vertex.of(0, 0), Vertex.of(1, 0), Vertex.of(1, 1),
                        Vertex.of(0, 0)), true));
    }

    @Test
    void polyline_openWithBulgeOnLastVertex_rejected() {
        assertRejected("Polyline.vertices[1].bulge must be 0 on an open polyline (no segment follows the last"
                        + " vertex), got 0.5",
                () -> new Polyline("CUT", List.of(Vertex.of(0, 0), Vertex.of(1, 0, 0.5)), false));
    }

    @Test
    void polyline_nullVertex_rejectedWithIndex() {
        List<Vertex> vs = new ArrayList<>(List.of(Vertex.of(0, 0), Vertex.of(1, 0)));
        vs.add(null);
        assertEquals("Polyline.vertices[2] must not be null",
                assertThrows(NullPointerException.class, () -> new Polyline("CUT", vs, false)).getMessage());
    }

    @Test
    void polyline_sourceListChangedAfterwards_keepsItsOwnCopy() {
        List<Vertex> vs = new ArrayList<>(List.of(Vertex.of(0, 0), Vertex.of(1, 0)));
        Polyline p = new Polyline("CUT", vs, false);
        vs.add(Vertex.of(2, 2));
        assertEquals(2, p.vertices().size());
        assertThrows(UnsupportedOperationException.class, () -> p.vertices().add(Vertex.of(3, 3)));
    }

    @Test
    void polyline_segmentCount_closedHasClosingSegment() {
        List<Vertex> vs = List.of(Vertex.of(0, 0), Vertex.of(1, 0), Vertex.of(1, 1));
        assertEquals(3, new Polyline("CUT", vs, true).segmentCount());
        assertEquals(2, new Polyline("CUT", vs, false).segmentCount());
    }

    @Test
    void line_samePoints_rejected() {
        assertRejected("Line end points must differ, got (1.0, 2.0) twice", () -> new Line("MARK", 1, 2, 1, 2));
        assertRejected("Line.x2 must be a finite number, got NaN", () -> new Line("MARK", 1, 2, Double.NaN, 2));
    }

    @Test
    void text_badHeightOrValue_rejected() {
        assertRejected("Text.height must be finite and > 0, got 0.0", () -> new Text("LABEL", 0, 0, 0, "P1"));
        assertRejected("Text.height must be finite and > 0, got NaN", () -> new Text("LABEL", 0, 0, Double.NaN, "P1"));
        assertRejected("Text.value must not be blank, got \" \t\"", () -> new Text("LABEL", 0, 0, 3, " \t"));
        assertEquals("Text.value must not be null",
                assertThrows(NullPointerException.class, () -> new Text("LABEL", 0, 0, 3, null)).getMessage());
    }

    @Test
    void layer_badNameOrColour_rejected() {
        assertRejected("Layer.name must be 1 to 31 characters of A-Z 0-9 _ - $, got \"cut\"", () -> Layer.of("cut", 7));
        assertRejected("Layer.name must be 1 to 31 characters of A-Z 0-9 _ - $, got \"CUT \"",
                () -> Layer.of("CUT ", 7));
        assertRejected("Layer.name must be 1 to 31 characters of A-Z 0-9 _ - $, got \"\"", () -> Layer.of("", 7));
        String name32 = "A".repeat(32);
        assertRejected("Layer.name must be 1 to 31 characters of A-Z 0-9 _ - $, got \"" + name32 + "\"",
                () -> Layer.of(name32, 7));
        assertRejected("Layer.color must be an ACI colour 1..255, got 0", () -> Layer.of("CUT", 0));
        assertRejected("Layer.color must be an ACI colour 1..255, got 256", () -> Layer.of("CUT", 256));
        assertEquals("$CUT-2_A", Layer.of("$CUT-2_A", 255).name());
        assertEquals(31, Layer.of("A".repeat(31), 1).name().length());
    }

    @Test
    void drawing_undeclaredLayer_rejectedNamingShapeAndLayers() {
        assertRejected("Drawing.shapes[1].layer \"MARK\" is not declared; declared layers: [CUT, LABEL]",
                () -> Drawing.of("mm", List.of(Fixtures.CUT, Fixtures.LABEL),
                        List.of(Fixtures.circle("CUT", 0, 0, 1), new Line("MARK", 0, 0, 1, 1))));
    }

    @Test
    void drawing_duplicateLayerOrNoShapes_rejected() {
        assertRejected("Drawing.layers declares layer \"CUT\" twice",
                () -> Drawing.of("mm", List.of(Fixtures.CUT, Layer.of("CUT", 1)), List.of(Fixtures.circle("CUT", 0, 0, 1))));
        assertRejected("Drawing.shapes must hold at least 1 shape, got 0",
                () -> Drawing.of("mm", List.of(Fixtures.CUT), List.of()));
    }

    @Test
    void drawingUnit_fromSymbol_onlyInchOrMillimetre() {
        assertEquals(DrawingUnit.INCH, DrawingUnit.fromSymbol("in"));
        assertEquals(DrawingUnit.MILLIMETRE, DrawingUnit.fromSymbol("mm"));
        assertRejected("units must be \"in\" or \"mm\", got \"ft\"", () -> DrawingUnit.fromSymbol("ft"));
        assertRejected("units must be \"in\" or \"mm\", got \"MM\"", () -> Drawing.of("MM", List.of(), List.of()));
    }

    @Test
    void bounds_minAboveMax_rejected() {
        assertRejected("Bounds.minX must be <= maxX 0.0, got 1.0", () -> new Bounds(1, 0, 0, 0));
        assertRejected("margin must be >= 0, got -1.0", () -> Bounds.of(0, 0).expand(-1));
    }
}
