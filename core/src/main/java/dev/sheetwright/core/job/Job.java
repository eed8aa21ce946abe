package dev.sheetwright.core.job;

import dev.sheetwright.core.develop.DevelopContext;
import dev.sheetwright.core.develop.StockRoom;
import dev.sheetwright.core.geom.Point2;
import java.util.ArrayList;
import dev.sheetwright.core.fitting.DimensionFace;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.geom.Tolerance;
import dev.sheetwright.core.material.Material;
import dev.sheetwright.core.units.LengthUnit;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A whole job file: name, unit, material, which face ticket sizes are on, the fittings, how to cut and what
 * stock to cut from. All lengths are in {@code unit}.
 */
public record Job(String name, LengthUnit unit, Material material, DimensionFace dimensions,
        List<FittingSpec> fittings, CuttingRules cutting, Stock stock, Tolerance tolerance) {

    public Job {
        fittings = List.copyOf(fittings);
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("job name must not be blank");
        }
        if (fittings.isEmpty()) {
            throw new IllegalArgumentException("a job needs at least one fitting");
        }
        Set<String> ids = new HashSet<>();
        for (FittingSpec f : fittings) {
            if (!ids.add(f.id())) {
                throw new IllegalArgumentException("fitting id '" + f.id() + "' is used twice");
            }
        }
    }

    /** Metal thickness in the job's unit. */
    public double thickness() {
        return unit.fromMm(material.thicknessMm());
    }

    public DevelopContext developContext() {
        return new DevelopContext(unit, thickness(), dimensions, tolerance, stockRoom());
    }

    /**
     * Each listed stock less the cutting margin on both sides, laid as the nesting lays it (a sheet's long side
     * along x, a remnant as listed, a coil running along x); quarter turns unless rotation forbids them.
     */
    public StockRoom stockRoom() {
        double m2 = 2 * cutting.margin();
        List<StockRoom.Space> spaces = new ArrayList<>();
        for (StockSheet s : stock.sheets()) {
            spaces.add(new StockRoom.Space("sheet " + s.name(), Math.max(s.width(), s.length()) - m2,
                    Math.min(s.width(), s.length()) - m2));
        }
        for (StockRemnant r : stock.remnants()) {
            double w = r.outline().stream().mapToDouble(Point2::x).max().orElse(0)
                    - r.outline().stream().mapToDouble(Point2::x).min().orElse(0);
            double l = r.outline().stream().mapToDouble(Point2::y).max().orElse(0)
                    - r.outline().stream().mapToDouble(Point2::y).min().orElse(0);
            spaces.add(new StockRoom.Space("remnant " + r.id(), w - m2, l - m2));
        }
        stock.coil().ifPresent(c -> spaces.add(new StockRoom.Space("coil " + c.name(), Double.POSITIVE_INFINITY,
                c.width() - m2)));
        boolean turn = switch (cutting.rotation()) {
            case FREE, QUARTER -> true;
            case STEP -> 90 % cutting.rotationStep() == 0;
            case NONE -> false;
        };
        return new StockRoom(spaces, turn);
    }
}
