package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.geom.Contour;
import dev.sheetwright.core.geom.ContourBuilder;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Mark;
import dev.sheetwright.core.geom.MarkKind;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import java.util.ArrayList;
import java.util.List;

/**
 * The rectangular blank of parallel-line development of a cylinder (trade-reference §6): net stretch-out along x
 * from 0 to {@code stretchOut}, length along y from 0 to {@code length}; seam allowances on the left and right
 * edges, end allowances below ({@code endA}) and above ({@code endB}), notched corners on request (§7.5).
 */
public final class RectangleBlank {

    private RectangleBlank() {
    }

    public static Pattern build(String fitting, String piece, int count, double stretchOut, double length,
            Allowances allowances, Tolerance tol) {
        double wr = allowances.seam().right();
        double wl = allowances.seam().left();
        double ea = allowances.endA().width();
        double eb = allowances.endB().width();
        if (Math.max(wr, wl) > stretchOut / 2) {
            throw new FittingException(fitting, "allowances.seam", "a seam allowance (" + Math.max(wr, wl)
                    + ") is larger than half the stretch-out (" + stretchOut / 2 + ")");
        }
        if (ea + eb > length) {
            throw new FittingException(fitting, "allowances.ends", "the end allowances (" + (ea + eb)
                    + ") are longer than the part (" + length + ")");
        }
        double s = stretchOut;
        Contour outline;
        if (allowances.notch()) {
            outline = ContourBuilder.startAt(new Point2(0, -ea), tol)
                    .lineTo(new Point2(s, -ea))
                    .lineTo(new Point2(s, 0))
                    .lineTo(new Point2(s + wr, 0))
                    .lineTo(new Point2(s + wr, length))
                    .lineTo(new Point2(s, length))
                    .lineTo(new Point2(s, length + eb))
                    .lineTo(new Point2(0, length + eb))
                    .lineTo(new Point2(0, length))
                    .lineTo(new Point2(-wl, length))
                    .lineTo(new Point2(-wl, 0))
                    .lineTo(new Point2(0, 0))
                    .close();
        } else {
            outline = ContourBuilder.startAt(new Point2(-wl, -ea), tol)
                    .lineTo(new Point2(s + wr, -ea))
                    .lineTo(new Point2(s + wr, length + eb))
                    .lineTo(new Point2(-wl, length + eb))
                    .close();
        }
        List<Mark> marks = new ArrayList<>();
        if (wr > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(s, 0), new Point2(s, length))));
        }
        if (wl > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(new Point2(0, 0), new Point2(0, length))));
        }
        endMark(allowances.endA(), 0, -1, s, marks);
        endMark(allowances.endB(), length, +1, s, marks);
        marks.add(new Mark(MarkKind.CENTRE, new Line(new Point2(s / 2, 0), new Point2(s / 2, length))));
        return new Pattern(fitting, piece, count, outline, List.of(), marks, new Point2(s / 2, length / 2));
    }

    private static void endMark(EndAllowance end, double y, int outward, double s, List<Mark> marks) {
        if (end.kind() == EndKind.NONE) {
            return;
        }
        double at = end.kind() == EndKind.BEAD ? y + outward * end.width() / 2 : y;
        MarkKind kind = switch (end.kind()) {
            case BEAD -> MarkKind.BEAD;
            case CRIMP -> MarkKind.CRIMP;
            default -> MarkKind.BEND;
        };
        marks.add(new Mark(kind, new Line(new Point2(0, at), new Point2(s, at))));
    }
}
