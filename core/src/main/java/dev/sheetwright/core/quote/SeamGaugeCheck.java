package dev.sheetwright.core.quote;

import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.SeamKind;
import dev.sheetwright.core.material.GaugeRow;
import dev.sheetwright.core.material.GaugeTable;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * Warns when a fitting's longitudinal seam is unusual for the job's metal (trade-reference §7.2). The gauge range
 * 26 to 20 ga is taken as the thinnest 26 ga to the thickest 20 ga galvanized sheet of the galvanized table
 * [S:SMACNA-GALV], so any metal within those tolerances counts as in range.
 */
public final class SeamGaugeCheck {

    private SeamGaugeCheck() {
    }

    /** One warning per seam kind that is unusual for the material, naming the fittings that use it. */
    public static List<String> warnings(List<FittingSpec> fittings, Material material) {
        GaugeTable galv = GaugeTable.of(MaterialType.GALVANIZED);
        GaugeRow light = galv.row(26);
        GaugeRow heavy = galv.row(20);
        double lo = light.minIn().orElse(light.nominalIn());
        double hi = heavy.maxIn().orElse(heavy.nominalIn());
        double t = material.thicknessIn();
        List<String> out = new ArrayList<>();
        String snap = ids(fittings, SeamKind.SNAP_LOCK);
        if (!snap.isEmpty()) {
            if (material.type() == MaterialType.ALUMINUM) {
                // button-punch snap lock: not for aluminium or soft metals [S:MH p.1445]
                out.add("snap-lock seam on aluminum (" + snap + "): the button-punch snap lock is not for aluminium"
                        + " or soft metals [S:MH p.1445]");
            } else if (t < lo || t > hi) {
                // snap-lock pocket depth >= 5/8 in is published for 20-26 ga [S:MH p.1445]
                out.add(String.format(Locale.ROOT, "snap-lock seam on %.4f in metal (%s): the button-punch snap"
                        + " lock is published for 26 to 20 ga (%.4f to %.4f in) [S:MH p.1445]", t, snap, lo, hi));
            }
        }
        String pitts = ids(fittings, SeamKind.PITTSBURGH);
        if (!pitts.isEmpty() && t > hi) {
            // default allowances are for the small lock used on 26-20 ga (common practice, trade-reference §7.2);
            // heavier gauges take the large pocket (from memory)
            out.add(String.format(Locale.ROOT, "Pittsburgh seam on %.4f in metal (%s): the default allowances are for"
                    + " the small lock used on 26 to 20 ga (common practice); heavier metal takes the large pocket"
                    + " (from memory): set the allowance for the machine", t, pitts));
        }
        return out;
    }

    private static String ids(List<FittingSpec> fittings, SeamKind kind) {
        return fittings.stream().filter(f -> f.allowances().seam().kind() == kind).map(FittingSpec::id)
                .collect(Collectors.joining(", "));
    }
}
