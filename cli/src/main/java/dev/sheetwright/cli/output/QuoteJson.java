package dev.sheetwright.cli.output;

import dev.sheetwright.core.cutting.CutTimeEstimate;
import dev.sheetwright.core.quote.Quote;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The {@code quote.json} document. Numbers are unrounded; lengths in the job unit, areas in {@code areaUnit}, weights in
 * {@code weightUnit}; an unknown number (cut time outside the cut chart) is {@code null}.
 */
public final class QuoteJson {

    private QuoteJson() {
    }

    public static Map<String, Object> document(String jobName, Quote q) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("job", jobName);
        doc.put("units", q.unit().symbol());
        doc.put("weightUnit", q.weightUnit().symbol());
        doc.put("areaUnit", q.areaUnit());
        q.currency().ifPresent(c -> doc.put("currency", c));
        Map<String, Object> material = new LinkedHashMap<>();
        material.put("type", q.material().type().word());
        q.material().gauge().ifPresent(g -> material.put("gauge", g));
        material.put("thickness", q.unit().fromMm(q.material().thicknessMm()));
        material.put("source", q.material().source());
        doc.put("material", material);
        doc.put("process", q.process().word());
        List<Object> stock = new ArrayList<>();
        for (Quote.StockLine l : q.stock()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("name", l.name());
            e.put("kind", l.kind().word());
            e.put("count", l.count());
            e.put("area", l.area());
            e.put("weight", l.weight());
            e.put("cost", l.cost());
            e.put("costBasis", l.costBasis());
            stock.add(e);
        }
        doc.put("stock", stock);
        Quote.QuoteTotals t = q.totals();
        Map<String, Object> totals = new LinkedHashMap<>();
        totals.put("sheets", t.sheets());
        totals.put("stockArea", t.stockArea());
        totals.put("partArea", t.partArea());
        totals.put("stockWeight", t.stockWeight());
        totals.put("partWeight", t.partWeight());
        totals.put("scrapWeight", t.scrapWeight());
        totals.put("utilization", t.utilization());
        totals.put("cutLength", t.cutLength());
        totals.put("contourLength", t.contourLength());
        totals.put("leadInLength", t.leadInLength());
        totals.put("pierces", t.pierces());
        totals.put("rapidLength", t.rapidLength());
        totals.put("cutMinutes", t.cutMinutes().isPresent() ? t.cutMinutes().getAsDouble() : null);
        if (q.cutTime().isPresent()) {
            CutTimeEstimate e = q.cutTime().get();
            Map<String, Object> parts = new LinkedHashMap<>();
            parts.put("cutting", e.cuttingMinutes());
            parts.put("piercing", e.piercingMinutes());
            parts.put("rapids", e.rapidMinutes());
            parts.put("handling", e.handlingMinutes());
            totals.put("cutMinutesBy", parts);
        } else {
            totals.put("cutMinutesBy", null);
        }
        totals.put("materialCost", t.materialCost());
        totals.put("machineCost", t.machineCost().isPresent() ? t.machineCost().getAsDouble() : null);
        totals.put("totalCost", t.totalCost().isPresent() ? t.totalCost().getAsDouble() : null);
        doc.put("totals", totals);
        List<Object> rates = new ArrayList<>();
        for (Quote.Rate r : q.rates()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("key", r.key());
            e.put("name", r.name());
            e.put("value", r.value());
            e.put("unit", r.unit());
            e.put("source", r.source());
            rates.add(e);
        }
        doc.put("rates", rates);
        doc.put("warnings", q.warnings());
        return doc;
    }
}
