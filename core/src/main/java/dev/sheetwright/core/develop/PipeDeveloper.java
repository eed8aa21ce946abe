package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.PipeSpec;
import dev.sheetwright.core.geom.Pattern;
import java.util.List;

/**
 * Straight pipe and collars by parallel-line development: stretch-out = pi x mean diameter, split evenly when
 * the wrap is made in several pieces (trade-reference §6, [S:LONG p.32] [S:CYC]).
 */
public final class PipeDeveloper {

    private PipeDeveloper() {
    }

    public static Development develop(PipeSpec spec, DevelopContext ctx) {
        double d = ctx.mean(spec.diameter());
        if (!(d > 0)) {
            throw new dev.sheetwright.core.fitting.FittingException(spec.id(), "diameter",
                    "the mean diameter is not positive after the thickness correction (" + d + ")");
        }
        double stretchOut = Math.PI * d;
        double pieceStretch = stretchOut / spec.pieces();
        String piece = spec.pieces() == 1 ? "wrap" : "wrap-1of" + spec.pieces();
        Pattern p = RectangleBlank.build(spec.id(), piece, spec.pieces(), pieceStretch, spec.length(),
                spec.allowances(), ctx.tolerance());
        Layout layout = Layout.of(
                LayoutValue.length("meanDiameter", "mean diameter", d),
                LayoutValue.length("stretchOut", "stretch-out (net, whole pipe)", stretchOut),
                LayoutValue.length("pieceStretchOut", "stretch-out of this piece (net)", pieceStretch),
                LayoutValue.length("length", "length (net)", spec.length()),
                LayoutValue.length("blankWidth", "blank width with allowances", p.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with allowances", p.bounds().height()));
        return new Development(spec, List.of(new DevelopedPiece(p, layout)), List.of());
    }
}
