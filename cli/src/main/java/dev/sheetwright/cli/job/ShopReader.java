package dev.sheetwright.cli.job;

import dev.sheetwright.core.cutpath.MachineSettings;
import dev.sheetwright.core.cutting.CutChart;
import dev.sheetwright.core.cutting.CutChartRow;
import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.quote.MassUnit;
import dev.sheetwright.core.quote.ShopSettings;
import dev.sheetwright.core.quote.Sourced;
import dev.sheetwright.core.quote.WeightPrice;
import dev.sheetwright.core.units.LengthUnit;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Reads a shop settings file ({@code --shop FILE}, YAML): the machine's own cut chart rows, rapid speeds, sheet
 * handling minutes, machine rate, material price and currency, and the table's G-code dialect ({@code machine:},
 * {@link MachineReader}). Lengths and speeds are in the file's {@code units}
 * (in: inches and in/min; mm: millimetres and mm/min). Unknown keys are refused; every error names the file and field.
 */
public final class ShopReader {

    private static final Set<String> TOP = Set.of("units", "currency", "price-per-lb", "price-per-kg",
            "machine-rate", "load-minutes", "rapid-speed", "cut-chart", "machine");
    private static final Set<String> ROW = Set.of("process", "material", "thickness", "gauge", "speed", "pierce",
            "height-sense");

    private ShopReader() {
    }

    public static ShopSettings read(Path path) {
        return fromDocument(YamlDocument.read(path, "shop file"), path.toString());
    }

    public static ShopSettings parse(String text, String file) {
        return fromDocument(YamlDocument.load(text, file), file);
    }

    /** The file's {@code machine:} section (the table's G-code dialect), or the built-in dialect without one. */
    public static MachineSettings machine(Path path) {
        Fields top = Fields.root(path.toString(), YamlDocument.read(path, "shop file"));
        return top.has("machine") ? MachineReader.read(top.map("machine"), LengthUnit.parse(top.string("units")))
                : MachineSettings.DEFAULT;
    }

    private static ShopSettings fromDocument(Object doc, String file) {
        Fields top = Fields.root(file, doc);
        top.allowOnly(TOP);
        LengthUnit unit;
        try {
            unit = LengthUnit.parse(top.string("units"));
        } catch (IllegalArgumentException e) {
            if (e instanceof JobFileException j) {
                throw j;
            }
            throw top.error("units", e.getMessage());
        }
        Optional<String> currency = Optional.empty();
        if (top.has("currency")) {
            String c = top.string("currency");
            if (!c.matches("[A-Za-z]{1,5}")) {
                throw top.error("currency", "must be a short code of letters such as USD, got '" + c + "'");
            }
            currency = Optional.of(c.toUpperCase(Locale.ROOT));
        }
        if (top.has("price-per-lb") && top.has("price-per-kg")) {
            throw top.error("price-per-kg", "give price-per-lb or price-per-kg, not both");
        }
        Optional<WeightPrice> price = Optional.empty();
        if (top.has("price-per-lb")) {
            price = Optional.of(new WeightPrice(top.notNegative("price-per-lb", 0), MassUnit.LB, Sourced.SHOP));
        } else if (top.has("price-per-kg")) {
            price = Optional.of(new WeightPrice(top.notNegative("price-per-kg", 0), MassUnit.KG, Sourced.SHOP));
        }
        OptionalDouble rate = top.has("machine-rate") ? OptionalDouble.of(top.notNegative("machine-rate", 0))
                : OptionalDouble.empty();
        OptionalDouble load = OptionalDouble.empty();
        if (top.has("load-minutes")) {
            double m = top.notNegative("load-minutes", 0);
            if (m > 120) {
                throw top.error("load-minutes", "must be at most 120 minutes per sheet, got " + m);
            }
            load = OptionalDouble.of(m);
        }
        Map<CuttingProcess, Double> rapid = new EnumMap<>(CuttingProcess.class);
        if (top.has("rapid-speed")) {
            Fields r = top.map("rapid-speed");
            r.allowOnly(Set.of("plasma", "laser"));
            for (CuttingProcess p : CuttingProcess.values()) {
                if (r.has(p.word())) {
                    rapid.put(p, unit.toMm(r.positive(p.word())));
                }
            }
        }
        List<CutChartRow> rows = new ArrayList<>();
        if (top.has("cut-chart")) {
            for (Fields row : top.listOfMaps("cut-chart")) {
                rows.add(row(row, unit));
            }
            try {
                CutChart.defaults().withOverrides(rows);
            } catch (IllegalArgumentException e) {
                throw top.error("cut-chart", e.getMessage());
            }
        }
        if (top.has("machine")) {
            MachineReader.read(top.map("machine"), unit); // refused here, with the rest of the file
        }
        return new ShopSettings(rows, rapid, load, rate, price, currency);
    }

    /** A required time in seconds, 0 to 60 (a row without it would quietly under-estimate). */
    private static double seconds(Fields f, String key) {
        double v = f.number(key);
        if (!(v >= 0 && v <= 60)) {
            throw f.error(key, "must be from 0 to 60 seconds, got " + v);
        }
        return v;
    }

    private static CutChartRow row(Fields f, LengthUnit unit) {
        f.allowOnly(ROW);
        CuttingProcess process;
        MaterialType material;
        try {
            process = CuttingProcess.parse(f.string("process"));
        } catch (JobFileException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw f.error("process", e.getMessage());
        }
        try {
            material = MaterialType.parse(f.string("material"));
        } catch (JobFileException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw f.error("material", e.getMessage());
        }
        if (f.has("thickness") == f.has("gauge")) {
            throw f.error("thickness", "give either thickness or gauge (exactly one)");
        }
        double thicknessMm;
        try {
            thicknessMm = f.has("gauge") ? Material.ofGauge(material, f.integer("gauge", 0, 1, 40)).thicknessMm()
                    : unit.toMm(f.positive("thickness"));
        } catch (JobFileException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw f.error("gauge", e.getMessage());
        }
        double speed = unit.toMm(f.positive("speed"));
        double pierce = seconds(f, "pierce");
        double sense = seconds(f, "height-sense");
        try {
            return new CutChartRow(process, material, thicknessMm, speed, pierce, sense, CutChart.SHOP);
        } catch (IllegalArgumentException e) {
            throw f.error("thickness", e.getMessage());
        }
    }
}
