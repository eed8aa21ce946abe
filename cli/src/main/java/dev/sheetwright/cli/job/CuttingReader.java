package dev.sheetwright.cli.job;

import dev.sheetwright.core.cutpath.CutPathSettings;
import dev.sheetwright.core.cutpath.KerfCompensation;
import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.job.CuttingRules;
import dev.sheetwright.core.job.RotationMode;
import dev.sheetwright.core.job.ShopDefaults;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.core.units.Lengths;
import java.util.Locale;
import java.util.Set;

/**
 * The job file's {@code cutting:} section, the one place its keys are read: process, kerf, gap, margin, rotation
 * and mirror ({@link #read}), lead-in, lead-out and kerf-compensation ({@link #cutPath}). Missing values are the
 * shop defaults of the process ({@link ShopDefaults}).
 */
final class CuttingReader {

    static final Set<String> KEYS = Set.of("process", "kerf", "gap", "margin", "rotation", "mirror", "lead-in",
            "lead-out", "kerf-compensation");

    private CuttingReader() {
    }

    /** The rules of the section {@code c}, or the defaults when the job has no {@code cutting:} section. */
    static CuttingRules read(Fields c, LengthUnit unit) {
        if (c == null) {
            return ShopDefaults.cutting(unit);
        }
        c.allowOnly(KEYS);
        CuttingProcess process = CuttingProcess.PLASMA;
        if (c.has("process")) {
            try {
                process = CuttingProcess.parse(c.string("process"));
            } catch (IllegalArgumentException e) {
                throw c.error("process", e.getMessage());
            }
        }
        double kerf = c.notNegative("kerf", ShopDefaults.kerf(process, unit));
        double gap = c.notNegative("gap", ShopDefaults.gap(process, kerf, unit));
        if (gap <= kerf) {
            throw c.error("gap", "must exceed the kerf (" + kerf + "), got " + gap);
        }
        double margin = c.notNegative("margin", ShopDefaults.margin(process, unit));
        RotationMode rotation = RotationMode.FREE;
        double step = 0;
        if (c.has("rotation")) {
            String r = c.string("rotation").toLowerCase(Locale.ROOT);
            if (r.equals("free")) {
                rotation = RotationMode.FREE;
            } else if (r.equals("90")) {
                rotation = RotationMode.QUARTER;
            } else if (r.equals("none")) {
                rotation = RotationMode.NONE;
            } else if (r.startsWith("step ")) {
                rotation = RotationMode.STEP;
                try {
                    step = Lengths.parse(r.substring(5));
                } catch (IllegalArgumentException e) {
                    throw c.error("rotation", e.getMessage());
                }
                if (!(step > 0 && step <= 180)) {
                    throw c.error("rotation", "step must be from 0 to 180 degrees, got " + step);
                }
            } else {
                throw c.error("rotation", "use free, step D (degrees), 90 or none; got '" + r + "'");
            }
        }
        return new CuttingRules(process, kerf, gap, margin, rotation, step, c.bool("mirror", false));
    }

    /**
     * How contours are entered, left and compensated. A lead longer than the gap less the kerf could reach the
     * next part and is refused.
     */
    static CutPathSettings cutPath(Fields c, CuttingRules rules, LengthUnit unit) {
        double longest = CutPathSettings.longestLeadIn(rules.gap(), rules.kerf());
        double leadIn = ShopDefaults.leadIn(rules.process(), rules.gap(), rules.kerf(), unit);
        KerfCompensation compensation = KerfCompensation.PATH;
        if (c != null) {
            leadIn = c.notNegative("lead-in", leadIn);
            if (leadIn > longest) {
                throw c.error("lead-in", "must be at most the gap less the kerf (" + format(longest) + " "
                        + unit.symbol() + ") so a lead never reaches the next part, got " + format(leadIn));
            }
        }
        double leadOut = ShopDefaults.leadOut(rules.process(), leadIn, unit);
        if (c != null) {
            leadOut = c.notNegative("lead-out", leadOut);
            if (leadOut > longest) {
                throw c.error("lead-out", "must be at most the gap less the kerf (" + format(longest) + " "
                        + unit.symbol() + "), got " + format(leadOut));
            }
            if (c.has("kerf-compensation")) {
                try {
                    compensation = KerfCompensation.parse(c.string("kerf-compensation"));
                } catch (JobFileException e) {
                    throw e;
                } catch (IllegalArgumentException e) {
                    throw c.error("kerf-compensation", e.getMessage());
                }
            }
        }
        return new CutPathSettings(rules.kerf(), leadIn, leadOut, compensation);
    }

    private static String format(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
