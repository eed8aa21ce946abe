package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndKind;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.geom.Arc;
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
 * The annular-sector blank of radial-line development (trade-reference §1), with exact allowances:
 * end allowances are concentric arcs offset radially, seam allowances are parallel offsets of the two radial
 * edges, and with notching the corner where a seam allowance meets an end allowance is cut back to the net
 * corner (§7.5).
 *
 * <p>Drawn with the apex at the origin and the sector symmetric about +y: the large end is the outer arc.
 */
public final class SectorBlank {

    private SectorBlank() {
    }

    /**
     * @param outerRadius net sector radius of the large end (L1)
     * @param innerRadius net sector radius of the small end (L2), 0 for a full cone to the apex
     * @param halfAngle half the sector angle of this piece, radians
     * @param allowances seam right/left on the radial edges; {@code endA} on the large end, {@code endB} on the small
     */
    public static Pattern build(String fitting, String piece, int count, double outerRadius, double innerRadius,
            double halfAngle, Allowances allowances, Tolerance tol) {
        double wr = allowances.seam().right();
        double wl = allowances.seam().left();
        double ea = allowances.endA().width();
        double eb = allowances.endB().width();
        boolean notch = allowances.notch();
        double slant = outerRadius - innerRadius;
        double stretchOutSmall = 2 * halfAngle * innerRadius;
        double stretchOutLarge = 2 * halfAngle * outerRadius;
        if (ea > slant || eb > slant) {
            throw new FittingException(fitting, "allowances.ends", "an end allowance (" + Math.max(ea, eb)
                    + ") is larger than the slant height of the part (" + slant + ")");
        }
        if (Math.max(wr, wl) > Math.max(stretchOutSmall, stretchOutLarge) / 2) {
            throw new FittingException(fitting, "allowances.seam", "a seam allowance (" + Math.max(wr, wl)
                    + ") is larger than half the stretch-out of the piece (" + stretchOutLarge / 2 + ")");
        }
        if (halfAngle * 2 >= 2 * Math.PI - tol.angular()) {
            throw new FittingException(fitting, "pieces", "the pattern angle reaches a full turn; split it into pieces");
        }
        double ra = outerRadius + ea;
        double rb = innerRadius - eb;
        if (innerRadius > 0 && rb <= (notch ? 0 : Math.max(wr, wl))) {
            throw new FittingException(fitting, "allowances.ends", "the small-end allowance (" + eb
                    + ") reaches the apex of the pattern (small radius " + innerRadius + ")");
        }
        Point2 o = Point2.ORIGIN;
        Point2 ur = Point2.polar(1, Math.PI / 2 - halfAngle);
        Point2 ul = Point2.polar(1, Math.PI / 2 + halfAngle);
        Point2 nr = new Point2(ur.y(), -ur.x()); // outward normal of the right edge
        Point2 nl = new Point2(-ul.y(), ul.x()); // outward normal of the left edge
        if (2 * halfAngle > Math.PI && wr + wl > 0) {
            // The gap left between the two radial edges is narrower than a half turn: the two seam strips run
            // towards each other and must not meet inside the blank's radial range.
            double det = nr.x() * nl.y() - nr.y() * nl.x();
            Point2 meet = new Point2((wr * nl.y() - wl * nr.y()) / det, (nr.x() * wl - nl.x() * wr) / det);
            // Notched, the strips are rectangles that start square at the small-end corners: they clash when
            // the offset lines meet beyond those corners. Not notched, the strips run on to the small-end
            // allowance circle: they clash when the offset lines meet outside that circle.
            boolean clash = notch ? Math.max(meet.dot(ur), meet.dot(ul)) > innerRadius - tol.linear()
                    : meet.length() > rb - tol.linear();
            if (clash) {
                throw new FittingException(fitting, "pieces", String.format(java.util.Locale.ROOT,
                        "the pattern angle (%.1f deg) leaves too little room: the two seam allowances would overlap"
                                + " near the small end; split the pattern with pieces: 2 or more",
                        Math.toDegrees(2 * halfAngle)));
            }
        }
        Point2 sr = ur.times(innerRadius);
        Point2 lr = ur.times(outerRadius);
        Point2 ll = ul.times(outerRadius);
        Point2 sl = ul.times(innerRadius);

        Contour outline;
        if (innerRadius == 0) {
            outline = coneOutline(o, ur, ul, nr, nl, ra, wr, wl, notch, outerRadius, tol);
        } else if (notch) {
            outline = ContourBuilder.startAt(ur.times(rb), tol)
                    .lineTo(sr)
                    .lineTo(sr.plus(nr.times(wr)))
                    .lineTo(lr.plus(nr.times(wr)))
                    .lineTo(lr)
                    .lineTo(ur.times(ra))
                    .arcTo(o, ul.times(ra), true)
                    .lineTo(ll)
                    .lineTo(ll.plus(nl.times(wl)))
                    .lineTo(sl.plus(nl.times(wl)))
                    .lineTo(sl)
                    .lineTo(ul.times(rb))
                    .arcTo(o, ur.times(rb), false)
                    .close();
        } else {
            outline = ContourBuilder.startAt(onOffset(nr, ur, wr, rb), tol)
                    .lineTo(onOffset(nr, ur, wr, ra))
                    .arcTo(o, onOffset(nl, ul, wl, ra), true)
                    .lineTo(onOffset(nl, ul, wl, rb))
                    .arcTo(o, onOffset(nr, ur, wr, rb), false)
                    .close();
        }

        List<Mark> marks = new ArrayList<>();
        if (wr > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(sr, lr)));
        }
        if (wl > 0) {
            marks.add(new Mark(MarkKind.BEND, new Line(ll, sl)));
        }
        endMark(allowances.endA(), outerRadius, +1, halfAngle, marks);
        if (innerRadius > 0) {
            endMark(allowances.endB(), innerRadius, -1, halfAngle, marks);
        }
        marks.add(new Mark(MarkKind.CENTRE, new Line(new Point2(0, innerRadius), new Point2(0, outerRadius))));
        Point2 label = new Point2(0, (innerRadius + outerRadius) / 2);
        return new Pattern(fitting, piece, count, outline, List.of(), marks, label);
    }

    /** Point at radius {@code r} on the line parallel to direction {@code u}, offset {@code w} along normal {@code n}. */
    private static Point2 onOffset(Point2 n, Point2 u, double w, double r) {
        return n.times(w).plus(u.times(Math.sqrt(r * r - w * w)));
    }

    private static Contour coneOutline(Point2 o, Point2 ur, Point2 ul, Point2 nr, Point2 nl, double ra, double wr,
            double wl, boolean notch, double outerRadius, Tolerance tol) {
        // A full cone: the two radial edges meet at the apex. Seam allowances are strips along them.
        ContourBuilder b = ContourBuilder.startAt(o, tol);
        if (wr > 0) {
            b.lineTo(nr.times(wr));
            b.lineTo(notch ? ur.times(outerRadius).plus(nr.times(wr)) : onOffset(nr, ur, wr, ra));
            if (notch) {
                b.lineTo(ur.times(outerRadius));
            }
        }
        if (notch || wr == 0) {
            b.lineTo(ur.times(ra));
        }
        Point2 leftTop = (notch || wl == 0) ? ul.times(ra) : onOffset(nl, ul, wl, ra);
        b.arcTo(o, leftTop, true);
        if (wl > 0) {
            if (notch) {
                b.lineTo(ul.times(outerRadius));
                b.lineTo(ul.times(outerRadius).plus(nl.times(wl)));
            }
            b.lineTo(nl.times(wl));
        }
        return b.close();
    }

    private static void endMark(EndAllowance end, double netRadius, int outward, double halfAngle, List<Mark> marks) {
        if (end.kind() == EndKind.NONE) {
            return;
        }
        double r = end.kind() == EndKind.BEAD ? netRadius + outward * end.width() / 2 : netRadius;
        MarkKind kind = switch (end.kind()) {
            case BEAD -> MarkKind.BEAD;
            case CRIMP -> MarkKind.CRIMP;
            default -> MarkKind.BEND;
        };
        marks.add(new Mark(kind, Arc.of(Point2.ORIGIN, r, Math.PI / 2 - halfAngle, 2 * halfAngle)));
    }
}
