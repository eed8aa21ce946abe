package dev.sheetwright.nest.jobs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Stock;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;
import org.locationtech.jts.operation.distance.DistanceOp;

class CleanOffcutTest {
    private static final double EPS = 1e-9;
    private static final double GAP = 1.0;
    private static final Sheet SHEET = Sheet.unlimited("100x50", 100, 50, 0);

    private static Polygon wkt(String text) {
        try {
            return (Polygon) new WKTReader().read(text);
        } catch (ParseException e) {
            throw new IllegalArgumentException(e);
        }
    }

    private static NestRequest request(Stock stock) {
        NestPiece square = NestPiece.of("S", "blank", 1, wkt("POLYGON ((0 0, 20 0, 20 20, 0 20, 0 0))"));
        return new NestRequest(List.of(square), List.of(stock), new NestRules(GAP, 0, RotationRule.none(), false, 0));
    }

    private static SheetLayout layout(Stock stock, Offcut reported) {
        return new SheetLayout(stock, 0, 20, List.of(new Placement("S", "blank", 0, 0, 0, 0, false)), reported, 0.1);
    }

    @Test
    void of_reportedOffcutCleanAndLargest_keepsIt() {
        // the part spans x 0..20 and the gap is GAP: nothing clean is wider than 100 - 20 - GAP
        Offcut reported = new Offcut(20 + GAP, 0, 80 - GAP, 50);

        Optional<Offcut> got = CleanOffcut.of(request(SHEET), layout(SHEET, reported), EPS, 0);

        assertEquals(Optional.of(reported), got);
    }

    @Test
    void of_reportedOffcutCleanButSmaller_largerCleanRectangleWins() {
        Offcut reported = new Offcut(30, 0, 70, 50);

        Optional<Offcut> got = CleanOffcut.of(request(SHEET), layout(SHEET, reported), EPS, 0);

        assertTrue(got.isPresent());
        assertTrue(got.get().width() * got.get().height() > 70 * 50, got.toString());
        assertTrue(CleanOffcut.isClean(request(SHEET), layout(SHEET, reported), got.get(), EPS));
    }

    @Test
    void of_reportedOffcutOverlapsPart_replacedByLargestCleanRectangle() {
        Offcut overlapping = new Offcut(10, 0, 90, 50);

        Offcut got = CleanOffcut.of(request(SHEET), layout(SHEET, overlapping), EPS, 0).orElseThrow();

        assertEquals(21, got.x(), EPS);
        assertEquals(0, got.y(), EPS);
        assertEquals(79, got.width(), EPS);
        assertEquals(50, got.height(), EPS);
    }

    @Test
    void of_noReportedOffcut_allowanceWidensTheClearance() {
        Offcut got = CleanOffcut.of(request(SHEET), layout(SHEET, null), EPS, 0.5).orElseThrow();

        assertEquals(21.5, got.x(), EPS);
        assertEquals(78.5, got.width(), EPS);
    }

    @Test
    void of_lShapedRemnant_rectangleInsideOutlineAndClearOfPart() {
        Polygon l = wkt("POLYGON ((0 0, 100 0, 100 40, 40 40, 40 100, 0 100, 0 0))");
        Remnant remnant = new Remnant("R-0001", l, 0);
        SheetLayout layout = layout(remnant, null);

        Offcut got = CleanOffcut.of(request(remnant), layout, EPS, 0).orElseThrow();

        assertEquals(79 * 40, got.area(), 1e-6);
        Polygon rect = wkt(String.format(java.util.Locale.ROOT, "POLYGON ((%f %f, %f %f, %f %f, %f %f, %f %f))",
                got.x(), got.y(), got.x() + got.width(), got.y(), got.x() + got.width(), got.y() + got.height(),
                got.x(), got.y() + got.height(), got.x(), got.y()));
        assertTrue(l.buffer(1e-6).covers(rect));
        assertTrue(DistanceOp.distance(rect, wkt("POLYGON ((0 0, 20 0, 20 20, 0 20, 0 0))")) >= GAP - 1e-6);
    }

    @Test
    void isClean_rectangleOutsideStock_false() {
        assertFalse(CleanOffcut.isClean(request(SHEET), layout(SHEET, null), new Offcut(30, 0, 80, 50), EPS));
    }

    @Test
    void of_coil_noOffcut() {
        Coil coil = new Coil("coil 48", 48, 1);

        assertEquals(Optional.empty(), CleanOffcut.of(request(coil), layout(coil, new Offcut(30, 0, 10, 48)), EPS, 0));
    }

    @Test
    void of_negativeTolerance_namesIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CleanOffcut.of(request(SHEET), layout(SHEET, null), -1, 0));

        assertEquals("tolerance must be finite and >= 0, got -1.0", e.getMessage());
    }
}
