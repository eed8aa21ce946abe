package dev.sheetwright.cli.job;

import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.EndCapSpec;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.RectConstruction;
import dev.sheetwright.core.fitting.RectDuctSpec;
import dev.sheetwright.core.fitting.RectElbowSpec;
import dev.sheetwright.core.fitting.RectOffsetSpec;
import dev.sheetwright.core.fitting.RectTransitionSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.ShoeTapSpec;
import dev.sheetwright.core.units.LengthUnit;
import java.util.Set;

/**
 * Rectangular fittings: {@code rect-duct}, {@code rect-elbow}, {@code rect-offset}, {@code rect-transition},
 * {@code shoe-tap} and {@code end-cap}. Their {@code allowances:} take rectangular seams (pittsburgh, snap-lock,
 * none) and rectangular end connectors (none, slip, drive, flange W); the job-wide seam applies when it is one of
 * those, otherwise Pittsburgh; job-wide {@code ends} are round-end words and do not apply (ends default to none).
 */
final class RectReader implements FittingReader {

    private static final Set<String> DUCT = FittingReader.withCommon("width", "depth", "length", "construction",
            "bend-deduction");
    private static final Set<String> ELBOW = FittingReader.withCommon("width", "depth", "angle", "throat-radius",
            "legs");
    private static final Set<String> OFFSET = FittingReader.withCommon("width", "depth", "offset", "length");
    private static final Set<String> TRANSITION = FittingReader.withCommon("width", "depth", "to", "length",
            "offset", "construction");
    private static final Set<String> TAP = FittingReader.withCommon("width", "depth", "height", "entry");
    private static final Set<String> CAP = FittingReader.withCommon("width", "depth", "flange");

    /** Least default shoe-tap entry, 4 in (from memory, trade-reference §13.7: E = W/4, at least 4 in). */
    private static final double LEAST_DEFAULT_ENTRY_IN = 4;

    @Override
    public Set<String> types() {
        return Set.of("rect-duct", "rect-elbow", "rect-offset", "rect-transition", "shoe-tap", "end-cap");
    }

    @Override
    public FittingSpec read(String type, Fields ff, Common c, FittingDefaults d) {
        ff.allowOnly(switch (type) {
            case "rect-duct" -> DUCT;
            case "rect-elbow" -> ELBOW;
            case "rect-offset" -> OFFSET;
            case "rect-transition" -> TRANSITION;
            case "shoe-tap" -> TAP;
            default -> CAP;
        });
        if (c.pieces() != 1) {
            throw ff.error("pieces", "does not apply to rectangular fittings; choose their make-up with"
                    + " construction where the type has one");
        }
        double w = ff.positive("width");
        double dp = ff.positive("depth");
        return switch (type) {
            case "rect-duct" -> new RectDuctSpec(c.id(), c.qty(), w, dp, ff.positive("length"),
                    construction(ff, RectConstruction.L_HALVES, RectConstruction.WRAP, RectConstruction.L_HALVES,
                            RectConstruction.U_AND_CAP, RectConstruction.FOUR_SIDES, RectConstruction.AUTO),
                    allowances(ff, d, "first", "second", EndAllowance.NONE), ff.notNegative("bend-deduction", 0));
            case "rect-elbow" -> new RectElbowSpec(c.id(), c.qty(), w, dp, ff.positive("angle"),
                    ff.notNegative("throat-radius", w / 2), ff.notNegative("legs", 0),
                    allowances(ff, d, "first", "second", EndAllowance.NONE));
            case "rect-offset" -> new RectOffsetSpec(c.id(), c.qty(), w, dp, ff.positive("offset"),
                    ff.positive("length"), allowances(ff, d, "first", "second", EndAllowance.NONE));
            case "rect-transition" -> transition(ff, c, d, w, dp);
            case "shoe-tap" -> {
                double h = ff.positive("height");
                double least = d.unit().convert(LEAST_DEFAULT_ENTRY_IN, LengthUnit.INCH);
                double entry = ff.notNegative("entry", Math.min(Math.max(w / 4, least), Math.min(w, h / 2)));
                yield new ShoeTapSpec(c.id(), c.qty(), w, dp, h, entry,
                        allowances(ff, d, "main", "top", d.table().defaultRectTapFlange()));
            }
            default -> new EndCapSpec(c.id(), c.qty(), w, dp, ff.notNegative("flange", d.table().defaultCapFlange()),
                    d.allowances().notch());
        };
    }

    private static FittingSpec transition(Fields ff, Common c, FittingDefaults d, double w, double dp) {
        Fields to = ff.map("to");
        to.allowOnly(Set.of("width", "depth"));
        double[] off = FittingReader.offset(ff);
        return new RectTransitionSpec(c.id(), c.qty(), w, dp, to.positive("width"), to.positive("depth"),
                ff.positive("length"), off[0], off[1],
                construction(ff, RectConstruction.FACES, RectConstruction.FACES, RectConstruction.L_HALVES),
                allowances(ff, d, "first", "second", EndAllowance.NONE));
    }

    private static RectConstruction construction(Fields ff, RectConstruction dflt, RectConstruction... allowed) {
        if (!ff.has("construction")) {
            return dflt;
        }
        try {
            return RectConstruction.parse(ff.string("construction"), allowed);
        } catch (IllegalArgumentException e) {
            throw ff.error("construction", e.getMessage());
        }
    }

    /**
     * The fitting's rectangular allowances: its own {@code allowances:} (seam, ends, notch) over the defaults: the
     * job's seam when rectangular work takes it (else Pittsburgh), {@code firstEnd} on the first end and none on the
     * second, the job's notch.
     */
    private static Allowances allowances(Fields ff, FittingDefaults d, String endA, String endB,
            EndAllowance firstEnd) {
        AllowanceTable table = d.table();
        SeamAllowance jobSeam = d.allowances().seam();
        SeamAllowance seam = AllowanceTable.rectangularSeam(jobSeam.kind()) ? jobSeam : table.defaultRectSeam();
        EndAllowance ea = firstEnd;
        EndAllowance eb = EndAllowance.NONE;
        boolean notch = d.allowances().notch();
        if (ff.has("allowances")) {
            Fields a = ff.map("allowances");
            a.allowOnly(Set.of("seam", "ends", "notch"));
            if (a.has("seam")) {
                seam = read(a, "seam", () -> table.parseRectSeam(a.string("seam")));
            }
            if (a.has("ends")) {
                if (a.raw("ends") instanceof java.util.Map<?, ?>) {
                    Fields ends = a.map("ends");
                    ends.allowOnly(Set.of(endA, endB));
                    ea = ends.has(endA) ? read(ends, endA, () -> table.parseRectEnd(ends.string(endA))) : ea;
                    eb = ends.has(endB) ? read(ends, endB, () -> table.parseRectEnd(ends.string(endB))) : eb;
                } else {
                    ea = read(a, "ends", () -> table.parseRectEnd(a.string("ends")));
                    eb = ea;
                }
            }
            notch = a.bool("notch", notch);
        }
        return new Allowances(seam, ea, eb, notch);
    }

    private static <T> T read(Fields f, String key, java.util.function.Supplier<T> reader) {
        try {
            return reader.get();
        } catch (JobFileException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw f.error(key, e.getMessage());
        }
    }
}
