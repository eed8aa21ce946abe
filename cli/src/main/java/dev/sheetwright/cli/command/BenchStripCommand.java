package dev.sheetwright.cli.command;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.cli.mixin.SearchOptions;
import dev.sheetwright.cli.output.PatternDrawings;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.DxfWriter;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.Vertex;
import dev.sheetwright.nest.bench.StripInstance;
import dev.sheetwright.nest.bench.StripPacker;
import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.ProgressListener;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/**
 * Packs one strip instance and prints one JSON line: instance, pieces, length, density, seconds, and violations (what
 * the independent checker found; 0 for a valid layout).
 */
@Command(name = "strip", mixinStandardHelpOptions = true,
        description = "Pack a strip-packing instance (fixed height, shortest length) and print one JSON line.")
public final class BenchStripCommand implements Callable<Integer> {
    /** Search seconds without {@code --time}. */
    static final double DEFAULT_SECONDS = 10;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.json", description = "Instance file (name, stripHeight, allowedRotationsDeg, items).")
    Path file;

    @CommandLine.Mixin
    SearchOptions search;

    @Option(names = "--dxf", paramLabel = "OUT.dxf", description = "Also write the layout as DXF (CUT: parts, SHEET: strip).")
    Path dxf;

    @Option(names = "--overlap-search", negatable = true, defaultValue = "true", fallbackValue = "true",
            description = "Shorten the first layout with the overlap-minimising search (default; --no-overlap-search"
                    + " keeps the bottom-left order search alone).")
    boolean overlapSearch;

    @Override
    public Integer call() throws JsonProcessingException {
        NestOptions options = search.nestOptions(DEFAULT_SECONDS, ProgressListener.NONE);
        StripInstance instance = StripInstance.read(file);
        StripPacker.StripResult r = overlapSearch ? StripPacker.packWithOverlapSearch(instance, options)
                : StripPacker.pack(instance, options);
        int violations = NestChecker.check(instance.toRequest(), r.nest()).size();
        Map<String, Object> line = new LinkedHashMap<>();
        line.put("instance", instance.name());
        line.put("pieces", instance.pieceCount());
        line.put("length", round(r.length(), 6));
        line.put("density", round(r.density(), 6));
        line.put("seconds", round(r.seconds(), 3));
        line.put("violations", violations);
        spec.commandLine().getOut().println(new ObjectMapper().writeValueAsString(line));
        spec.commandLine().getOut().flush();
        if (dxf != null) {
            try {
                writeDxf(r, dxf);
            } catch (IllegalArgumentException e) {
                // the writer refused an outline the engine placed: an internal failure, not bad input
                throw new IllegalStateException("the DXF writer refused a placed outline (a bug): " + e.getMessage(), e);
            }
        }
        return violations == 0 ? 0 : 1;
    }

    /**
     * Writes the layout as DXF so anyone can verify it independently: each placed item a closed contour on layer
     * CUT, the strip outline (0..length x 0..height) on layer SHEET. Benchmark data have no unit; the file says mm.
     */
    void writeDxf(StripPacker.StripResult result, Path out) {
        DxfWriter.write(drawing(result), out);
    }

    /**
     * The layout as a drawing: the outlines the engine placed (the request's pieces, cleaned by its precision, not
     * the raw instance rings), moved by their placements.
     */
    static Drawing drawing(StripPacker.StripResult result) {
        StripInstance instance = result.instance();
        Map<String, org.locationtech.jts.geom.Polygon> shapes = new LinkedHashMap<>();
        for (dev.sheetwright.nest.model.NestPiece piece : instance.toRequest().pieces()) {
            shapes.put(piece.piece(), piece.shape());
        }
        List<Shape> drawn = new ArrayList<>();
        double h = instance.stripHeight();
        double l = result.length();
        drawn.add(new Polyline(PatternDrawings.SHEET, List.of(Vertex.of(0, 0), Vertex.of(l, 0), Vertex.of(l, h),
                Vertex.of(0, h)), true));
        for (Placement p : result.placements()) {
            drawn.add(placedOutline(p, shapes.get(p.piece())));
        }
        return Drawing.of("mm", PatternDrawings.LAYERS, drawn);
    }

    /** The outer ring of {@code shape} moved by {@code p}, as a closed polyline on layer CUT. */
    static Polyline placedOutline(Placement p, org.locationtech.jts.geom.Polygon shape) {
        org.locationtech.jts.geom.Coordinate[] cs = p.apply(shape).getExteriorRing().getCoordinates();
        List<Vertex> vs = new ArrayList<>();
        for (int i = 0; i < cs.length - 1; i++) {
            vs.add(Vertex.of(cs[i].x, cs[i].y));
        }
        return new Polyline(PatternDrawings.CUT, vs, true);
    }

    private static double round(double v, int digits) {
        double f = Math.pow(10, digits);
        return Math.round(v * f) / f;
    }
}
