package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.TransitionSpec;
import java.util.Set;

/** {@code type: transition}: rectangle (width x depth) to round (diameter), optionally offset. */
final class TransitionReader implements FittingReader {

    private static final Set<String> FIELDS = FittingReader.withCommon("width", "depth", "diameter", "height",
            "offset");

    @Override
    public Set<String> types() {
        return Set.of("transition");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        ff.allowOnly(FIELDS);
        double[] off = FittingReader.offset(ff);
        return new TransitionSpec(c.id(), c.qty(), ff.positive("width"), ff.positive("depth"),
                ff.positive("diameter"), ff.positive("height"), off[0], off[1], c.pieces(),
                AllowanceReader.ofFitting(ff, d, "rect", "round", false));
    }
}
