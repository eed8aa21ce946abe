package dev.sheetwright.core.develop;

import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.PipeSpec;
import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.fitting.TeeSpec;
import dev.sheetwright.core.fitting.TransitionSpec;

/** Picks the development method for each fitting type. */
public final class Developers {

    private Developers() {
    }

    public static Development develop(FittingSpec spec, DevelopContext ctx) {
        if (spec instanceof PipeSpec pipe) {
            return PipeDeveloper.develop(pipe, ctx);
        }
        if (spec instanceof ReducerSpec reducer) {
            return ReducerDeveloper.develop(reducer, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.EccentricReducerSpec e) {
            return EccentricReducerDeveloper.develop(e, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.ElbowSpec e) {
            return ElbowDeveloper.develop(e, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.OffsetSpec o) {
            return OffsetDeveloper.develop(o, ctx);
        }
        if (spec instanceof TeeSpec tee) {
            return TeeDeveloper.develop(tee, ctx);
        }
        if (spec instanceof TransitionSpec transition) {
            return TransitionDeveloper.develop(transition, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.RectDuctSpec d) {
            return RectDuctDeveloper.develop(d, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.RectElbowSpec e) {
            return RectElbowDeveloper.develop(e, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.RectOffsetSpec o) {
            return RectOffsetDeveloper.develop(o, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.RectTransitionSpec t) {
            return RectTransitionDeveloper.develop(t, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.ShoeTapSpec s) {
            return ShoeTapDeveloper.develop(s, ctx);
        }
        if (spec instanceof dev.sheetwright.core.fitting.EndCapSpec c) {
            return EndCapDeveloper.develop(c, ctx);
        }
        throw new IllegalArgumentException("no development method for fitting type " + spec.type());
    }
}
