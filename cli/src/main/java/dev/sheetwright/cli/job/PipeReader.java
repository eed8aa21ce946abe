package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.PipeSpec;
import java.util.Set;

/** {@code type: pipe}: diameter and length. */
final class PipeReader implements FittingReader {

    private static final Set<String> FIELDS = FittingReader.withCommon("diameter", "length");

    @Override
    public Set<String> types() {
        return Set.of("pipe");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        ff.allowOnly(FIELDS);
        return new PipeSpec(c.id(), c.qty(), ff.positive("diameter"), ff.positive("length"), c.pieces(),
                AllowanceReader.ofFitting(ff, d, "first", "second", false));
    }
}
