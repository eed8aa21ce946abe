package dev.sheetwright.cli.job;

import dev.sheetwright.core.cutpath.CutPathSettings;
import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.job.CuttingRules;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.job.ShopDefaults;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.job.Stock;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.job.StockSheet;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.quote.QuoteTerms;
import dev.sheetwright.core.units.LengthUnit;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Reads a job file (YAML, version 1) into a {@link Job}. The YAML engine builds only plain maps, lists, strings,
 * numbers and booleans (no object construction from tags). Every error names the file, the fitting and the field.
 * The top of the file is read here; each fitting family has its own {@link FittingReader}, chosen by {@code type},
 * and the {@code cutting:}, {@code stock:} and {@code quote:} sections have theirs ({@link CuttingReader},
 * {@link StockReader}, {@link QuoteSectionReader}).
 */
public final class JobReader {

    private static final Set<String> TOP = Set.of("version", "job", "units", "material", "dimensions",
            "allowances", "fittings", "cutting", "stock", "tolerance", "quote");

    /** One reader per fitting family; a new family adds its reader here. */
    private static final List<FittingReader> FAMILIES = List.of(new PipeReader(), new ReducerReader(),
            new ElbowReader(), new BranchReader(), new TransitionReader(), new RectReader());
    private static final Map<String, FittingReader> BY_TYPE = byType(FAMILIES);

    /** A job file read whole: the job, how its contours are cut (from {@code cutting:}) and its {@code quote:} section. */
    public record JobFile(Job job, CutPathSettings cutPath, QuoteTerms quote) {
    }

    private JobReader() {
    }

    public static Job read(Path path) {
        return readFull(path).job();
    }

    /** Reads the job and its {@code quote:} section (or {@link QuoteTerms#NONE} when there is none). */
    public static JobFile readFull(Path path) {
        return fromDocument(YamlDocument.read(path, "job file"), path.toString());
    }

    public static Job parse(String text, String fileLabel) {
        return parseFull(text, fileLabel).job();
    }

    public static JobFile parseFull(String text, String file) {
        return fromDocument(YamlDocument.load(text, file), file);
    }

    private static JobFile fromDocument(Object doc, String file) {
        Fields top = Fields.root(file, doc);
        top.allowOnly(TOP);
        if (top.has("version") && top.integer("version", 1, 1, 1) != 1) {
            throw top.error("version", "only version 1 is supported");
        }
        String name = top.string("job");
        LengthUnit unit;
        try {
            unit = LengthUnit.parse(top.string("units"));
        } catch (IllegalArgumentException e) {
            throw top.error("units", e.getMessage());
        }
        AllowanceTable table = AllowanceTable.in(unit);
        Material material = material(top.map("material"), unit);
        DimensionFace face = DimensionFace.DEFAULT;
        if (top.has("dimensions")) {
            try {
                face = DimensionFace.parse(top.string("dimensions"));
            } catch (IllegalArgumentException e) {
                throw top.error("dimensions", e.getMessage());
            }
        }
        Allowances allowances = new Allowances(table.defaultSeam(), EndAllowance.NONE, EndAllowance.NONE, true);
        SeamAllowance miter = table.defaultMiterSeam();
        if (top.has("allowances")) {
            Fields a = top.map("allowances");
            allowances = AllowanceReader.read(a, allowances, table, "large", "small", true);
            if (a.has("miter")) {
                miter = AllowanceReader.seam(a, "miter", table); // the job's default for elbows and offsets
            }
        }
        FittingDefaults defaults = new FittingDefaults(unit, table, allowances, miter);
        Tolerance tolerance = unit == LengthUnit.INCH ? Tolerance.INCH : Tolerance.MM;
        if (top.has("tolerance")) {
            Fields t = top.map("tolerance");
            t.allowOnly(Set.of("chord"));
            double chord = t.positive("chord");
            if (chord < tolerance.linear() || chord > unit.fromMm(2)) {
                throw t.error("chord", "must be between " + tolerance.linear() + " and " + unit.fromMm(2) + " "
                        + unit.symbol());
            }
            tolerance = tolerance.withChord(chord);
        }
        Fields sized = top.withLargest(ShopDefaults.largestLength(unit), ShopDefaults.largestLength(unit) + " "
                + unit.symbol() + " (a sanity bound)");
        List<FittingSpec> fittings = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (Fields f : sized.listOfMaps("fittings")) {
            FittingSpec spec = fitting(f, defaults);
            if (!ids.add(spec.id())) {
                throw new JobFileException(file, spec.id(), "id", "is used by two fittings; ids must be unique");
            }
            fittings.add(spec);
        }
        if (fittings.isEmpty()) {
            throw top.error("fittings", "lists no fittings");
        }
        CuttingRules cutting = CuttingReader.read(top.has("cutting") ? sized.map("cutting") : null, unit);
        Stock stock = StockReader.read(top.has("stock") ? top.map("stock") : null, unit);
        refuseMarginWithoutRoom(cutting, stock, file, unit, top.has("cutting") && top.map("cutting").has("margin"));
        QuoteTerms quote = top.has("quote") ? QuoteSectionReader.read(top.map("quote"), unit) : QuoteTerms.NONE;
        CutPathSettings cutPath = CuttingReader.cutPath(top.has("cutting") ? sized.map("cutting") : null, cutting, unit);
        return new JobFile(new Job(name, unit, material, face, fittings, cutting, stock, tolerance), cutPath, quote);
    }

    /**
     * A sheet-edge margin of half the stock's shorter side or more leaves no room for any part: that is bad input,
     * not an unplaced piece. Checked for every sheet size, remnant (its outline's box) and the coil width.
     */
    private static void refuseMarginWithoutRoom(CuttingRules cutting, Stock stock, String file, LengthUnit unit,
            boolean given) {
        double margin = cutting.margin();
        List<String[]> sides = new ArrayList<>(); // {name, shorter side}
        for (StockSheet sh : stock.sheets()) {
            sides.add(new String[] {"sheet " + sh.name(), String.valueOf(Math.min(sh.width(), sh.length()))});
        }
        for (StockRemnant r : stock.remnants()) {
            double minX = Double.POSITIVE_INFINITY;
            double maxX = Double.NEGATIVE_INFINITY;
            double minY = Double.POSITIVE_INFINITY;
            double maxY = Double.NEGATIVE_INFINITY;
            for (Point2 p : r.outline()) {
                minX = Math.min(minX, p.x());
                maxX = Math.max(maxX, p.x());
                minY = Math.min(minY, p.y());
                maxY = Math.max(maxY, p.y());
            }
            sides.add(new String[] {"remnant " + r.id(), String.valueOf(Math.min(maxX - minX, maxY - minY))});
        }
        stock.coil().ifPresent(c -> sides.add(new String[] {"the coil", String.valueOf(c.width())}));
        for (String[] side : sides) {
            double shorter = Double.parseDouble(side[1]);
            if (2 * margin >= shorter) {
                throw new JobFileException(file, null, "cutting.margin", (given ? "" : "the default ")
                        + "margin " + margin + " " + unit.symbol() + " leaves no room on " + side[0]
                        + " (shorter side " + shorter + " " + unit.symbol() + "); the margin must be less than half"
                        + " of it, " + shorter / 2 + " " + unit.symbol());
            }
        }
    }

    private static Material material(Fields m, LengthUnit unit) {
        m.allowOnly(Set.of("type", "gauge", "thickness"));
        MaterialType type;
        try {
            type = MaterialType.parse(m.string("type"));
        } catch (IllegalArgumentException e) {
            throw m.error("type", e.getMessage());
        }
        if (m.has("gauge") == m.has("thickness")) {
            throw m.error("gauge", "give either gauge or thickness (exactly one)");
        }
        try {
            if (m.has("gauge")) {
                return Material.ofGauge(type, m.integer("gauge", 0, 1, 40));
            }
            double t = m.positive("thickness");
            return Material.ofThickness(type, LengthUnit.INCH.convert(t, unit));
        } catch (IllegalArgumentException e) {
            if (e instanceof JobFileException j) {
                throw j;
            }
            throw m.error(m.has("gauge") ? "gauge" : "thickness", e.getMessage());
        }
    }

    private static FittingSpec fitting(Fields f, FittingDefaults defaults) {
        String id = f.string("id");
        Fields ff = f.forFitting(id);
        String type = ff.string("type").toLowerCase(Locale.ROOT);
        FittingReader.Common common = new FittingReader.Common(id, ff.integer("qty", 1, 1, 100000),
                ff.integer("pieces", 1, 1, 16));
        FittingReader reader = BY_TYPE.get(type);
        if (reader == null) {
            throw ff.error("type", "unknown fitting type '" + type + "'; known types: " + String.join(", ",
                    BY_TYPE.keySet()));
        }
        try {
            return reader.read(type, ff, common, defaults);
        } catch (FittingException e) {
            throw new JobFileException(f.file(), e.fitting(), jobFieldName(e.field()), stripPrefix(e));
        }
    }

    /** The job-file spelling of a spec field named in an engine message ({@code mainLength -> main-length}). */
    public static String jobFieldName(String field) {
        return switch (field) {
            case "miterSeam" -> "allowances.miter";
            case "offsetX", "offsetY" -> "offset";
            default -> field.replaceAll("([a-z])([A-Z])", "$1-$2").toLowerCase(Locale.ROOT);
        };
    }

    private static String stripPrefix(FittingException e) {
        String m = e.getMessage();
        String p = "fitting '" + e.fitting() + "', field '" + e.field() + "': ";
        return m.startsWith(p) ? m.substring(p.length()) : m;
    }

    private static Map<String, FittingReader> byType(List<FittingReader> readers) {
        Map<String, FittingReader> m = new LinkedHashMap<>();
        for (FittingReader r : readers) {
            for (String t : r.types().stream().sorted().toList()) {
                if (m.put(t, r) != null) {
                    throw new IllegalStateException("two fitting readers for type " + t);
                }
            }
        }
        return m;
    }
}
