package dev.sheetwright.cli.output;

import dev.sheetwright.cli.Cautions;
import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.develop.LayoutTable;
import dev.sheetwright.core.develop.LayoutValue;
import dev.sheetwright.core.geom.Box2;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Writes {@code patterns.json}: one entry per distinct piece with its numbers and hand-layout dimensions. */
public final class PatternsJson {

    private PatternsJson() {
    }

    /** File name of a piece's drawing (without extension), relative to the output folder. */
    public static String partFile(Pattern p) {
        return "parts/" + safe(p.fitting()) + "_" + safe(p.piece());
    }

    static String safe(String s) {
        return s.replaceAll("[^A-Za-z0-9._-]", "-");
    }

    public static Map<String, Object> document(Job job, List<Development> developments) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("job", job.name());
        doc.put("units", job.unit().symbol());
        Map<String, Object> material = new LinkedHashMap<>();
        material.put("type", job.material().type().word());
        job.material().gauge().ifPresent(g -> material.put("gauge", g));
        material.put("thickness", job.thickness());
        doc.put("material", material);
        doc.put("dimensions", job.dimensions().word());
        List<Object> pieces = new ArrayList<>();
        for (Development d : developments) {
            for (DevelopedPiece piece : d.pieces()) {
                Pattern p = piece.pattern();
                Box2 b = p.bounds();
                Map<String, Object> e = new LinkedHashMap<>();
                e.put("fitting", p.fitting());
                e.put("type", d.fitting().type());
                e.put("piece", p.piece());
                e.put("count", p.count());
                e.put("qty", d.fitting().qty());
                e.put("file", partFile(p) + ".dxf");
                e.put("area", p.area());
                e.put("cutLength", p.cutLength());
                e.put("holes", p.holes().size());
                e.put("width", b.width());
                e.put("height", b.height());
                Map<String, Object> layout = new LinkedHashMap<>();
                for (LayoutValue v : piece.layout().values()) {
                    layout.put(v.key(), v.value());
                }
                for (LayoutTable t : piece.layout().tables()) {
                    Map<String, Object> table = new LinkedHashMap<>();
                    table.put("label", t.label());
                    table.put("columns", t.columns());
                    table.put("rows", t.rows());
                    layout.put(t.key(), table);
                }
                e.put("layout", layout);
                if (job.unit() == LengthUnit.INCH) {
                    // the same lengths as the shop reads them off a rule: to the nearest 1/16 in
                    Map<String, Object> fractions = new LinkedHashMap<>();
                    for (LayoutValue v : piece.layout().values()) {
                        if (v.kind() == LayoutValue.Kind.LENGTH) {
                            fractions.put(v.key(), FractionFormat.SIXTEENTHS.format(v.value()));
                        }
                    }
                    e.put("layoutFractions", fractions);
                }
                pieces.add(e);
            }
        }
        doc.put("pieces", pieces);
        List<String> warnings = new ArrayList<>();
        developments.forEach(d -> warnings.addAll(d.warnings()));
        doc.put("warnings", warnings);
        doc.put("cautions", Cautions.ALL);
        return doc;
    }
}
