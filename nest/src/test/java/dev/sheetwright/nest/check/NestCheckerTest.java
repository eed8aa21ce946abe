package dev.sheetwright.nest.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;

import org.junit.jupiter.api.Test;

import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;
import dev.sheetwright.nest.testing.Shapes;

/** Planted faults must be caught; a hand-made good nest must pass. Rules here are test choices (common practice). */
class NestCheckerTest {
    private static final Sheet SHEET = new Sheet("48x120", 120, 48, OptionalInt.empty(), 100);
    private static final NestRules RULES = new NestRules(0.25, 0.5, RotationRule.quarter(), false, 0.01);
    private static final NestRequest REQUEST = new NestRequest(
            List.of(NestPiece.of("elbow", "gore", 2, Shapes.rect(0, 0, 10, 5)), NestPiece.of("tee", "collar", 1, Shapes.frame(12, 6))),
            List.of(SHEET), RULES);

    private static List<Placement> goodParts() {
        List<Placement> p = new ArrayList<>();
        p.add(new Placement("elbow", "gore", 0, 1, 1, 0, false));
        p.add(new Placement("elbow", "gore", 1, 11.5, 1, 0, false));
        p.add(new Placement("tee", "collar", 0, 22, 1, 0, false));
        return p;
    }

    private static NestResult result(List<Placement> parts, List<Unplaced> unplaced) {
        return new NestResult(List.of(new SheetLayout(SHEET, 0, 34.5, parts, null, 0.1)), unplaced);
    }

    private static List<Violation.Kind> kinds(List<Violation> v) {
        return v.stream().map(Violation::kind).toList();
    }

    @Test
    void check_goodNest_noViolation() {
        assertEquals(List.of(), NestChecker.check(REQUEST, result(goodParts(), List.of())));
    }

    @Test
    void check_partInsideHoleKeepingGap_noViolation() {
        NestRequest req = new NestRequest(List.of(NestPiece.of("a", "ring", 1, Shapes.frame(12, 6)),
                NestPiece.of("a", "disc", 1, Shapes.rect(0, 0, 5, 5))), List.of(SHEET), RULES);
        List<Placement> parts = List.of(new Placement("a", "ring", 0, 1, 1, 0, false), new Placement("a", "disc", 0, 4.5, 4.5, 0, false));
        assertEquals(List.of(), NestChecker.check(req, result(parts, List.of())));
    }

    @Test
    void check_overlap_reported() {
        List<Placement> parts = goodParts();
        parts.set(1, new Placement("elbow", "gore", 1, 6, 1, 0, false));
        List<Violation> v = NestChecker.check(REQUEST, result(parts, List.of()));
        assertEquals(List.of(Violation.Kind.OVERLAP), kinds(v));
        assertTrue(v.get(0).message().contains("elbow/gore copy 0 on layout 0 and elbow/gore copy 1 are 0.00000 apart"), v.toString());
    }

    @Test
    void check_closerThanGap_reported() {
        List<Placement> parts = goodParts();
        parts.set(1, new Placement("elbow", "gore", 1, 11.1, 1, 0, false));
        assertEquals(List.of(Violation.Kind.TOO_CLOSE), kinds(NestChecker.check(REQUEST, result(parts, List.of()))));
    }

    @Test
    void check_overMargin_reported() {
        List<Placement> parts = goodParts();
        parts.set(0, new Placement("elbow", "gore", 0, 0.2, 1, 0, false));
        List<Violation> v = NestChecker.check(REQUEST, result(parts, List.of()));
        assertEquals(List.of(Violation.Kind.MARGIN), kinds(v));
        assertTrue(v.get(0).message().contains("must stay within x 0.500000..119.500"), v.toString());
    }

    @Test
    void check_forbiddenRotation_reported() {
        List<Placement> parts = goodParts();
        parts.set(0, new Placement("elbow", "gore", 0, 1 + 10 * Math.cos(Math.toRadians(45)), 1, 45, false));
        List<Violation> v = NestChecker.check(REQUEST, result(parts, List.of()));
        assertTrue(kinds(v).contains(Violation.Kind.ROTATION), v.toString());
    }

    @Test
    void check_mirrorNotAllowed_reported() {
        List<Placement> parts = goodParts();
        parts.set(0, new Placement("elbow", "gore", 0, 11, 1, 0, true));
        assertEquals(List.of(Violation.Kind.MIRROR), kinds(NestChecker.check(REQUEST, result(parts, List.of()))));
    }

    @Test
    void check_missingPiece_reported() {
        List<Placement> parts = goodParts();
        parts.remove(2);
        List<Violation> v = NestChecker.check(REQUEST, result(parts, List.of()));
        assertEquals(List.of(Violation.Kind.MISSING), kinds(v));
        assertEquals("copy 0 of tee/collar is neither placed nor listed as unplaced", v.get(0).message());
    }

    @Test
    void check_duplicatedPiece_reported() {
        List<Placement> parts = goodParts();
        List<Violation> v = NestChecker.check(REQUEST, result(parts, List.of(new Unplaced("tee", "collar", 0, "test"))));
        assertEquals(List.of(Violation.Kind.DUPLICATE), kinds(v));
        assertEquals("copy 0 of tee/collar appears 2 times", v.get(0).message());
    }

    @Test
    void check_unknownCopy_reported() {
        List<Placement> parts = goodParts();
        parts.add(new Placement("elbow", "gore", 2, 40, 1, 0, false));
        assertEquals(List.of(Violation.Kind.UNKNOWN_PIECE), kinds(NestChecker.check(REQUEST, result(parts, List.of()))));
    }

    @Test
    void check_partOffSheet_reported() {
        List<Placement> parts = goodParts();
        parts.set(2, new Placement("tee", "collar", 0, 115, 1, 0, false));
        assertEquals(List.of(Violation.Kind.MARGIN), kinds(NestChecker.check(REQUEST, result(parts, List.of()))));
    }
}
