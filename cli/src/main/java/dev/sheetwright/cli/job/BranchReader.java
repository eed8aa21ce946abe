package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.TeeSpec;
import java.util.Set;

/**
 * Branch fittings: {@code tee}, {@code lateral} (a tee at an angle) and {@code tap} (a branch without its main
 * piece, flanged onto an existing main).
 */
final class BranchReader implements FittingReader {

    private static final Set<String> FIELDS = FittingReader.withCommon("main", "branch", "angle", "offset",
            "length", "main-length", "with-main", "main-allowances");

    @Override
    public Set<String> types() {
        return Set.of("tee", "lateral", "tap");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        ff.allowOnly(FIELDS);
        FittingReader.noPieces(ff, c.pieces());
        boolean withMain = !type.equals("tap") && ff.bool("with-main", true);
        if (type.equals("lateral") && !ff.has("angle")) {
            throw ff.error("angle", "a lateral needs its angle (less than 90 degrees)");
        }
        Allowances a = AllowanceReader.ofFitting(ff, d, "end", "joint", false);
        boolean jointGiven = ff.has("allowances") && ff.map("allowances").has("ends");
        if (!withMain && !jointGiven) {
            a = a.withEnds(a.endA(), d.table().defaultTapFlange());
        }
        Allowances mainAllowances = null;
        if (withMain) {
            mainAllowances = ff.has("main-allowances")
                    ? AllowanceReader.read(ff.map("main-allowances"), d.allowances(), d.table(), "first", "second",
                            false)
                    : d.allowances();
        } else if (ff.has("main-allowances") || ff.has("main-length")) {
            throw ff.error(ff.has("main-length") ? "main-length" : "main-allowances",
                    "a tap has no main piece; remove this field or set with-main: true");
        }
        double mainLength = withMain ? ff.positive("main-length") : 0;
        return new TeeSpec(c.id(), c.qty(), ff.positive("main"), ff.positive("branch"), ff.number("angle", 90),
                ff.number("offset", 0), ff.positive("length"), mainLength, withMain, a, mainAllowances);
    }
}
