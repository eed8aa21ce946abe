package dev.sheetwright.core.cutpath;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class CutPlannerTest {

    private static final Tolerance TOL = Tolerance.INCH;
    private static final double KERF = 0.06;
    private static final Box2 SHEET = new Box2(0, 0, 120, 48);
    private static final CutPathSettings PATH = new CutPathSettings(KERF, 0.1875, 0.0625, KerfCompensation.PATH);

    private static Contour rect(double x, double y, double w, double h) {
        return Contour.polygon(List.of(new Point2(x, y), new Point2(x + w, y), new Point2(x + w, y + h),
                new Point2(x, y + h)), TOL);
    }

    private static Contour circle(Point2 c, double r) {
        return Contour.of(List.of(new Arc(c, r, 0, Math.PI), new Arc(c, r, Math.PI, Math.PI)), TOL);
    }

    private static Pattern part(String id, Contour outer, List<Contour> holes) {
        return new Pattern(id, "blank", 1, outer, holes, List.of(), outer.bounds().centre());
    }

    private static List<String> names(List<Pattern> parts) {
        return parts.stream().map(Pattern::key).toList();
    }

    /** A frame with a square hole holding a small part, and a plate with a round hole beside it (invented). */
    private static List<Pattern> sheet() {
        Pattern frame = part("FRAME", rect(2, 2, 20, 20), List.of(rect(6, 6, 12, 12)));
        Pattern inner = part("INNER", rect(8, 8, 8, 8), List.of());
        Pattern plate = part("PLATE", rect(30, 2, 10, 10), List.of(circle(new Point2(35, 7), 2)));
        return List.of(frame, inner, plate);
    }

    @Test
    void plan_partInAHole_isCutBeforeTheHoleAndHolesBeforeTheirOutline() {
        List<Pattern> parts = sheet();
        SheetCutPlan plan = CutPlanner.plan(parts, names(parts), SHEET, PATH, TOL);

        assertEquals(5, plan.pierces());
        int inner = indexOf(plan, 1, -1);
        int frameHole = indexOf(plan, 0, 0);
        int frame = indexOf(plan, 0, -1);
        int plateHole = indexOf(plan, 2, 0);
        int plate = indexOf(plan, 2, -1);
        assertTrue(inner < frameHole && frameHole < frame, "inner part, then the hole round it, then the frame");
        assertTrue(plateHole < plate);
    }

    @Test
    void plan_everyPierceInScrap_andEveryLoopHalfAKerfIntoScrap() {
        List<Pattern> parts = sheet();
        SheetCutPlan plan = CutPlanner.plan(parts, names(parts), SHEET, PATH, TOL);
        List<PartOutline> metal = new ArrayList<>();
        for (Pattern p : parts) {
            metal.add(new PartOutline(p, TOL.chord()));
        }
        for (CutStep step : plan.steps()) {
            Point2 pierce = step.lead().pierce();
            for (PartOutline m : metal) {
                assertFalse(m.inMetal(pierce), "pierce in metal at " + pierce);
                assertTrue(m.distance(pierce) >= KERF / 2 - 1e-9, "pierce too near a part at " + pierce);
            }
            PartOutline own = metal.get(step.part());
            for (Edge e : step.toolpath().edges()) {
                assertEquals(KERF / 2, own.distance(e.start()), 2 * TOL.chord(), "loop point " + e.start());
                assertFalse(own.inMetal(e.start()), "loop inside the metal at " + e.start());
            }
            assertEquals(0.1875, step.lead().leadIn().orElseThrow().length(), 1e-9);
            assertTrue(step.lead().note().isEmpty());
        }
        assertTrue(plan.notes().isEmpty(), plan.notes()::toString);
    }

    @Test
    void plan_figuresAddUpFromTheSteps() {
        List<Pattern> parts = sheet();
        SheetCutPlan plan = CutPlanner.plan(parts, names(parts), SHEET, PATH, TOL);
        double rapids = 0;
        Point2 at = Point2.ORIGIN;
        for (int i = 0; i < plan.steps().size(); i++) {
            assertEquals(at, plan.rapids().get(i).start());
            assertEquals(plan.steps().get(i).lead().pierce(), plan.rapids().get(i).end());
            rapids += at.distance(plan.steps().get(i).lead().pierce());
            at = plan.steps().get(i).exit();
        }
        assertEquals(rapids, plan.rapidLength(), 1e-9);
        // outline loops are longer than the contour by 2 pi (kerf/2) (four quarter arcs), holes shorter
        Pattern inner = parts.get(1);
        CutStep innerStep = plan.steps().get(indexOf(plan, 1, -1));
        assertEquals(inner.outer().perimeter() + Math.PI * KERF, innerStep.toolpath().perimeter(), 1e-9);
    }

    @Test
    void plan_smallRoundHole_isEnteredFromItsCentre() {
        // hole of radius 0.15: a 3/16 lead from the loop would cross the far side; the centre is 0.12 from the loop
        Pattern p = part("TAB", rect(2, 2, 4, 4), List.of(circle(new Point2(4, 4), 0.15)));
        SheetCutPlan plan = CutPlanner.plan(List.of(p), List.of("TAB"), SHEET, PATH, TOL);

        CutStep hole = plan.steps().get(indexOf(plan, 0, 0));
        assertEquals(4, hole.lead().pierce().x(), 1e-6);
        assertEquals(4, hole.lead().pierce().y(), 1e-6);
        assertTrue(hole.lead().note().orElseThrow().contains("centre"));
        assertEquals(1, plan.notes().size());
    }

    @Test
    void plan_holeTooSmallForAnyLead_isPiercedOnThePathAndFlagged() {
        // without compensation the loop is the hole itself, radius 0.02: even its centre is nearer than kerf/2
        Pattern p = part("TAB", rect(2, 2, 4, 4), List.of(circle(new Point2(4, 4), 0.02)));
        CutPathSettings none = new CutPathSettings(KERF, 0.1875, 0, KerfCompensation.NONE);
        SheetCutPlan plan = CutPlanner.plan(List.of(p), List.of("TAB"), SHEET, none, TOL);

        CutStep hole = plan.steps().get(indexOf(plan, 0, 0));
        assertTrue(hole.lead().leadIn().isEmpty());
        assertTrue(plan.notes().stream().anyMatch(n -> n.contains("TAB hole 1") && n.contains("on the path")),
                plan.notes()::toString);
    }

    @Test
    void plan_noCompensation_cutsTheNominalContour() {
        List<Pattern> parts = sheet();
        CutPathSettings none = new CutPathSettings(KERF, 0.1875, 0, KerfCompensation.NONE);
        SheetCutPlan plan = CutPlanner.plan(parts, names(parts), SHEET, none, TOL);
        for (CutStep step : plan.steps()) {
            assertEquals(step.nominal().perimeter(), step.toolpath().perimeter(), 1e-9);
            assertTrue(step.lead().leadOut().isEmpty());
        }
    }

    @Test
    void plan_narrowStripOfParts_startsAtTheFarEnd() {
        List<Pattern> row = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            row.add(part("S" + i, rect(1 + 6 * i, 1, 5, 3), List.of()));
        }
        SheetCutPlan plan = CutPlanner.plan(row, names(row), SHEET, PATH, TOL);
        assertEquals(4, plan.steps().get(0).part());
        assertEquals(0, plan.steps().get(plan.steps().size() - 1).part());
    }

    private static int indexOf(SheetCutPlan plan, int part, int hole) {
        for (int i = 0; i < plan.steps().size(); i++) {
            if (plan.steps().get(i).part() == part && plan.steps().get(i).hole() == hole) {
                return i;
            }
        }
        throw new AssertionError("no step for part " + part + " hole " + hole);
    }
}
