package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * A flat rectangular blank of one or more faces side by side, bent on the lines between them (a full wrap, an L
 * half, a U, a flat side, a wrapper): faces run along x, the duct's length along y. Longitudinal seam allowances
 * outside the left and right edges, transverse connector allowances below and above; with notching, square notches
 * where a seam allowance meets an end allowance and a V at each bend line within an end allowance
 * (trade-reference §7.5, §13.2).
 */
final class RectPanel {

    private RectPanel() {
    }

    /**
     * Where the allowances go on a panel; {@code bottomTabs} (start, end along the bottom edge) when the bottom
     * end carries tabs rather than a strip.
     */
    record Edges(double left, double right, EndAllowance bottom, EndAllowance top, boolean notch,
            List<double[]> bottomTabs) {

        Edges(double left, double right, EndAllowance bottom, EndAllowance top, boolean notch) {
            this(left, right, bottom, top, notch, List.of());
        }
    }

    /**
     * @param faces width of each face, left to right (net)
     * @param length net length along y
     * @param extraMarks further marks (cross lines), in the net frame
     */
    static Pattern build(String fitting, String piece, int count, double[] faces, double length, Edges e,
            List<Mark> extraMarks, Tolerance tol) {
        List<Double> bends = new ArrayList<>();
        double x = 0;
        for (int i = 0; i < faces.length; i++) {
            x += faces[i];
            if (i < faces.length - 1) {
                bends.add(x);
            }
        }
        double s = x;
        double eb = e.bottom().width();
        double et = e.top().width();
        List<Point2> net = new ArrayList<>();
        List<Double> w = new ArrayList<>();
        List<Boolean> corner = new ArrayList<>();
        List<Boolean> bend = new ArrayList<>();
        if (!e.bottomTabs().isEmpty()) {
            if (!bends.isEmpty()) {
                throw new IllegalArgumentException("tabs go on a single flat face, not across bends");
            }
            TabbedEdge.append(net, w, new Point2(0, 0), new Point2(s, 0), e.bottomTabs(), eb);
            for (int i = 0; i < net.size(); i++) {
                corner.add(i == 0 && e.notch());
                bend.add(false);
            }
        } else {
            net.add(new Point2(0, 0));
            corner.add(e.notch());
            bend.add(false);
            w.add(eb);
            for (double b : bends) {
                net.add(new Point2(b, 0));
                corner.add(false);
                bend.add(e.notch() && eb > 0);
                w.add(eb);
            }
        }
        net.add(new Point2(s, 0));
        corner.add(e.notch());
        bend.add(false);
        w.add(e.right());
        net.add(new Point2(s, length));
        corner.add(e.notch());
        bend.add(false);
        w.add(et);
        for (int i = bends.size() - 1; i >= 0; i--) {
            net.add(new Point2(bends.get(i), length));
            corner.add(false);
            bend.add(e.notch() && et > 0);
            w.add(et);
        }
        net.add(new Point2(0, length));
        corner.add(e.notch());
        bend.add(false);
        w.add(e.left());
        Contour outline = AllowanceOutline.cut(fitting, piece, net, w, corner, bend, tol);
        List<Mark> marks = new ArrayList<>();
        for (double b : bends) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(b, 0), new Point2(b, length))));
        }
        if (e.left() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(0, 0), new Point2(0, length))));
        }
        if (e.right() > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(s, 0), new Point2(s, length))));
        }
        endMarks(e.bottom(), List.of(new Point2(0, 0), new Point2(s, 0)), marks, tol);
        endMarks(e.top(), List.of(new Point2(s, length), new Point2(0, length)), marks, tol);
        marks.addAll(extraMarks);
        return new Pattern(fitting, piece, count, outline, List.of(), marks,
                new Point2(s / 2, length / 2));
    }

    /**
     * A wrapper of a rectangular elbow, offset or tap: depth wide, {@code length} long (net), the seam's pocket on
     * both long edges (they lock onto the cheeks' flanges), the fitting's end connectors on its ends, and a line of
     * {@code crossKind} across it at each of {@code crossAt} (where it is bent, or where rolling starts or turns).
     */
    static Pattern wrapper(String fitting, String piece, int count, double depth, double length,
            dev.sheetwright.core.fitting.Allowances a, List<Double> crossAt, MarkKind crossKind, Tolerance tol) {
        return wrapper(fitting, piece, count, depth, length, a, crossAt, crossKind, List.of(), tol);
    }

    /** As above, with tabs (start, end across the wrapper) instead of a strip on its first end. */
    static Pattern wrapper(String fitting, String piece, int count, double depth, double length,
            dev.sheetwright.core.fitting.Allowances a, List<Double> crossAt, MarkKind crossKind,
            List<double[]> firstEndTabs, Tolerance tol) {
        double pocket = a.seam().right();
        List<Mark> cross = new ArrayList<>();
        for (double y : crossAt) {
            cross.add(new Mark(crossKind, new Line(new Point2(0, y), new Point2(depth, y))));
        }
        return build(fitting, piece, count, new double[] {depth}, length,
                new Edges(pocket, pocket, a.endA(), a.endB(), a.notch(), firstEndTabs), cross, tol);
    }

    /**
     * Marks for a rectangular end connector along its net edge: a bend line for a drive hem or a flange, a layout
     * line for the edge entering an S slip (how far the S goes on; the edge itself stays flat).
     */
    static void endMarks(EndAllowance end, List<Point2> netChain, List<Mark> marks, Tolerance tol) {
        if (end.kind() == EndKind.SLIP) {
            AllowanceOutline.markChain(netChain, MarkKind.LAYOUT, marks, tol);
        } else {
            AllowanceOutline.endMarks(end, netChain, marks, tol);
        }
    }
}
