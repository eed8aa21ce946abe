package dev.sheetwright.core.cutpath;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.units.LengthUnit;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import org.junit.jupiter.api.Test;

class GcodeProgramTest {

    private static final Tolerance TOL = Tolerance.INCH;
    private static final java.util.regex.Pattern WORD = java.util.regex.Pattern.compile("([A-Z])(-?[0-9.]+)");

    /** A plate with a round hole (invented), planned with the path compensated. */
    private static SheetCutPlan plan(KerfCompensation k) {
        Contour outer = Contour.polygon(List.of(new Point2(2, 2), new Point2(12, 2), new Point2(12, 8),
                new Point2(2, 8)), TOL);
        Point2 c = new Point2(7, 5);
        Contour hole = Contour.of(List.of(new Arc(c, 1.5, 0, Math.PI), new Arc(c, 1.5, Math.PI, Math.PI)), TOL);
        dev.sheetwright.core.geom.Pattern plate = new dev.sheetwright.core.geom.Pattern("PL", "blank", 1, outer,
                List.of(hole), List.of(), new Point2(4, 4));
        return CutPlanner.plan(List.of(plate), List.of("PL blank #1"), new Box2(0, 0, 48, 120),
                new CutPathSettings(0.06, 0.1875, 0.0625, k), TOL);
    }

    private static ProgramHead head() {
        return new ProgramHead("test job", 1, 1, "48x120", "galvanized 24 ga", "plasma",
                List.of("Check a first article (a long caution that must be wrapped onto more than one comment line"
                        + " so no block runs on too long)."));
    }

    private static GcodeProgram.Settings settings(KerfCompensation k, MachineSettings m) {
        return new GcodeProgram.Settings(LengthUnit.INCH, 250, 0.3, 0.06, k, m);
    }

    @Test
    void lines_inchProgram_hasUnitsAbsoluteOnePiercePerContourAndEndsWithTheFooter() {
        SheetCutPlan plan = plan(KerfCompensation.PATH);
        List<String> lines = GcodeProgram.lines(plan, List.of("PL blank #1"), head(),
                settings(KerfCompensation.PATH, MachineSettings.DEFAULT));

        assertTrue(lines.contains("G20"));
        assertTrue(lines.contains("G90"));
        assertEquals(2, lines.stream().filter("M03"::equals).count());
        assertEquals(2, lines.stream().filter("M05"::equals).count());
        assertEquals(2, lines.stream().filter(l -> l.equals("G4 P0.30")).count());
        assertEquals("M30", lines.get(lines.size() - 1));
        assertTrue(lines.stream().allMatch(l -> !l.startsWith("(") || l.length() <= GcodeProgram.COMMENT_WIDTH + 2));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("(CAUTION: Check a first article")));
        assertTrue(lines.stream().noneMatch(l -> l.startsWith("G41")));
    }

    @Test
    void lines_arcs_haveTheirCentreRelativeToTheStart() {
        // follow the program: every G2/G3 starts where the last move ended; start + (I, J) is the hole's centre
        List<String> lines = GcodeProgram.lines(plan(KerfCompensation.PATH), List.of("PL blank #1"), head(),
                settings(KerfCompensation.PATH, MachineSettings.DEFAULT));
        double x = 0;
        double y = 0;
        int holeArcs = 0;
        for (String line : lines) {
            if (line.startsWith("(")) {
                continue;
            }
            Matcher m = WORD.matcher(line);
            double nx = x;
            double ny = y;
            double i = 0;
            double j = 0;
            while (m.find()) {
                double v = Double.parseDouble(m.group(2));
                switch (m.group(1)) {
                    case "X" -> nx = v;
                    case "Y" -> ny = v;
                    case "I" -> i = v;
                    case "J" -> j = v;
                    default -> { }
                }
            }
            if (line.startsWith("G3") || line.startsWith("G2")) {
                double r0 = Math.hypot(i, j);
                double r1 = Math.hypot(nx - (x + i), ny - (y + j));
                assertEquals(r0, r1, 2e-4, line);
                if (Math.abs(x + i - 7) < 2e-4 && Math.abs(y + j - 5) < 2e-4) {
                    holeArcs++;
                    assertEquals(1.5 - 0.03, r0, 2e-4, "hole loop is kerf/2 inside the hole: " + line);
                    assertTrue(line.startsWith("G3"), "holes are cut counter-clockwise: " + line);
                }
            }
            x = nx;
            y = ny;
        }
        assertTrue(holeArcs >= 2, "the hole is cut as arcs");
    }

    @Test
    void lines_controllerCompensation_wrapsEachContourInG41AndG40() {
        List<String> lines = GcodeProgram.lines(plan(KerfCompensation.CONTROLLER), List.of("PL blank #1"), head(),
                settings(KerfCompensation.CONTROLLER, MachineSettings.DEFAULT));
        assertEquals(2, lines.stream().filter("G41"::equals).count());
        assertEquals(3, lines.stream().filter("G40"::equals).count()); // once at the top, once after each contour
        assertTrue(lines.stream().anyMatch(l -> l.contains("set the controller's kerf")));
    }

    @Test
    void lines_machineDialect_torchCodesLineNumbersHeightsHeaderAndFooter() {
        MachineSettings m = new MachineSettings("M07", "M08", OptionalDouble.of(0.5), List.of("G17", "G54"),
                List.of("G0 X0 Y0", "M02"), true, Optional.of(new MachineSettings.Heights(25.4, 3.81, 1.524)));
        List<String> lines = GcodeProgram.lines(plan(KerfCompensation.PATH), List.of("PL blank #1"), head(),
                settings(KerfCompensation.PATH, m));

        List<String> blocks = lines.stream().filter(l -> !l.startsWith("(")).toList();
        for (int k = 0; k < blocks.size(); k++) {
            assertTrue(blocks.get(k).startsWith("N" + (10 * (k + 1)) + " "), blocks.get(k));
        }
        assertEquals("N10 G17", blocks.get(0));
        assertTrue(blocks.get(blocks.size() - 1).endsWith(" M02"));
        assertEquals(2, blocks.stream().filter(l -> l.endsWith(" M07")).count());
        assertEquals(2, blocks.stream().filter(l -> l.endsWith(" G4 P0.50")).count());
        assertTrue(blocks.stream().anyMatch(l -> l.endsWith(" G0 Z1.0000")), "safe height 25.4 mm = 1 in");
        assertTrue(blocks.stream().anyMatch(l -> l.endsWith(" G0 Z0.1500")), "pierce height");
        assertTrue(blocks.stream().anyMatch(l -> l.contains(" G1 Z0.0600 F250.0")), "cut height");
    }

    @Test
    void machineSettings_torchCodesThatAreNotMCodes_areRefused() {
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new MachineSettings("G03", "M05", OptionalDouble.empty(), List.of(), List.of(), false,
                        Optional.empty()));
        assertTrue(e.getMessage().contains("torch-on"), e::getMessage);
    }
}
