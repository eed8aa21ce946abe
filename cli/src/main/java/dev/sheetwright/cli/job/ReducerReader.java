package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EccentricReducerSpec;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.ReducerSpec;
import java.util.Set;

/**
 * {@code type: reducer} (concentric, or eccentric with {@code offset} / {@code flat}) and {@code type: cone}
 * (a reducer to a point).
 */
final class ReducerReader implements FittingReader {

    private static final Set<String> REDUCER = FittingReader.withCommon("large", "small", "height", "offset", "flat");
    private static final Set<String> CONE = FittingReader.withCommon("diameter", "height", "offset");

    @Override
    public Set<String> types() {
        return Set.of("reducer", "cone");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        if (type.equals("cone")) {
            ff.allowOnly(CONE);
            double[] off = FittingReader.offset(ff);
            return new EccentricReducerSpec(c.id(), c.qty(), ff.positive("diameter"), 0, ff.positive("height"),
                    off[0], off[1], false, c.pieces(), AllowanceReader.ofFitting(ff, d, "large", "small", false));
        }
        ff.allowOnly(REDUCER);
        Allowances a = AllowanceReader.ofFitting(ff, d, "large", "small", false);
        if (ff.has("offset") || ff.bool("flat", false)) {
            double[] off = FittingReader.offset(ff);
            return new EccentricReducerSpec(c.id(), c.qty(), ff.positive("large"), ff.number("small"),
                    ff.positive("height"), off[0], off[1], ff.bool("flat", false), c.pieces(), a);
        }
        if (ff.number("small") == 0) {
            return new EccentricReducerSpec(c.id(), c.qty(), ff.positive("large"), 0, ff.positive("height"), 0, 0,
                    false, c.pieces(), a);
        }
        return new ReducerSpec(c.id(), c.qty(), ff.positive("large"), ff.positive("small"), ff.positive("height"),
                c.pieces(), a);
    }
}
