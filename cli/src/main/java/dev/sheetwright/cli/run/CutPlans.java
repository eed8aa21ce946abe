package dev.sheetwright.cli.run;

import dev.sheetwright.core.cutpath.CutPathSettings;
import dev.sheetwright.core.cutpath.CutPlanner;
import dev.sheetwright.core.cutpath.SheetCutPlan;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Envelope;

/**
 * The cut plan of every sheet of a nest (order, leads, compensated paths, rapids), made once and used by the sheet
 * DXFs, the G-code, the previews and the quote, so they all show the same program.
 */
public record CutPlans(CutPathSettings settings, Map<Integer, SheetCutPlan> bySheet) {

    public CutPlans {
        bySheet = Map.copyOf(bySheet);
    }

    /**
     * Plans every sheet of the nest.
     *
     * @throws IllegalArgumentException when a contour is too small for the kerf offset (names the part)
     */
    public static CutPlans of(JobNest nest, CutPathSettings settings) {
        Map<Integer, SheetCutPlan> plans = new LinkedHashMap<>();
        for (SheetLayout s : nest.result().sheets()) {
            plans.put(s.index(), CutPlanner.plan(JobQuote.placedParts(s, nest.plan()), labels(s), stockBox(s),
                    settings, nest.job().tolerance()));
        }
        return new CutPlans(settings, plans);
    }

    public SheetCutPlan of(SheetLayout sheet) {
        return bySheet.get(sheet.index());
    }

    /** The name of each part as on its label: fitting, piece and copy number. */
    public static List<String> labels(SheetLayout s) {
        List<String> out = new ArrayList<>();
        for (Placement p : s.parts()) {
            out.add(p.fitting() + " " + p.piece() + " #" + (p.copy() + 1));
        }
        return out;
    }

    /** The stock's extent in sheet coordinates: no pierce lies outside it. */
    static Box2 stockBox(SheetLayout s) {
        return s.stock().match(
                sh -> new Box2(0, 0, sh.width(), sh.height()),
                r -> {
                    Envelope e = r.outline().getEnvelopeInternal();
                    return new Box2(e.getMinX(), e.getMinY(), e.getMaxX(), e.getMaxY());
                },
                c -> new Box2(0, 0, s.usedLength(), c.width()));
    }
}
