package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.RectConstruction;
import dev.sheetwright.core.fitting.RectDuctSpec;
import dev.sheetwright.core.geom.Pattern;
import java.util.ArrayList;
import java.util.List;

/**
 * Straight rectangular duct (trade-reference §13.2): one full wrap (one seam, three bends), two L halves (one bend
 * each), a U and a cap, or four flat sides. Every seam has a pocket edge and a flange edge: the wrap and the L
 * halves carry one of each; the U (and the width sides) carry pockets, the cap (and the depth sides) flanges.
 * {@code auto} takes the make-up with the fewest seams whose pieces all fit the job's stock.
 */
public final class RectDuctDeveloper {

    /** Make-ups by their number of longitudinal seams: 1, 2, 2, 4 (L halves before U and cap: the usual choice). */
    private static final List<RectConstruction> BY_SEAMS = List.of(RectConstruction.WRAP,
            RectConstruction.L_HALVES, RectConstruction.U_AND_CAP, RectConstruction.FOUR_SIDES);

    private RectDuctDeveloper() {
    }

    public static Development develop(RectDuctSpec spec, DevelopContext ctx) {
        List<String> warnings = new ArrayList<>();
        RectConstruction c = spec.construction();
        List<DevelopedPiece> pieces = null;
        if (c == RectConstruction.AUTO) {
            for (RectConstruction candidate : BY_SEAMS) {
                List<DevelopedPiece> p = pieces(spec, candidate, ctx);
                if (p.stream().allMatch(d -> ctx.room().fits(d.pattern().bounds().width(),
                        d.pattern().bounds().height(), ctx.tolerance()))) {
                    pieces = p;
                    break;
                }
            }
            if (pieces == null) {
                pieces = pieces(spec, RectConstruction.FOUR_SIDES, ctx);
                warnings.add("construction auto: even four flat sides are larger than every stock listed");
            }
        } else {
            pieces = pieces(spec, c, ctx);
        }
        return new Development(spec, pieces, warnings);
    }

    private static List<DevelopedPiece> pieces(RectDuctSpec spec, RectConstruction c, DevelopContext ctx) {
        double w = spec.width();
        double d = spec.depth();
        Allowances a = spec.allowances();
        double pocket = a.seam().right();
        double flange = a.seam().left();
        List<DevelopedPiece> out = new ArrayList<>();
        switch (c) {
            case WRAP -> out.add(panel(spec, "wrap", 1, new double[] {w, d, w, d}, flange, pocket, ctx));
            case L_HALVES -> out.add(panel(spec, "l-half", 2, new double[] {w, d}, flange, pocket, ctx));
            case U_AND_CAP -> {
                out.add(panel(spec, "u", 1, new double[] {d, w, d}, pocket, pocket, ctx));
                out.add(panel(spec, "cap", 1, new double[] {w}, flange, flange, ctx));
            }
            case FOUR_SIDES -> {
                out.add(panel(spec, "width-side", 2, new double[] {w}, pocket, pocket, ctx));
                out.add(panel(spec, "depth-side", 2, new double[] {d}, flange, flange, ctx));
            }
            default -> throw new IllegalArgumentException("no straight-duct make-up " + c.word());
        }
        return out;
    }

    private static DevelopedPiece panel(RectDuctSpec spec, String piece, int count, double[] faces, double left,
            double right, DevelopContext ctx) {
        Allowances a = spec.allowances();
        faces = faces.clone();
        for (int i = 0; i + 1 < faces.length; i++) { // half of each corner bend's deduction off either face
            faces[i] -= spec.bendDeduction() / 2;
            faces[i + 1] -= spec.bendDeduction() / 2;
        }
        Pattern p = RectPanel.build(spec.id(), piece, count, faces, spec.length(),
                new RectPanel.Edges(left, right, a.endA(), a.endB(), a.notch()), List.of(), ctx.tolerance());
        List<LayoutValue> values = new ArrayList<>();
        double net = 0;
        for (double f : faces) {
            net += f;
        }
        values.add(LayoutValue.length("netWidth", "net width (faces, less bend deductions)", net));
        if (spec.bendDeduction() > 0) {
            values.add(LayoutValue.length("bendDeduction", "bend deduction per corner bend", spec.bendDeduction()));
        }
        values.add(LayoutValue.length("length", "joint length (net)", spec.length()));
        values.add(LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()));
        values.add(LayoutValue.length("blankLength", "blank length with allowances", p.bounds().height()));
        double at = left;
        for (int i = 0; i + 1 < faces.length; i++) {
            at += faces[i];
            values.add(LayoutValue.length("bend" + (i + 1), "bend " + (i + 1) + " from the left cut edge", at));
        }
        values.add(LayoutValue.length("leftAllowance", "left edge allowance", left));
        values.add(LayoutValue.length("rightAllowance", "right edge allowance", right));
        return new DevelopedPiece(p, new Layout(values, List.of()));
    }
}
