package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.OffsetSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.SeamPosition;
import java.util.Set;

/** Gored fittings: {@code type: elbow} and {@code type: offset} (two elbows); both know {@code allowances.miter}. */
final class ElbowReader implements FittingReader {

    private static final Set<String> ELBOW = FittingReader.withCommon("diameter", "angle", "gores", "radius",
            "seam-at");
    private static final Set<String> OFFSET = FittingReader.withCommon("diameter", "offset", "angle", "length",
            "radius", "gores", "seam-at");

    @Override
    public Set<String> types() {
        return Set.of("elbow", "offset");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        ff.allowOnly(type.equals("elbow") ? ELBOW : OFFSET);
        FittingReader.noPieces(ff, c.pieces());
        if (type.equals("offset") && ff.has("angle") == ff.has("length")) {
            throw ff.error("angle", "give either angle (of each elbow) or length (the advance)");
        }
        Allowances a = AllowanceReader.ofFitting(ff, d, "first", "second", true);
        SeamAllowance miter = AllowanceReader.miter(ff, d);
        if (type.equals("elbow")) {
            return new ElbowSpec(c.id(), c.qty(), ff.positive("diameter"), ff.positive("angle"),
                    ff.integer("gores", 0, 2, ElbowSpec.MAX_GORES), ff.notNegative("radius", 0), seamAt(ff), a,
                    miter);
        }
        return new OffsetSpec(c.id(), c.qty(), ff.positive("diameter"), ff.positive("offset"),
                ff.notNegative("angle", 0), ff.notNegative("length", 0), ff.notNegative("radius", 0),
                ff.integer("gores", 0, 2, ElbowSpec.MAX_GORES), seamAt(ff), a, miter);
    }

    private static SeamPosition seamAt(Fields ff) {
        if (!ff.has("seam-at")) {
            return SeamPosition.SIDE;
        }
        try {
            return SeamPosition.parse(ff.string("seam-at"));
        } catch (IllegalArgumentException e) {
            throw ff.error("seam-at", e.getMessage());
        }
    }
}
