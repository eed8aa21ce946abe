package dev.sheetwright.cli.job;

import dev.sheetwright.core.cutting.CuttingProcess;
import dev.sheetwright.core.fitting.AllowanceTable;
import dev.sheetwright.core.fitting.Allowances;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.EccentricReducerSpec;
import dev.sheetwright.core.fitting.ElbowSpec;
import dev.sheetwright.core.fitting.EndAllowance;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.fitting.OffsetSpec;
import dev.sheetwright.core.fitting.PipeSpec;
import dev.sheetwright.core.fitting.ReducerSpec;
import dev.sheetwright.core.fitting.SeamAllowance;
import dev.sheetwright.core.fitting.SeamPosition;
import dev.sheetwright.core.fitting.TeeSpec;
import dev.sheetwright.core.fitting.TransitionSpec;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.job.CuttingRules;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.job.RotationMode;
import dev.sheetwright.core.job.Stock;
import dev.sheetwright.core.job.StockCoil;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.job.StockSheet;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.quote.MassUnit;
import dev.sheetwright.core.quote.QuoteTerms;
import dev.sheetwright.core.quote.Sourced;
import dev.sheetwright.core.quote.WeightPrice;
import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.core.units.Lengths;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;
import org.snakeyaml.engine.v2.exceptions.YamlEngineException;

/**
 * Reads a job file (YAML, version 1) into a {@link Job}. The YAML engine builds only plain maps, lists, strings,
 * numbers and booleans (no object construction from tags). Every error names the file, the fitting and the field.
 */
public final class JobReader {

    private static final Set<String> TOP = Set.of("version", "job", "units", "material", "dimensions",
            "allowances", "fittings", "cutting", "stock", "tolerance", "quote");
    private static final Set<String> COMMON = Set.of("id", "type", "qty", "pieces", "allowances", "note");
    private static final String TYPES = "pipe, reducer, cone, elbow, offset, tee, lateral, tap, transition";

    private final String file;
    private LengthUnit unit;
    private AllowanceTable table;
    private QuoteTerms quoteTerms = QuoteTerms.NONE;

    /** A job file read whole: the job and its {@code quote:} section. */
    public record JobFile(Job job, QuoteTerms quote) {
    }

    private JobReader(String file) {
        this.file = file;
    }

    public static Job read(Path path) {
        return readFull(path).job();
    }

    /** Reads the job and its {@code quote:} section (or {@link QuoteTerms#NONE} when there is none). */
    public static JobFile readFull(Path path) {
        String text;
        try {
            text = Files.readString(path, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new JobFileException(path.toString(), null, null, "cannot read the job file: " + e.getMessage());
        }
        return parseFull(text, path.toString());
    }

    public static Job parse(String text, String fileLabel) {
        return parseFull(text, fileLabel).job();
    }

    public static JobFile parseFull(String text, String fileLabel) {
        JobReader reader = new JobReader(fileLabel);
        Job job = reader.job(text);
        return new JobFile(job, reader.quoteTerms);
    }

    private Job job(String text) {
        Object doc;
        try {
            LoadSettings settings = LoadSettings.builder().setLabel(file).setAllowDuplicateKeys(false)
                    .setMaxAliasesForCollections(10).build();
            doc = new Load(settings).loadFromString(text);
        } catch (YamlEngineException e) {
            throw new JobFileException(file, null, null, "not valid YAML: " + e.getMessage().replace('\n', ' '));
        }
        Fields top = Fields.root(file, doc);
        top.allowOnly(TOP);
        if (top.has("version") && top.integer("version", 1, 1, 1) != 1) {
            throw top.error("version", "only version 1 is supported");
        }
        String name = top.string("job");
        try {
            unit = LengthUnit.parse(top.string("units"));
        } catch (IllegalArgumentException e) {
            throw top.error("units", e.getMessage());
        }
        table = AllowanceTable.in(unit);
        Material material = material(top.map("material"));
        DimensionFace face = DimensionFace.DEFAULT;
        if (top.has("dimensions")) {
            try {
                face = DimensionFace.parse(top.string("dimensions"));
            } catch (IllegalArgumentException e) {
                throw top.error("dimensions", e.getMessage());
            }
        }
        Allowances defaults = new Allowances(table.defaultSeam(), EndAllowance.NONE, EndAllowance.NONE, true);
        if (top.has("allowances")) {
            defaults = allowances(top.map("allowances"), defaults, "large", "small", false);
        }
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
        List<FittingSpec> fittings = new ArrayList<>();
        Set<String> ids = new java.util.HashSet<>();
        for (Fields f : top.listOfMaps("fittings")) {
            FittingSpec spec = fitting(f, defaults);
            if (!ids.add(spec.id())) {
                throw new JobFileException(file, spec.id(), "id", "is used by two fittings; ids must be unique");
            }
            fittings.add(spec);
        }
        if (fittings.isEmpty()) {
            throw top.error("fittings", "lists no fittings");
        }
        CuttingRules cutting = cutting(top.has("cutting") ? top.map("cutting") : null);
        Stock stock = stock(top.has("stock") ? top.map("stock") : null);
        if (top.has("quote")) {
            quoteTerms = quote(top.map("quote"));
        }
        return new Job(name, unit, material, face, fittings, cutting, stock, tolerance);
    }

    /** The {@code quote:} section: currency, one price per weight, machine rate per hour, lead-in length. */
    private QuoteTerms quote(Fields q) {
        q.allowOnly(Set.of("currency", "price-per-lb", "price-per-kg", "machine-rate", "lead-in"));
        Optional<String> currency = Optional.empty();
        if (q.has("currency")) {
            String c = q.string("currency");
            if (!c.matches("[A-Za-z]{1,5}")) {
                throw q.error("currency", "must be a short code of letters such as USD, got '" + c + "'");
            }
            currency = Optional.of(c.toUpperCase(Locale.ROOT));
        }
        if (q.has("price-per-lb") && q.has("price-per-kg")) {
            throw q.error("price-per-kg", "give price-per-lb or price-per-kg, not both");
        }
        Optional<WeightPrice> price = Optional.empty();
        if (q.has("price-per-lb")) {
            price = Optional.of(new WeightPrice(q.notNegative("price-per-lb", 0), MassUnit.LB, Sourced.JOB));
        } else if (q.has("price-per-kg")) {
            price = Optional.of(new WeightPrice(q.notNegative("price-per-kg", 0), MassUnit.KG, Sourced.JOB));
        }
        OptionalDouble rate = q.has("machine-rate") ? OptionalDouble.of(q.notNegative("machine-rate", 0))
                : OptionalDouble.empty();
        double leadIn = q.notNegative("lead-in", 0);
        // a sanity bound only: lead-ins are about 1-6 mm (common practice, trade-reference §9.4)
        if (leadIn > unit.fromMm(25)) {
            throw q.error("lead-in", "must be at most " + unit.fromMm(25) + " " + unit.symbol() + " (25 mm), got "
                    + leadIn);
        }
        return new QuoteTerms(currency, price, rate, leadIn);
    }

    private Material material(Fields m) {
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

    /**
     * Reads an {@code allowances:} mapping over {@code base}. {@code ends} is one value for both ends or a
     * mapping with the two end names given.
     */
    private boolean miterAllowed;

    private Allowances allowances(Fields a, Allowances base, String endA, String endB, boolean inFitting) {
        a.allowOnly(inFitting && miterAllowed ? Set.of("seam", "ends", "notch", "miter")
                : Set.of("seam", "ends", "notch"));
        SeamAllowance seam = base.seam();
        if (a.has("seam")) {
            try {
                seam = table.parseSeam(a.string("seam"));
            } catch (IllegalArgumentException e) {
                throw a.error("seam", e.getMessage());
            }
        }
        EndAllowance ea = base.endA();
        EndAllowance eb = base.endB();
        if (a.has("ends")) {
            if (a.raw("ends") instanceof java.util.Map<?, ?>) {
                Fields ends = a.map("ends");
                ends.allowOnly(Set.of(endA, endB));
                ea = ends.has(endA) ? end(ends, endA) : ea;
                eb = ends.has(endB) ? end(ends, endB) : eb;
            } else {
                ea = end(a, "ends");
                eb = ea;
            }
        }
        return new Allowances(seam, ea, eb, a.bool("notch", base.notch()));
    }

    private EndAllowance end(Fields f, String key) {
        try {
            return table.parseEnd(f.string(key));
        } catch (IllegalArgumentException e) {
            if (e instanceof JobFileException j) {
                throw j;
            }
            throw f.error(key, e.getMessage());
        }
    }

    private FittingSpec fitting(Fields f, Allowances defaults) {
        String id = f.string("id");
        Fields ff = f.forFitting(id);
        String type = ff.string("type").toLowerCase(Locale.ROOT);
        int qty = ff.integer("qty", 1, 1, 100000);
        int pieces = ff.integer("pieces", 1, 1, 16);
        try {
            switch (type) {
                case "pipe": {
                    ff.allowOnly(union(COMMON, Set.of("diameter", "length")));
                    return new PipeSpec(id, qty, ff.positive("diameter"), ff.positive("length"), pieces,
                            fittingAllowances(ff, defaults, "first", "second"));
                }
                case "reducer": {
                    ff.allowOnly(union(COMMON, Set.of("large", "small", "height", "offset", "flat")));
                    Allowances a = fittingAllowances(ff, defaults, "large", "small");
                    if (ff.has("offset") || ff.bool("flat", false)) {
                        double[] off = offset(ff);
                        return new EccentricReducerSpec(id, qty, ff.positive("large"), ff.number("small"),
                                ff.positive("height"), off[0], off[1], ff.bool("flat", false), pieces, a);
                    }
                    if (ff.number("small") == 0) {
                        return new EccentricReducerSpec(id, qty, ff.positive("large"), 0, ff.positive("height"),
                                0, 0, false, pieces, a);
                    }
                    return new ReducerSpec(id, qty, ff.positive("large"), ff.positive("small"),
                            ff.positive("height"), pieces, a);
                }
                case "cone": {
                    ff.allowOnly(union(COMMON, Set.of("diameter", "height", "offset")));
                    double[] off = offset(ff);
                    return new EccentricReducerSpec(id, qty, ff.positive("diameter"), 0, ff.positive("height"),
                            off[0], off[1], false, pieces, fittingAllowances(ff, defaults, "large", "small"));
                }
                case "elbow": {
                    ff.allowOnly(union(COMMON, Set.of("diameter", "angle", "gores", "radius", "seam-at")));
                    noPieces(ff, pieces);
                    miterAllowed = true;
                    Allowances a = fittingAllowances(ff, defaults, "first", "second");
                    SeamAllowance miter = miterSeam(ff);
                    miterAllowed = false;
                    return new ElbowSpec(id, qty, ff.positive("diameter"), ff.positive("angle"),
                            ff.integer("gores", 0, 2, ElbowSpec.MAX_GORES), ff.notNegative("radius", 0),
                            seamAt(ff), a, miter);
                }
                case "offset": {
                    ff.allowOnly(union(COMMON, Set.of("diameter", "offset", "angle", "length", "radius", "gores",
                            "seam-at")));
                    noPieces(ff, pieces);
                    if (ff.has("angle") == ff.has("length")) {
                        throw ff.error("angle", "give either angle (of each elbow) or length (the advance)");
                    }
                    miterAllowed = true;
                    Allowances a = fittingAllowances(ff, defaults, "first", "second");
                    SeamAllowance miter = miterSeam(ff);
                    miterAllowed = false;
                    return new OffsetSpec(id, qty, ff.positive("diameter"), ff.positive("offset"),
                            ff.notNegative("angle", 0), ff.notNegative("length", 0), ff.notNegative("radius", 0),
                            ff.integer("gores", 0, 2, ElbowSpec.MAX_GORES), seamAt(ff), a, miter);
                }
                case "tee", "lateral", "tap": {
                    ff.allowOnly(union(COMMON, Set.of("main", "branch", "angle", "offset", "length", "main-length",
                            "with-main", "main-allowances")));
                    noPieces(ff, pieces);
                    boolean withMain = !type.equals("tap") && ff.bool("with-main", true);
                    if (type.equals("lateral") && !ff.has("angle")) {
                        throw ff.error("angle", "a lateral needs its angle (less than 90 degrees)");
                    }
                    Allowances a = fittingAllowances(ff, defaults, "end", "joint");
                    boolean jointGiven = ff.has("allowances") && ff.map("allowances").has("ends");
                    if (!withMain && !jointGiven) {
                        a = a.withEnds(a.endA(), table.defaultTapFlange());
                    }
                    Allowances mainAllowances = null;
                    if (withMain) {
                        mainAllowances = ff.has("main-allowances")
                                ? allowances(ff.map("main-allowances"), defaults, "first", "second", true) : defaults;
                    } else if (ff.has("main-allowances") || ff.has("main-length")) {
                        throw ff.error(ff.has("main-length") ? "main-length" : "main-allowances",
                                "a tap has no main piece; remove this field or set with-main: true");
                    }
                    double mainLength = withMain ? ff.positive("main-length") : 0;
                    return new TeeSpec(id, qty, ff.positive("main"), ff.positive("branch"), ff.number("angle", 90),
                            ff.number("offset", 0), ff.positive("length"), mainLength, withMain, a, mainAllowances);
                }
                case "transition": {
                    ff.allowOnly(union(COMMON, Set.of("width", "depth", "diameter", "height", "offset")));
                    double[] off = offset(ff);
                    return new TransitionSpec(id, qty, ff.positive("width"), ff.positive("depth"),
                            ff.positive("diameter"), ff.positive("height"), off[0], off[1], pieces,
                            fittingAllowances(ff, defaults, "rect", "round"));
                }
                default:
                    throw ff.error("type", "unknown fitting type '" + type + "'; known types: " + TYPES);
            }
        } catch (FittingException e) {
            throw new JobFileException(file, e.fitting(), jobFieldName(e.field()), stripPrefix(e));
        }
    }

    private Allowances fittingAllowances(Fields ff, Allowances defaults, String endA, String endB) {
        return ff.has("allowances") ? allowances(ff.map("allowances"), defaults, endA, endB, true) : defaults;
    }

    private SeamAllowance miterSeam(Fields ff) {
        if (ff.has("allowances") && ff.map("allowances").has("miter")) {
            Fields a = ff.map("allowances");
            try {
                return table.parseSeam(a.string("miter"));
            } catch (IllegalArgumentException e) {
                if (e instanceof JobFileException j) {
                    throw j;
                }
                throw a.error("miter", e.getMessage());
            }
        }
        return table.defaultMiterSeam();
    }

    private static void noPieces(Fields ff, int pieces) {
        if (pieces != 1) {
            throw ff.error("pieces", "an elbow is already made of gores; pieces does not apply");
        }
    }

    private static SeamPosition seamAt(Fields ff) {
        if (!ff.has("seam-at")) {
            return SeamPosition.SIDE;
        }
        try {
            return SeamPosition.parse(ff.string("seam-at"));
        } catch (IllegalArgumentException e) {
            throw ff.error("seam-at", e.getMessage());
        }
    }

    /** {@code offset: 2} (along x) or {@code offset: {x: 2, y: 1}}; absent = no offset. */
    private static double[] offset(Fields ff) {
        if (!ff.has("offset")) {
            return new double[] {0, 0};
        }
        if (ff.raw("offset") instanceof java.util.Map<?, ?>) {
            Fields o = ff.map("offset");
            o.allowOnly(Set.of("x", "y"));
            return new double[] {o.number("x", 0), o.number("y", 0)};
        }
        return new double[] {ff.number("offset"), 0};
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

    private CuttingRules cutting(Fields c) {
        // Defaults (common practice, trade-reference §9.1, §9.4): plasma, kerf 0.06 in / 1.5 mm (from memory),
        // gap max(2 x kerf, 1/4 in), margin 3/8 in / 10 mm, any rotation, no mirror images.
        double kerfDefault = unit.convert(0.06, LengthUnit.INCH);
        CuttingProcess process = CuttingProcess.PLASMA;
        if (c == null) {
            double gap = Math.max(2 * kerfDefault, unit.convert(0.25, LengthUnit.INCH));
            return new CuttingRules(process, kerfDefault, gap, unit.convert(0.375, LengthUnit.INCH),
                    RotationMode.FREE, 0, false);
        }
        c.allowOnly(Set.of("process", "kerf", "gap", "margin", "rotation", "mirror"));
        if (c.has("process")) {
            try {
                process = CuttingProcess.parse(c.string("process"));
            } catch (IllegalArgumentException e) {
                throw c.error("process", e.getMessage());
            }
        }
        double kerf = c.notNegative("kerf", process == CuttingProcess.LASER
                ? unit.convert(0.2, LengthUnit.MILLIMETRE) : kerfDefault);
        double gapDefault = process == CuttingProcess.LASER
                ? Math.max(kerf + unit.convert(1, LengthUnit.MILLIMETRE), unit.convert(2, LengthUnit.MILLIMETRE))
                : Math.max(2 * kerf, unit.convert(0.25, LengthUnit.INCH));
        double gap = c.notNegative("gap", gapDefault);
        if (gap <= kerf) {
            throw c.error("gap", "must exceed the kerf (" + kerf + "), got " + gap);
        }
        double margin = c.notNegative("margin", process == CuttingProcess.LASER
                ? unit.convert(5, LengthUnit.MILLIMETRE) : unit.convert(0.375, LengthUnit.INCH));
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

    private Stock stock(Fields s) {
        if (s == null) {
            // 48 x 120 in or 1250 x 2500 mm sheets, as many as needed (common practice, trade-reference §8.3)
            StockSheet sheet = unit == LengthUnit.INCH
                    ? new StockSheet("48x120", 48, 120, OptionalInt.empty(), 0)
                    : new StockSheet("1250x2500", 1250, 2500, OptionalInt.empty(), 0);
            return new Stock(List.of(sheet), List.of(), Optional.empty());
        }
        s.allowOnly(Set.of("sheets", "remnants", "coil"));
        List<StockSheet> sheets = new ArrayList<>();
        if (s.has("sheets")) {
            for (Fields sh : s.listOfMaps("sheets")) {
                sh.allowOnly(Set.of("size", "count", "cost"));
                double[] wl = size(sh, "size");
                OptionalInt count = sh.has("count") ? OptionalInt.of(sh.integer("count", 0, 0, 100000))
                        : OptionalInt.empty();
                sheets.add(new StockSheet(sh.string("size"), wl[0], wl[1], count, sh.notNegative("cost", 0)));
            }
        }
        List<StockRemnant> remnants = new ArrayList<>();
        if (s.has("remnants")) {
            for (Fields r : s.listOfMaps("remnants")) {
                r.allowOnly(Set.of("id", "size", "polygon", "cost"));
                String id = r.string("id");
                double cost = r.notNegative("cost", 0);
                if (r.has("size") == r.has("polygon")) {
                    throw r.error("size", "give either size (W x L) or polygon (a list of [x, y] corners)");
                }
                if (r.has("size")) {
                    double[] wl = size(r, "size");
                    remnants.add(StockRemnant.rectangle(id, wl[0], wl[1], cost));
                } else {
                    remnants.add(new StockRemnant(id, polygon(r, "polygon"), cost));
                }
            }
        }
        Optional<StockCoil> coil = Optional.empty();
        if (s.has("coil")) {
            Fields c = s.map("coil");
            c.allowOnly(Set.of("width", "cost"));
            double w = c.positive("width");
            coil = Optional.of(new StockCoil("coil " + w, w, c.notNegative("cost", 0)));
        }
        if (sheets.isEmpty() && remnants.isEmpty() && coil.isEmpty()) {
            throw s.error("sheets", "stock lists no sheets, remnants or coil");
        }
        return new Stock(sheets, remnants, coil);
    }

    private static double[] size(Fields f, String key) {
        double[] wl;
        try {
            wl = Lengths.parseSize(f.string(key));
        } catch (IllegalArgumentException e) {
            throw f.error(key, e.getMessage());
        }
        if (!(wl[0] > 0 && wl[1] > 0)) {
            throw f.error(key, "both sides must be positive, got '" + f.string(key) + "'");
        }
        return wl;
    }

    private static List<Point2> polygon(Fields f, String key) {
        Object o = f.raw(key);
        if (!(o instanceof List<?> list) || list.size() < 3) {
            throw f.error(key, "must be a list of at least 3 [x, y] corners");
        }
        List<Point2> pts = new ArrayList<>();
        for (Object p : list) {
            if (!(p instanceof List<?> xy) || xy.size() != 2 || !(xy.get(0) instanceof Number)
                    || !(xy.get(1) instanceof Number)) {
                throw f.error(key, "each corner must be [x, y] with two numbers, got " + p);
            }
            pts.add(new Point2(((Number) xy.get(0)).doubleValue(), ((Number) xy.get(1)).doubleValue()));
        }
        return pts;
    }

    private static Set<String> union(Set<String> a, Set<String> b) {
        Set<String> u = new java.util.HashSet<>(a);
        u.addAll(b);
        return u;
    }
}
