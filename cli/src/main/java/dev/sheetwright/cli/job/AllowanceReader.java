package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.SeamAllowance;
import java.util.Set;

/**
 * Reads {@code allowances:} mappings (the job's defaults, a fitting's own, a tee's {@code main-allowances}) over
 * a base. {@code ends} is one value for both ends or a mapping naming the two ends. Whether {@code miter} is a
 * known key is the caller's argument, never a state of the reader.
 */
final class AllowanceReader {

    private static final Set<String> PLAIN = Set.of("seam", "ends", "notch");
    private static final Set<String> WITH_MITER = Set.of("seam", "ends", "notch", "miter");

    private AllowanceReader() {
    }

    static Allowances read(Fields a, Allowances base, AllowanceTable table, String endA, String endB,
            boolean miterKnown) {
        a.allowOnly(miterKnown ? WITH_MITER : PLAIN);
        SeamAllowance seam = base.seam();
        if (a.has("seam")) {
            seam = seam(a, "seam", table);
        }
        EndAllowance ea = base.endA();
        EndAllowance eb = base.endB();
        if (a.has("ends")) {
            if (a.raw("ends") instanceof java.util.Map<?, ?>) {
                Fields ends = a.map("ends");
                ends.allowOnly(Set.of(endA, endB));
                ea = ends.has(endA) ? end(ends, endA, table) : ea;
                eb = ends.has(endB) ? end(ends, endB, table) : eb;
            } else {
                ea = end(a, "ends", table);
                eb = ea;
            }
        }
        return new Allowances(seam, ea, eb, a.bool("notch", base.notch()));
    }

    /** A fitting's allowances: its own {@code allowances:} over the job's, or the job's. */
    static Allowances ofFitting(Fields ff, FittingDefaults d, String endA, String endB, boolean miterKnown) {
        return ff.has("allowances")
                ? read(ff.map("allowances"), d.allowances(), d.table(), endA, endB, miterKnown)
                : d.allowances();
    }

    /** The miter seam of an elbow-like fitting: its own {@code allowances.miter}, else the job's default. */
    static SeamAllowance miter(Fields ff, FittingDefaults d) {
        if (ff.has("allowances") && ff.map("allowances").has("miter")) {
            return seam(ff.map("allowances"), "miter", d.table());
        }
        return d.miter();
    }

    static SeamAllowance seam(Fields f, String key, AllowanceTable table) {
        try {
            return table.parseSeam(f.string(key));
        } catch (IllegalArgumentException e) {
            if (e instanceof JobFileException j) {
                throw j;
            }
            throw f.error(key, e.getMessage());
        }
    }

    private static EndAllowance end(Fields f, String key, AllowanceTable table) {
        try {
            return table.parseEnd(f.string(key));
        } catch (IllegalArgumentException e) {
            if (e instanceof JobFileException j) {
                throw j;
            }
            throw f.error(key, e.getMessage());
        }
    }
}
