package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Plans the cutting of one sheet: every contour gets its compensated loop and leads ({@link KerfOffset},
 * {@link LeadPlacer}), then the contours are put in order: a part inside another part's hole is cut before that
 * hole, every hole of a part before its outline (trade reference §9.4: inner contours first, or the part shifts
 * or drops), and parts follow a short tour ({@link CutOrder}) from the machine's home at the sheet origin.
 */
public final class CutPlanner {

    private record Entry(Contour nominal, LeadPlacer.Entry path) {
    }

    private final List<Pattern> parts;
    private final List<PartOutline> shapes = new ArrayList<>();
    private final List<Entry> outlines = new ArrayList<>();
    private final List<List<Entry>> holes = new ArrayList<>();
    /** children.get(p).get(h): the parts lying directly in hole h of part p. */
    private final List<List<List<Integer>>> children = new ArrayList<>();
    private final List<CutStep> steps = new ArrayList<>();
    private final List<Line> rapids = new ArrayList<>();
    private final List<String> notes = new ArrayList<>();
    private Point2 at;

    private CutPlanner(List<Pattern> parts) {
        this.parts = parts;
    }

    /**
     * The plan of one sheet.
     *
     * @param parts the placed parts in sheet coordinates (origin at the machine's home corner)
     * @param stock the stock's bounding box: no pierce outside it
     * @param labels a name per part for notes (e.g. {@code R1 blank #2})
     * @throws IllegalArgumentException when a contour is too small to offset by kerf/2
     */
    public static SheetCutPlan plan(List<Pattern> parts, List<String> labels, Box2 stock, CutPathSettings s,
            Tolerance tol) {
        if (labels.size() != parts.size()) {
            throw new IllegalArgumentException("one label per part");
        }
        CutPlanner p = new CutPlanner(List.copyOf(parts));
        p.prepare(labels, stock, s, tol);
        p.order();
        return new SheetCutPlan(p.steps, p.rapids, p.notes);
    }

    private void prepare(List<String> labels, Box2 stock, CutPathSettings s, Tolerance tol) {
        for (Pattern part : parts) {
            shapes.add(new PartOutline(part, tol.chord()));
        }
        for (int i = 0; i < parts.size(); i++) {
            Pattern part = parts.get(i);
            PartOutline own = shapes.get(i);
            Contour outline = part.outer().oriented(false);
            outlines.add(new Entry(outline, LeadPlacer.place(offset(outline, s, tol, labels.get(i)),
                    ContourRole.OUTLINE, own, -1, s, stock, tol, labels.get(i) + " outline")));
            List<Entry> hs = new ArrayList<>();
            for (int h = 0; h < part.holes().size(); h++) {
                Contour hole = part.holes().get(h).oriented(true);
                String where = labels.get(i) + " hole " + (h + 1);
                hs.add(new Entry(hole, LeadPlacer.place(offset(hole, s, tol, where), ContourRole.HOLE, own, h, s,
                        stock, tol, where)));
            }
            holes.add(hs);
            List<List<Integer>> inHoles = new ArrayList<>();
            for (int h = 0; h < part.holes().size(); h++) {
                inHoles.add(new ArrayList<>());
            }
            children.add(inHoles);
        }
        for (int i = 0; i < parts.size(); i++) {
            outlines.get(i).path().lead().note().ifPresent(notes::add);
            for (Entry e : holes.get(i)) {
                e.path().lead().note().ifPresent(notes::add);
            }
        }
    }

    private static Contour offset(Contour c, CutPathSettings s, Tolerance tol, String where) {
        try {
            return KerfOffset.left(c, s.pathOffset(), tol);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(where + ": " + e.getMessage(), e);
        }
    }

    private void order() {
        List<Integer> top = new ArrayList<>();
        for (int b = 0; b < parts.size(); b++) {
            int[] in = container(b);
            if (in == null) {
                top.add(b);
            } else {
                children.get(in[0]).get(in[1]).add(b);
            }
        }
        at = Point2.ORIGIN;
        List<Box2> boxes = new ArrayList<>();
        for (int i : top) {
            boxes.add(shapes.get(i).bounds());
        }
        int first = CutOrder.stripStart(boxes);
        for (int i : visit(top, first)) {
            cutPart(i);
        }
    }

    /** The parts in the order a short tour from where the torch is visits their outline pierces. */
    private List<Integer> visit(List<Integer> group, int first) {
        List<Point2> pts = new ArrayList<>();
        for (int i : group) {
            pts.add(outlines.get(i).path().lead().pierce());
        }
        List<Integer> out = new ArrayList<>();
        for (int k : CutOrder.tour(at, pts, first)) {
            out.add(group.get(k));
        }
        return out;
    }

    private void cutPart(int p) {
        List<Entry> hs = holes.get(p);
        boolean[] done = new boolean[hs.size()];
        for (int count = 0; count < hs.size(); count++) {
            int next = -1;
            for (int h = 0; h < hs.size(); h++) {
                if (!done[h] && (next < 0 || at.distance(hs.get(h).path().lead().pierce())
                        < at.distance(hs.get(next).path().lead().pierce()))) {
                    next = h;
                }
            }
            done[next] = true;
            for (int child : visit(children.get(p).get(next), -1)) {
                cutPart(child);
            }
            add(p, next, ContourRole.HOLE, hs.get(next));
        }
        add(p, -1, ContourRole.OUTLINE, outlines.get(p));
    }

    private void add(int part, int hole, ContourRole role, Entry e) {
        Lead lead = e.path().lead();
        rapids.add(new Line(at, lead.pierce()));
        CutStep step = new CutStep(part, hole, role, e.nominal(), e.path().toolpath(), lead);
        steps.add(step);
        at = step.exit();
    }

    /** {part, hole} of the smallest hole that holds part b, or null when b lies in no hole. */
    private int[] container(int b) {
        Point2 probe = parts.get(b).outer().edges().get(0).start();
        Box2 bb = shapes.get(b).bounds();
        int[] best = null;
        double bestArea = Double.POSITIVE_INFINITY;
        for (int a = 0; a < parts.size(); a++) {
            if (a == b) {
                continue;
            }
            for (int h = 0; h < shapes.get(a).holeCount(); h++) {
                Box2 hb = parts.get(a).holes().get(h).bounds();
                if (hb.minX() <= bb.minX() && hb.minY() <= bb.minY() && hb.maxX() >= bb.maxX()
                        && hb.maxY() >= bb.maxY() && PartOutline.inside(shapes.get(a).hole(h), probe)) {
                    double area = parts.get(a).holes().get(h).area();
                    if (area < bestArea) {
                        bestArea = area;
                        best = new int[] {a, h};
                    }
                }
            }
        }
        return best;
    }

    /** Plain-text summary of a plan, for notes and program heads. */
    public static String summary(SheetCutPlan plan, String unit) {
        return String.format(Locale.ROOT, "%d contours, %d pierces, %.1f %s cut, %.1f %s of leads, %.1f %s rapid",
                plan.steps().size(), plan.pierces(), plan.loopLength(), unit, plan.leadLength(), unit,
                plan.rapidLength(), unit);
    }
}
