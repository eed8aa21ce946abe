package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.EndCapSpec;
import dev.sheetwright.core.geom.Pattern;
import java.util.List;

/** Rectangular end cap: a flat W x D panel with a flange turned on every side, corners notched (§13.7, §7.5). */
public final class EndCapDeveloper {

    private EndCapDeveloper() {
    }

    public static Development develop(EndCapSpec spec, DevelopContext ctx) {
        double f = spec.flange();
        var ends = spec.allowances();
        Pattern p = RectPanel.build(spec.id(), "cap", 1, new double[] {spec.width()}, spec.depth(),
                new RectPanel.Edges(f, f, ends.endA(), ends.endB(), spec.notch()), List.of(), ctx.tolerance());
        Layout layout = new Layout(List.of(
                LayoutValue.length("width", "panel width (net)", spec.width()),
                LayoutValue.length("depth", "panel depth (net)", spec.depth()),
                LayoutValue.length("flange", "flange on every side", f),
                LayoutValue.length("blankWidth", "blank width with flanges", p.bounds().width()),
                LayoutValue.length("blankHeight", "blank height with flanges", p.bounds().height())),
                List.of());
        return new Development(spec, List.of(new DevelopedPiece(p, layout)), List.of());
    }
}
