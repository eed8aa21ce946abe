package dev.sheetwright.nest.bench;

import java.util.List;

import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.overlap.StripSearch;
import dev.sheetwright.nest.place.Nester;

/**
 * Minimises the strip length of a strip instance (gap 0, margin 0, its rotations) with the no-fit-polygon engine;
 * {@link #packWithOverlapSearch} adds the overlap-minimising search after the first layout (the default of
 * {@code bench strip}, measured better at 60 s).
 */
public final class StripPacker {
    private StripPacker() {
    }

    /** Result: the placements, the strip length, density = item area / (height x length), and the nest itself. */
    public record StripResult(StripInstance instance, List<Placement> placements, double length, double density,
                              NestResult nest, double seconds) {
    }

    /** Share of a timed run the first layout gets. */
    static final double FIRST_LAYOUT_SHARE = 0.15;

    public static StripResult pack(StripInstance instance, NestOptions options) {
        long t0 = System.nanoTime();
        return result(instance, Nester.nest(instance.toRequest(), options), t0);
    }

    /**
     * The no-fit-polygon engine makes the first layout in a share of the time ({@link #FIRST_LAYOUT_SHARE}; with an
     * iteration count, its constructive pass only), then the overlap-minimising search shortens it for the rest.
     */
    public static StripResult packWithOverlapSearch(StripInstance instance, NestOptions options) {
        long t0 = System.nanoTime();
        long deadline = t0 + Math.min(options.timeLimit().toNanos(), Long.MAX_VALUE / 4);
        NestRequest request = instance.toRequest();
        NestOptions first = options.iterations().isPresent() ? NestOptions.steps(0, options.seed(), 1)
                : options.share(FIRST_LAYOUT_SHARE);
        return result(instance, StripSearch.shorten(request, Nester.nest(request, first), options, deadline), t0);
    }

    private static StripResult result(StripInstance instance, NestResult r, long t0) {
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
