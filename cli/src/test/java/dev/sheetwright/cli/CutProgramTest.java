package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code nest --gcode} on the two demo jobs (inch, plasma; round and rectangular) and on a metric laser job with
 * lead-outs, read back by outside programs: gcode-toolpath (under node) turns each program into moves, which are
 * compared with the sheet DXF's CUT contours (read by this test's own reader); GDAL's ogrinfo and LibreCAD read the
 * DXFs.
 */
class CutProgramTest {

    private static final double MM_PER_IN = 25.4;

    /** An invented metric job: a tee (its main has the joint hole), reducers and an elbow, cut by laser. */
    private static final String METRIC_JOB = String.join("\n", "job: metric check", "units: mm",
            "material: {type: galvanized, thickness: 0.8}",
            "cutting: {process: laser, kerf: 0.2, gap: 3, lead-in: 1.5, lead-out: 0.5}",
            "fittings:",
            "  - {id: T1, type: tee, main: 300, branch: 200, angle: 90, length: 250, main-length: 600}",
            "  - {id: R1, type: reducer, large: 300, small: 200, height: 250, qty: 2}",
            "  - {id: E1, type: elbow, diameter: 200, angle: 90}", "");

    /**
     * One nested job: where its output is, its kerf, its unit in mm, and how closely the path must sit at kerf/2
     * (G-code is written to 0.0001 in or 0.001 mm; DXF arcs are flattened here to within 0.0001 of the unit).
     */
    record Job(String name, Path out, CommandRun run, double kerf, double mmPerUnit, double eps) {
    }

    @TempDir
    static Path tmp;
    static List<Job> jobs;

    @BeforeAll
    static void nestTheJobs() throws Exception {
        Path demoOut = tmp.resolve("demo");
        CommandRun demo = CommandRun.of("nest", Fixtures.path("demo-bakery.yaml").toString(), "-o",
                demoOut.toString(), "--gcode", "--show-path", "--iterations", "5", "--seed", "3");
        Path metricJob = tmp.resolve("metric.yaml");
        Files.writeString(metricJob, METRIC_JOB);
        Path metricOut = tmp.resolve("metric");
        CommandRun metric = CommandRun.of("nest", metricJob.toString(), "-o", metricOut.toString(), "--gcode",
                "--show-path", "--iterations", "3", "--seed", "1");
        Path rooftopOut = tmp.resolve("rooftop");
        CommandRun rooftop = CommandRun.of("nest", Fixtures.path("demo-rooftop.yaml").toString(), "-o",
                rooftopOut.toString(), "--gcode", "--iterations", "3", "--seed", "1");
        jobs = List.of(new Job("demo", demoOut, demo, 0.06, MM_PER_IN, 0.0015),
                new Job("metric", metricOut, metric, 0.2, 1, 0.02),
                new Job("rooftop", rooftopOut, rooftop, 0.06, MM_PER_IN, 0.0015));
    }

    private static List<Path> sheets(Job job, String ext) throws Exception {
        Path out = job.out();
        assertEquals(0, job.run().exitCode(), job.run()::toString);
        List<Path> files = new ArrayList<>();
        JsonNode doc = new ObjectMapper().readTree(out.resolve("nest.json").toFile());
        for (JsonNode s : doc.get("sheets")) {
            files.add(out.resolve(s.get("file").asText().replace(".dxf", ext)));
        }
        return files;
    }

    private static List<Path> allSheets(String ext) throws Exception {
        List<Path> all = new ArrayList<>();
        for (Job job : jobs) {
            all.addAll(sheets(job, ext));
        }
        return all;
    }

    @Test
    void nest_gcode_writesOneProgramPerSheetWithOurHeadAndCautions() throws Exception {
        Job demo = jobs.get(0);
        for (Path nc : sheets(demo, ".nc")) {
            List<String> lines = Files.readAllLines(nc);
            assertEquals("(sheetwright cut program)", lines.get(0));
            assertTrue(lines.contains("(job: Larkspur Bakery supply run)"), nc::toString);
            assertTrue(lines.stream().anyMatch(l -> l.startsWith("(CAUTION: Cutting galvanized steel")));
            assertTrue(lines.contains("G20") && lines.contains("G90"));
            int contours = cutContours(nc.resolveSibling(nc.getFileName().toString().replace(".nc", ".dxf"))).size();
            assertEquals(contours, lines.stream().filter("M03"::equals).count(), "one pierce per contour");
        }
    }

    @Test
    void gcodeToolpath_readsEveryProgram_andItsPathMeetsTheCutRules() throws Exception {
        Path root = OutsideProgram.repoRoot();
        Path script = root.resolve("tools/gcode-reader/read.js");
        OutsideProgram.require("node", "apt-get install nodejs", Path.of("/usr/bin/node"));
        OutsideProgram.require("gcode-toolpath", "npm ci --prefix tools/gcode-reader",
                root.resolve("tools/gcode-reader/node_modules/gcode-toolpath/package.json"));
        for (Job job : jobs) {
            double cutLength = 0;
            double rapidLength = 0;
            int leadOuts = 0;
            for (Path nc : sheets(job, ".nc")) {
                OutsideProgram.Run r = OutsideProgram.run(List.of("/usr/bin/node", script.toString(),
                        nc.toString()), Map.of());
                assertEquals(0, r.exitCode(), r::toString);
                JsonNode doc = new ObjectMapper().readTree(r.stdout());
                assertEquals(job.mmPerUnit() == 1 ? "G21" : "G20", doc.get("units").asText());
                List<double[]> contours = cutContours(nc.resolveSibling(nc.getFileName().toString()
                        .replace(".nc", ".dxf")));
                leadOuts += checkPath(job, job.name() + " " + nc.getFileName(), doc.get("moves"), contours);
                for (JsonNode m : doc.get("moves")) {
                    if (m.get("motion").asText().equals("G0")) {
                        rapidLength += length(job, m);
                    } else {
                        cutLength += length(job, m);
                    }
                }
            }
            // one source: the quote's cut and rapid lengths are the programs', as the outside reader sees them
            JsonNode totals = new ObjectMapper().readTree(job.out().resolve("quote.json").toFile()).get("totals");
            assertEquals(totals.get("cutLength").asDouble(), cutLength, 100 * job.eps(), job.name());
            assertEquals(totals.get("rapidLength").asDouble(), rapidLength, 100 * job.eps(), job.name());
            if (job.name().equals("metric")) {
                assertTrue(leadOuts > 0, "the metric job asks for lead-outs");
            }
        }
    }

    /** True length of a move in job units: a line, or an arc (radius x sweep the way G2/G3 turns). */
    private static double length(Job job, JsonNode m) {
        double[] a = point(job, m.get("from"));
        double[] b = point(job, m.get("to"));
        if (!m.has("centre")) {
            return Math.hypot(b[0] - a[0], b[1] - a[1]);
        }
        double[] c = point(job, m.get("centre"));
        double r = Math.hypot(a[0] - c[0], a[1] - c[1]);
        return r * Math.abs(sweep(m, a, b, c));
    }

    private static double sweep(JsonNode m, double[] a, double[] b, double[] c) {
        double sweep = Math.atan2(b[1] - c[1], b[0] - c[0]) - Math.atan2(a[1] - c[1], a[0] - c[0]);
        boolean ccw = m.get("motion").asText().equals("G3");
        while (ccw && sweep <= 0) {
            sweep += 2 * Math.PI;
        }
        while (!ccw && sweep >= 0) {
            sweep -= 2 * Math.PI;
        }
        return sweep;
    }

    /**
     * The rules of the issue, checked on the outside reader's moves against the drawn contours; returns how many
     * cuts ended with a lead-out.
     */
    private static int checkPath(Job job, String name, JsonNode moves, List<double[]> contours) {
        double kerf = job.kerf();
        double eps = job.eps();
        int leadOuts = 0;
        List<List<JsonNode>> cuts = new ArrayList<>();
        List<JsonNode> current = null;
        for (JsonNode m : moves) {
            String motion = m.get("motion").asText();
            String torch = m.get("spindle").asText();
            if (motion.equals("G0")) {
                assertEquals("M5", torch, name + ": a rapid with the torch on");
                current = null;
                continue;
            }
            assertEquals("M3", torch, name + ": a cutting move with the torch off");
            if (current == null) {
                current = new ArrayList<>();
                cuts.add(current);
            }
            current.add(m);
        }
        assertEquals(contours.size(), cuts.size(), name + ": one pierce per contour");
        int[] cutOf = new int[contours.size()];
        java.util.Arrays.fill(cutOf, -1);
        for (int c = 0; c < cuts.size(); c++) {
            List<JsonNode> cut = cuts.get(c);
            double[] pierce = point(job, cut.get(0).get("from"));
            assertFalse(inMetal(contours, pierce), name + " cut " + (c + 1) + ": pierce in metal");
            assertTrue(nearest(contours, pierce)[1] >= kerf / 2 - eps, name + " cut " + (c + 1)
                    + ": pierce nearer than kerf/2 to a part");
            Map<Integer, Integer> votes = new HashMap<>();
            for (int k = 0; k < cut.size(); k++) {
                JsonNode m = cut.get(k);
                List<double[]> probes = probes(job, m);
                boolean lead = (k == 0 || k == cut.size() - 1) && probes.stream().anyMatch(
                        p -> nearest(contours, p)[1] > kerf / 2 + eps);
                if (lead) {
                    if (k > 0) {
                        leadOuts++;
                        double[] end = probes.get(2);
                        assertFalse(inMetal(contours, end), name + " cut " + (c + 1) + ": lead-out into metal");
                    }
                    continue; // lead-in or lead-out: in scrap, checked at the pierce and the lead-out's end
                }
                for (double[] p : probes) {
                    double[] near = nearest(contours, p);
                    assertEquals(kerf / 2, near[1], eps, name + " cut " + (c + 1) + ": path not kerf/2 off the"
                            + " contour at " + p[0] + ", " + p[1]);
                    assertFalse(inMetal(contours, p), name + " cut " + (c + 1) + ": path on the metal side at "
                            + p[0] + ", " + p[1]);
                    votes.merge((int) near[0], 1, Integer::sum);
                }
            }
            int contour = votes.entrySet().stream().max(Map.Entry.comparingByValue()).orElseThrow().getKey();
            assertEquals(-1, cutOf[contour], name + ": contour " + contour + " cut twice");
            cutOf[contour] = c;
        }
        for (int a = 0; a < contours.size(); a++) {
            for (int b = 0; b < contours.size(); b++) {
                if (a != b && inside(contours.get(b), contours.get(a)[0], contours.get(a)[1])
                        && area(contours.get(a)) < area(contours.get(b))) {
                    assertTrue(cutOf[a] < cutOf[b], name + ": contour " + a + " lies inside contour " + b
                            + " but is cut after it");
                }
            }
        }
        return leadOuts;
    }

    @Test
    void ogrinfo_readsEverySheetDxf_withTheCutAndLeadLayers() throws Exception {
        OutsideProgram.require("GDAL ogrinfo", "apt-get install gdal-bin", Path.of("/usr/bin/ogrinfo"));
        for (Path dxf : allSheets(".dxf")) {
            OutsideProgram.Run r = OutsideProgram.run(List.of("/usr/bin/ogrinfo", "-ro", "-al", "-q",
                    dxf.toString()), Map.of());
            assertEquals(0, r.exitCode(), r::toString);
            long cut = r.stdout().lines().filter(l -> l.strip().equals("Layer (String) = CUT")).count();
            long lead = r.stdout().lines().filter(l -> l.strip().equals("Layer (String) = LEAD")).count();
            assertEquals(cutContours(dxf).size(), cut, dxf + ": every contour as one CUT feature");
            assertTrue(lead >= cut, dxf + ": a lead-in for every contour (" + lead + " leads, " + cut
                    + " contours)");
        }
    }

    @Test
    void librecad_printsEverySheetDxfToPdf() throws Exception {
        OutsideProgram.require("LibreCAD", "apt-get install librecad", Path.of("/usr/bin/librecad"));
        for (Path dxf : allSheets(".dxf")) {
            Path pdfs = Files.createDirectories(tmp.resolve("pdf-" + dxf.getParent().getParent().getFileName()));
            OutsideProgram.Run r = OutsideProgram.run(List.of("/usr/bin/librecad", "dxf2pdf", "-a", "-t",
                    pdfs.toString(), dxf.toString()), Map.of("QT_QPA_PLATFORM", "offscreen"));
            assertEquals(0, r.exitCode(), r::toString);
            Path pdf = pdfs.resolve(dxf.getFileName().toString().replace(".dxf", ".pdf"));
            assertTrue(Files.isRegularFile(pdf), r::toString);
            byte[] head = Files.readAllBytes(pdf);
            assertEquals("%PDF", new String(head, 0, 4, java.nio.charset.StandardCharsets.US_ASCII));
            assertTrue(head.length > 2000, "a drawing, not an empty page: " + head.length + " bytes");
        }
    }

    @Test
    void sheetDxf_cutContoursInTheProgramOrder_leadsOnTheirOwnLayer() throws Exception {
        for (Job job : jobs) {
            boolean showPath = !job.name().equals("rooftop"); // nested without --show-path
            for (Path dxf : sheets(job, ".dxf")) {
                checkOrderAndLayers(dxf, showPath);
            }
        }
    }

    private static void checkOrderAndLayers(Path dxf, boolean showPath) throws Exception {
        SheetDxf d = SheetDxf.read(dxf);
        List<double[]> contours = cutContours(dxf);
        // a contour that lies inside another comes before it in the file, as in the program
        for (int a = 0; a < contours.size(); a++) {
            for (int b = 0; b < a; b++) {
                boolean aInB = inside(contours.get(b), contours.get(a)[0], contours.get(a)[1])
                        && area(contours.get(a)) < area(contours.get(b));
                assertFalse(aInB, dxf + ": contour " + a + " lies inside the earlier contour " + b);
            }
        }
        assertTrue(d.polylines().stream().noneMatch(p -> p.layer().equals("LEAD")), "leads are lines");
        String svg = Files.readString(dxf.resolveSibling(dxf.getFileName().toString().replace(".dxf", ".svg")));
        assertEquals(showPath, svg.contains("data-layer=\"RAPID\"") && svg.contains("data-layer=\"ORDER\""),
                "--show-path (and only it) draws the rapids and the order");
    }

    @Test
    void sheetDxf_everyPartLabelLiesInsideOnePartsMetal() throws Exception {
        double charWidth = 0.95; // capitals and digits, in text heights, rounded up
        for (Path dxf : allSheets(".dxf")) {
            List<double[]> contours = cutContours(dxf);
            int labels = 0;
            for (SheetDxf.Label t : SheetDxf.read(dxf).texts()) {
                if (!t.layer().equals("LABEL") || t.value().contains("OFFCUT") || t.value().contains(" sheet ")) {
                    continue; // the offcut's label lies in the offcut
                }
                labels++;
                double h = labelHeight(dxf, t);
                double w = charWidth * t.value().length() * h;
                int outer = -1;
                for (double fx = 0; fx <= 1.0001; fx += 0.125) {
                    for (double fy = 0; fy <= 1.0001; fy += 0.5) {
                        double[] p = {t.x() + fx * w, t.y() + fy * h};
                        assertTrue(inMetal(contours, p), dxf + ": label '" + t.value() + "' leaves its part at "
                                + p[0] + ", " + p[1]);
                        int in = smallestOuter(contours, p);
                        assertTrue(outer == -1 || outer == in, dxf + ": label '" + t.value() + "' spans two parts");
                        outer = in;
                    }
                }
            }
            assertTrue(labels > 0, dxf + ": no part labels");
        }
    }

    /** The text height of a label, read from the file's group 40. */
    private static double labelHeight(Path dxf, SheetDxf.Label t) throws Exception {
        List<String> lines = Files.readAllLines(dxf);
        for (int i = 0; i + 1 < lines.size(); i += 2) {
            if (lines.get(i).strip().equals("1") && lines.get(i + 1).equals(t.value())) {
                for (int k = i - 2; k > 0 && !lines.get(k).strip().equals("0"); k -= 2) {
                    if (lines.get(k).strip().equals("40")) {
                        return Double.parseDouble(lines.get(k + 1).strip());
                    }
                }
            }
        }
        throw new AssertionError("no height for " + t.value());
    }

    /** The smallest contour holding the point (a part's outline, or a hole with a part in it). */
    private static int smallestOuter(List<double[]> contours, double[] p) {
        int best = -1;
        for (int c = 0; c < contours.size(); c++) {
            if (inside(contours.get(c), p[0], p[1]) && (best < 0 || area(contours.get(c)) < area(contours.get(best)))) {
                best = c;
            }
        }
        return best;
    }

    // ----- geometry of the test's own: DXF bulge polylines to fine polygons, distances, even-odd inclusion

    /** Each CUT polyline of the file as a polygon {x0, y0, x1, y1, ...}, arcs flattened to within 0.0001 in. */
    static List<double[]> cutContours(Path dxf) {
        List<double[]> out = new ArrayList<>();
        for (SheetDxf.Outline o : SheetDxf.read(dxf).polylines()) {
            if (!o.layer().equals("CUT")) {
                continue;
            }
            List<Double> xy = new ArrayList<>();
            int n = o.vertices().size();
            for (int i = 0; i < n; i++) {
                double[] p = o.vertices().get(i);
                double[] q = o.vertices().get((i + 1) % n);
                double bulge = o.bulges().get(i);
                xy.add(p[0]);
                xy.add(p[1]);
                if (bulge != 0) {
                    double sweep = 4 * Math.atan(bulge);
                    double chord = Math.hypot(q[0] - p[0], q[1] - p[1]);
                    double r = chord / (2 * Math.sin(Math.abs(sweep) / 2));
                    double mx = (p[0] + q[0]) / 2;
                    double my = (p[1] + q[1]) / 2;
                    double h = r * Math.cos(sweep / 2);
                    double ux = -(q[1] - p[1]) / chord;
                    double uy = (q[0] - p[0]) / chord;
                    double cx = mx + Math.signum(bulge) * h * ux;
                    double cy = my + Math.signum(bulge) * h * uy;
                    double a0 = Math.atan2(p[1] - cy, p[0] - cx);
                    int steps = (int) Math.ceil(Math.abs(sweep) / (2 * Math.acos(1 - 1e-4 / r)));
                    for (int k = 1; k < steps; k++) {
                        double a = a0 + sweep * k / steps;
                        xy.add(cx + r * Math.cos(a));
                        xy.add(cy + r * Math.sin(a));
                    }
                }
            }
            out.add(xy.stream().mapToDouble(Double::doubleValue).toArray());
        }
        return out;
    }

    /** The points of a move to check, in job units: start, the middle (of the arc, for arcs), end. */
    private static List<double[]> probes(Job job, JsonNode m) {
        double[] a = point(job, m.get("from"));
        double[] b = point(job, m.get("to"));
        double[] mid = {(a[0] + b[0]) / 2, (a[1] + b[1]) / 2};
        if (m.has("centre")) {
            double[] c = point(job, m.get("centre"));
            double r = Math.hypot(a[0] - c[0], a[1] - c[1]);
            double a0 = Math.atan2(a[1] - c[1], a[0] - c[0]);
            double sweep = sweep(m, a, b, c);
            mid = new double[] {c[0] + r * Math.cos(a0 + sweep / 2), c[1] + r * Math.sin(a0 + sweep / 2)};
        }
        return List.of(a, mid, b);
    }

    /** A point of the reader (millimetres) in job units. */
    private static double[] point(Job job, JsonNode v) {
        return new double[] {v.get(0).asDouble() / job.mmPerUnit(), v.get(1).asDouble() / job.mmPerUnit()};
    }

    /** {index of the nearest contour, distance to it}. */
    private static double[] nearest(List<double[]> contours, double[] p) {
        double best = Double.POSITIVE_INFINITY;
        int which = -1;
        for (int c = 0; c < contours.size(); c++) {
            double[] xy = contours.get(c);
            int n = xy.length / 2;
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                double d = segment(p, xy[2 * i], xy[2 * i + 1], xy[2 * j], xy[2 * j + 1]);
                if (d < best) {
                    best = d;
                    which = c;
                }
            }
        }
        return new double[] {which, best};
    }

    private static double segment(double[] p, double ax, double ay, double bx, double by) {
        double dx = bx - ax;
        double dy = by - ay;
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - ax) * dx + (p[1] - ay) * dy) / len2));
        return Math.hypot(p[0] - (ax + t * dx), p[1] - (ay + t * dy));
    }

    /** Metal by the even-odd rule over every contour: inside an outline and not in its holes (parts in holes too). */
    private static boolean inMetal(List<double[]> contours, double[] p) {
        int count = 0;
        for (double[] c : contours) {
            count += inside(c, p[0], p[1]) ? 1 : 0;
        }
        return count % 2 == 1;
    }

    private static boolean inside(double[] xy, double x, double y) {
        boolean in = false;
        int n = xy.length / 2;
        for (int i = 0, j = n - 1; i < n; j = i++) {
            double xi = xy[2 * i];
            double yi = xy[2 * i + 1];
            double xj = xy[2 * j];
            double yj = xy[2 * j + 1];
            if ((yi > y) != (yj > y) && x < (xj - xi) * (y - yi) / (yj - yi) + xi) {
                in = !in;
            }
        }
        return in;
    }

    private static double area(double[] xy) {
        double a = 0;
        int n = xy.length / 2;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            a += xy[2 * i] * xy[2 * j + 1] - xy[2 * j] * xy[2 * i + 1];
        }
        return Math.abs(a) / 2;
    }
}
