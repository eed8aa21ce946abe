package dev.sheetwright.cli.output;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.cli.rack.RackPlan;
import dev.sheetwright.cli.run.JobNest;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.model.Unplaced;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The {@code nest.json} document: sheets with their parts, unplaced pieces with reasons, totals. */
public final class NestJson {

    private NestJson() {
    }

    public static String sheetFile(SheetLayout s) {
        return String.format("sheets/sheet-%03d", s.index() + 1);
    }

    public static Map<String, Object> document(JobNest nest) {
        return document(nest, null);
    }

    /**
     * The document; each sheet's {@code offcut} is its clean offcut (with the rack id it will get, if
     * {@code rack} records it), and {@code plan} is the rack plan, or null when the nest was not planned
     * against the rack.
     */
    public static Map<String, Object> document(JobNest nest, RackPlan rack) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("job", nest.job().name());
        doc.put("units", nest.job().unit().symbol());
        List<Object> sheets = new ArrayList<>();
        double stockArea = 0;
        for (SheetLayout s : nest.result().sheets()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("index", s.index() + 1);
            e.put("stock", s.stock().match(
                    sh -> stockEntry("name", sh.name(), sh.width(), sh.height()),
                    r -> stockEntry("id", r.id(), r.outline().getEnvelopeInternal().getWidth(),
                            r.outline().getEnvelopeInternal().getHeight()),
                    c -> stockEntry("name", c.name(), s.usedLength(), c.width())));
            e.put("file", sheetFile(s) + ".dxf");
            e.put("utilization", s.utilization());
            List<Object> parts = new ArrayList<>();
            for (Placement p : s.parts()) {
                Map<String, Object> pe = new LinkedHashMap<>();
                pe.put("fitting", p.fitting());
                pe.put("piece", p.piece());
                pe.put("copy", p.copy() + 1);
                pe.put("x", p.x());
                pe.put("y", p.y());
                pe.put("rotation", p.rotationDeg());
                pe.put("mirrored", p.mirrored());
                parts.add(pe);
            }
            e.put("parts", parts);
            Offcut clean = nest.offcut(s);
            if (clean != null) {
                Map<String, Object> o = new LinkedHashMap<>();
                RackPlan.PlannedOffcut planned = rack == null ? null : rack.offcutOfSheet(s.index() + 1);
                if (planned != null) {
                    o.put("id", planned.id());
                }
                o.put("x", clean.x());
                o.put("y", clean.y());
                o.put("width", clean.width());
                o.put("height", clean.height());
                e.put("offcut", o);
            } else {
                e.put("offcut", null);
            }
            sheets.add(e);
            stockArea += s.stockArea();
        }
        doc.put("sheets", sheets);
        List<Object> unplaced = new ArrayList<>();
        for (Unplaced u : nest.result().unplaced()) {
            Map<String, Object> ue = new LinkedHashMap<>();
            ue.put("fitting", u.fitting());
            ue.put("piece", u.piece());
            ue.put("copy", u.copy() + 1);
            ue.put("reason", u.reason());
            unplaced.add(ue);
        }
        doc.put("unplaced", unplaced);
        Map<String, Object> totals = new LinkedHashMap<>();
        double partArea = nest.partArea();
        totals.put("sheets", nest.result().sheets().size());
        totals.put("partArea", partArea);
        totals.put("stockArea", stockArea);
        totals.put("utilization", stockArea > 0 ? partArea / stockArea : 0);
        doc.put("totals", totals);
        doc.put("plan", rack == null ? null : rack.toJson());
        doc.put("cautions", Cautions.ALL);
        return doc;
    }

    /** A stock entry of nest.json: its name (or id) and its width and height. */
    private static Map<String, Object> stockEntry(String key, String value, double width, double height) {
        Map<String, Object> stock = new LinkedHashMap<>();
        stock.put(key, value);
        stock.put("width", width);
        stock.put("height", height);
        return stock;
    }
}
