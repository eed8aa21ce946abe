package dev.sheetwright.nest.bench;

import java.util.List;

import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.place.Nester;

/** Minimises the strip length of a strip instance with the nesting engine (gap 0, margin 0, its rotations). */
public final class StripPacker {
    private StripPacker() {
    }

    /** Result: the placements, the strip length, density = item area / (height x length), and the nest itself. */
    public record StripResult(StripInstance instance, List<Placement> placements, double length, double density,
                              NestResult nest, double seconds) {
    }

    public static StripResult pack(StripInstance instance, NestOptions options) {
        long t0 = System.nanoTime();
        NestResult r = Nester.nest(instance.toRequest(), options);
        double seconds = (System.nanoTime() - t0) / 1e9;
        if (!r.unplaced().isEmpty() || r.sheets().size() != 1) {
            throw new IllegalStateException("strip packing left " + r.unplaced().size() + " pieces unplaced on "
                    + r.sheets().size() + " strips: " + r.unplaced());
        }
        double length = r.sheets().get(0).usedLength();
        double density = instance.itemArea() / (instance.stripHeight() * length);
        return new StripResult(instance, r.sheets().get(0).parts(), length, density, r, seconds);
    }
}
