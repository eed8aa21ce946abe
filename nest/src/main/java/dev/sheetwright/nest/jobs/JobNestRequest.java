package dev.sheetwright.nest.jobs;

import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.CuttingRules;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.core.job.StockSheet;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestPrecision;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.Remnant;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;
import dev.sheetwright.nest.model.Stock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

/**
 * Builds a nest request from a job's exact patterns, cutting rules and stock. Sheets are laid with their long side
 * along x, as they lie on a cutting table.
 */
public final class JobNestRequest {


    private final NestRequest request;
    private final Map<String, Pattern> patterns;

    private JobNestRequest(NestRequest request, Map<String, Pattern> patterns) {
        this.request = request;
        this.patterns = patterns;
    }

    /**
     * @param pieces each distinct pattern (moved to the origin) with the number of copies the job needs
     * @param tolerance the job's one tolerance: arcs are flattened within its chord, and the nest's precision
     *     ({@link NestPrecision}) is its linear tolerance at the scale of the stock and the parts
     */
    public static JobNestRequest of(Map<Pattern, Integer> pieces, CuttingRules rules,
            dev.sheetwright.core.job.Stock stock, Tolerance tolerance) {
        double chord = tolerance.chord();
        List<NestPiece> nestPieces = new ArrayList<>();
        Map<String, Pattern> byKey = new LinkedHashMap<>();
        for (Map.Entry<Pattern, Integer> e : pieces.entrySet()) {
            Pattern p = e.getKey();
            nestPieces.add(NestPiece.of(p.fitting(), p.piece(), e.getValue(), PatternShapes.polygon(p, chord)));
            byKey.put(key(p.fitting(), p.piece()), p);
        }
        List<Stock> nestStock = new ArrayList<>();
        GeometryFactory gf = new GeometryFactory();
        for (StockRemnant r : stock.remnants()) {
            Coordinate[] cs = new Coordinate[r.outline().size() + 1];
            for (int i = 0; i < r.outline().size(); i++) {
                Point2 pt = r.outline().get(i);
                cs[i] = new Coordinate(pt.x(), pt.y());
            }
            cs[cs.length - 1] = cs[0].copy();
            nestStock.add(new Remnant(r.id(), gf.createPolygon(cs), r.cost()));
        }
        for (StockSheet s : stock.sheets()) {
            nestStock.add(new Sheet(s.name(), Math.max(s.width(), s.length()), Math.min(s.width(), s.length()),
                    s.count(), s.cost()));
        }
        stock.coil().ifPresent(c -> nestStock.add(new Coil(c.name(), c.width(), c.costPerLength())));
        RotationRule rotation = switch (rules.rotation()) {
            case FREE -> RotationRule.free();
            case STEP -> RotationRule.step(rules.rotationStep());
            case QUARTER -> RotationRule.quarter();
            case NONE -> RotationRule.none();
        };
        NestRules nestRules = new NestRules(rules.gap(), rules.margin(), rotation, rules.mirror(), chord);
        NestPrecision precision = NestPrecision.ofTolerance(NestPrecision.scaleOf(nestPieces, nestStock), tolerance.linear());
        return new JobNestRequest(new NestRequest(nestPieces, nestStock, nestRules, precision), byKey);
    }

    static String key(String fitting, String piece) {
        return fitting + "\u0000" + piece;
    }

    public NestRequest request() {
        return request;
    }

    /** The exact pattern a placement refers to. */
    public Pattern pattern(String fitting, String piece) {
        Pattern p = patterns.get(key(fitting, piece));
        if (p == null) {
            throw new IllegalArgumentException("no pattern for " + fitting + " " + piece);
        }
        return p;
    }
}
