package dev.sheetwright.cli.command;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.sheetwright.cli.mixin.UnitsOption;
import dev.sheetwright.cli.output.SizeFormat;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.material.UnitFactors;
import dev.sheetwright.core.units.FractionFormat;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.inventory.OutlinePoint;
import dev.sheetwright.inventory.Remnant;
import dev.sheetwright.inventory.RemnantFilter;
import dev.sheetwright.inventory.RemnantSort;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/** {@code remnant list}: shows the rack as an aligned table, or as JSON (always in mm). */
@Command(name = "list", description = "Show the offcuts on the rack (not the used ones unless --all).")
public final class RemnantListCommand extends RemnantSubcommand {
    @Mixin
    UnitsOption units;

    @Option(names = "--material", paramLabel = "MATERIAL", description = "Only this material.")
    String material;

    @Option(names = "--gauge", paramLabel = "GA", description = "Only this gauge.")
    Integer gauge;

    @Option(names = "--sort", paramLabel = "area|-area|id|date", defaultValue = "id", converter = SortConverter.class,
            description = "Order: area (smallest first), -area (largest first), id or date (default: ${DEFAULT-VALUE}).")
    RemnantSort sort;

    @Option(names = "--all", description = "Include offcuts already used.")
    boolean all;

    @Option(names = "--json", description = "Write JSON (sizes in mm) instead of a table.")
    boolean json;

    /** Reads the {@code --sort} words. */
    static final class SortConverter implements ITypeConverter<RemnantSort> {
        @Override
        public RemnantSort convert(String value) {
            return switch (value.strip()) {
                case "area" -> RemnantSort.AREA_ASC;
                case "-area" -> RemnantSort.AREA_DESC;
                case "id" -> RemnantSort.ID;
                case "date" -> RemnantSort.DATE;
                default -> throw new TypeConversionException("'" + value + "' is not a sort; expected area, -area,"
                        + " id or date");
            };
        }
    }

    @Override
    void run(PrintWriter out) throws IOException {
        RemnantFilter filter = new RemnantFilter(material == null ? null : MaterialType.parse(material),
                gauge, null, null, all);
        List<Remnant> remnants = inventory.apply(store -> store.list(filter, sort));
        if (json) {
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                    .writeValueAsString(remnants.stream().map(RemnantListCommand::toJson).toList()));
        } else {
            out.print(table(remnants, units.unit()));
        }
    }

    private static Map<String, Object> toJson(Remnant r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", r.id());
        m.put("material", r.material().word());
        m.put("gauge", r.gauge());
        m.put("thickness_mm", r.thicknessMm());
        m.put("width_mm", r.widthMm());
        m.put("height_mm", r.heightMm());
        m.put("area_mm2", r.areaMm2());
        m.put("rectangle", r.outline().isRectangle());
        List<double[]> outline = new ArrayList<>();
        for (OutlinePoint p : r.outline().vertices()) {
            outline.add(new double[] {p.x(), p.y()});
        }
        m.put("outline_mm", outline);
        m.put("location", r.location());
        m.put("added", r.added().toString());
        m.put("source", r.source().text());
        m.put("state", r.state().word());
        m.put("reserved_by", r.reservedBy());
        m.put("reserved_until", r.reservedUntil() == null ? null : r.reservedUntil().toString());
        return m;
    }

    /** The aligned table, with a total line. Package-private for tests. */
    static String table(List<Remnant> remnants, LengthUnit unit) {
        if (remnants.isEmpty()) {
            return "no remnants match\n";
        }
        String u = unit.symbol();
        String areaUnit = unit == LengthUnit.INCH ? "ft2" : "m2";
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"ID", "MATERIAL", "GAUGE", "THICK " + u, "WIDTH " + u, "HEIGHT " + u,
                "AREA " + areaUnit, "SHAPE", "STATE", "LOCATION", "ADDED", "SOURCE"});
        double total = 0;
        for (Remnant r : remnants) {
            double area = area(r.areaMm2(), unit);
            total += area;
            rows.add(new String[] {r.id(), r.material().word(), r.gauge() == null ? "-" : r.gauge().toString(),
                    r.thicknessMm() == null ? "-" : FractionFormat.decimal(unit.fromMm(r.thicknessMm()),
                            unit == LengthUnit.INCH ? 4 : 2),
                    SizeFormat.length(r.widthMm(), unit), SizeFormat.length(r.heightMm(), unit),
                    FractionFormat.decimal(area, 2), r.outline().isRectangle() ? "rect" : "poly",
                    r.state().word(), r.location().isEmpty() ? "-" : r.location(),
                    r.added().toString().substring(0, 10), r.source().text()});
        }
        boolean[] right = {false, false, true, true, true, true, true, false, false, false, false, false};
        int[] width = new int[right.length];
        for (String[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                width[i] = Math.max(width[i], row[i].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] row : rows) {
            StringBuilder line = new StringBuilder();
            for (int i = 0; i < row.length; i++) {
                String pad = " ".repeat(width[i] - row[i].length());
                line.append(right[i] ? pad + row[i] : row[i] + pad).append("  ");
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        sb.append(remnants.size()).append(" remnant(s), ").append(FractionFormat.decimal(total, 2)).append(' ')
                .append(areaUnit).append('\n');
        return sb.toString();
    }

    private static double area(double mm2, LengthUnit unit) {
        return unit == LengthUnit.INCH ? unit.areaFromMm2(mm2) / UnitFactors.IN2_PER_FT2 : mm2 / UnitFactors.MM2_PER_M2;
    }
}
