package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.FittingSpec;
import java.util.HashSet;
import java.util.Set;

/**
 * Reads the fields of one fitting family (one or more {@code type:} names) into a spec. {@link JobReader} has
 * already read {@code id}, {@code type}, {@code qty} and {@code pieces}; a reader refuses fields it does not know.
 */
interface FittingReader {

    /** Fields every fitting may have. */
    Set<String> COMMON = Set.of("id", "type", "qty", "pieces", "allowances", "note");

    /** The {@code type:} names this reader reads. */
    Set<String> types();

    FittingSpec read(String type, Fields fitting, Common common, FittingDefaults defaults);

    /** The fields every fitting has, already read. */
    record Common(String id, int qty, int pieces) {
    }

    /** {@link #COMMON} plus the family's own fields. */
    static Set<String> withCommon(String... own) {
        Set<String> u = new HashSet<>(COMMON);
        u.addAll(Set.of(own));
        return u;
    }

    /** Elbow-like fittings are made of gores; {@code pieces} does not apply to them. */
    static void noPieces(Fields ff, int pieces) {
        if (pieces != 1) {
            throw ff.error("pieces", "an elbow is already made of gores; pieces does not apply");
        }
    }

    /** {@code offset: 2} (along x) or {@code offset: {x: 2, y: 1}}; absent = no offset. */
    static double[] offset(Fields ff) {
        if (!ff.has("offset")) {
            return new double[] {0, 0};
        }
        if (ff.raw("offset") instanceof java.util.Map<?, ?>) {
            Fields o = ff.map("offset");
            o.allowOnly(Set.of("x", "y"));
            return new double[] {o.number("x", 0), o.number("y", 0)};
        }
        return new double[] {ff.number("offset"), 0};
    }
}
