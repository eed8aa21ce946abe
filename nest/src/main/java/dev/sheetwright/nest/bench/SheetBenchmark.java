package dev.sheetwright.nest.bench;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalLong;
import java.util.Random;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.ProgressListener;
import dev.sheetwright.nest.model.RotationRule;
import dev.sheetwright.nest.model.Sheet;

/**
 * Timing benchmark on synthetic duct-like jobs (inches, 48 x 120 sheets, gap 0.25, margin 0.5, chord tolerance 0.01,
 * quarter turns): cone stretch-outs (annular sectors), gore-like wavy bands, wrap rectangles, flange rings with
 * holes and small caps. Prints one JSON line per job: parts, sheets, bound = ceil(part area / usable sheet area),
 * seconds, violations.
 *
 * <p>usage: {@code java -cp ... dev.sheetwright.nest.bench.SheetBenchmark PARTS SECONDS [SEED]}
 * (SECONDS 0 = constructive pass only).
 */
public final class SheetBenchmark {
    private static final GeometryFactory GF = new GeometryFactory();
    private static final double CHORD = 0.01;

    private SheetBenchmark() {
    }

    public static void main(String[] args) {
        int parts = Integer.parseInt(args[0]);
        double seconds = Double.parseDouble(args[1]);
        long seed = args.length > 2 ? Long.parseLong(args[2]) : 1;
        NestRequest req = job(parts, seed);
        NestOptions opt = seconds == 0 ? NestOptions.constructiveOnly()
                : new NestOptions(Duration.ofMillis((long) (seconds * 1000)), OptionalLong.empty(), seed, 2, ProgressListener.NONE);
        long t0 = System.nanoTime();
        NestResult r = dev.sheetwright.nest.place.Nester.nest(req, opt);
        double secs = (System.nanoTime() - t0) / 1e9;
        double area = req.pieces().stream().mapToDouble(p -> p.copies() * p.shape().getArea()).sum();
        double usable = (120 - 1) * (48 - 1);
        int violations = NestChecker.check(req, r).size();
        System.out.printf(Locale.ROOT, "{\"parts\":%d,\"placed\":%d,\"sheets\":%d,\"bound\":%d,\"seconds\":%.3f,\"violations\":%d,"
                        + "\"lastSheetUsedLength\":%.2f}%n", req.totalCopies(), r.placedCount(), r.sheets().size(),
                (int) Math.ceil(area / usable), secs, violations, r.sheets().isEmpty() ? 0 : r.sheets().get(r.sheets().size() - 1).usedLength());
    }

    /** About {@code parts} duct-like parts in types of 1 to 4 copies. */
    public static NestRequest job(int parts, long seed) {
        Random r = new Random(seed);
        List<NestPiece> pieces = new ArrayList<>();
        int n = 0;
        int t = 0;
        while (n < parts) {
            int copies = Math.min(parts - n, 1 + r.nextInt(4));
            Polygon shape = switch (r.nextInt(5)) {
                case 0 -> sector(12 + r.nextDouble() * 20, 6 + r.nextDouble() * 10, 30 + r.nextDouble() * 60);
                case 1 -> gore(15 + r.nextDouble() * 35, 4 + r.nextDouble() * 6, 1 + r.nextDouble() * 3);
                case 2 -> rect(8 + r.nextDouble() * 40, 4 + r.nextDouble() * 20);
                case 3 -> ring(4 + r.nextDouble() * 6, 1 + r.nextDouble());
                default -> disc(1.5 + r.nextDouble() * 3);
            };
            pieces.add(NestPiece.of("F" + t, "p" + t, copies, shape));
            n += copies;
            t++;
        }
        return new NestRequest(pieces, List.of(Sheet.unlimited("48x120", 120, 48, 80)),
                new NestRules(0.25, 0.5, RotationRule.quarter(), false, CHORD));
    }

    private static int segments(double radius, double angleRad) {
        double step = 2 * Math.acos(1 - CHORD / radius);
        return Math.max(2, (int) Math.ceil(angleRad / step));
    }

    /** Cone stretch-out: annular sector, outer radius r, band width w, sweep deg. */
    static Polygon sector(double r, double w, double deg) {
        double a = Math.toRadians(deg);
        List<Coordinate> c = new ArrayList<>();
        int so = segments(r, a);
        for (int i = 0; i <= so; i++) {
            double t = a * i / so;
            c.add(new Coordinate(r * Math.cos(t), r * Math.sin(t)));
        }
        double ri = Math.max(1, r - w);
        int si = segments(ri, a);
        for (int i = si; i >= 0; i--) {
            double t = a * i / si;
            c.add(new Coordinate(ri * Math.cos(t), ri * Math.sin(t)));
        }
        c.add(c.get(0).copy());
        return GF.createPolygon(c.toArray(new Coordinate[0]));
    }

    /** Gore-like band: straight bottom, top edge h + amp cos(2 pi x / len). */
    static Polygon gore(double len, double h, double amp) {
        List<Coordinate> c = new ArrayList<>();
        c.add(new Coordinate(0, 0));
        c.add(new Coordinate(len, 0));
        int n = 48;
        for (int i = n; i >= 0; i--) {
            double x = len * i / n;
            c.add(new Coordinate(x, h + amp * Math.cos(2 * Math.PI * x / len)));
        }
        c.add(new Coordinate(0, 0));
        return GF.createPolygon(c.toArray(new Coordinate[0]));
    }

    static Polygon rect(double w, double h) {
        return GF.createPolygon(new Coordinate[] {new Coordinate(0, 0), new Coordinate(w, 0), new Coordinate(w, h),
                new Coordinate(0, h), new Coordinate(0, 0)});
    }

    static Polygon circle(double r, boolean ccw) {
        int n = Math.max(12, segments(r, 2 * Math.PI));
        Coordinate[] c = new Coordinate[n + 1];
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * (ccw ? i : n - i) / n;
            c[i] = new Coordinate(r * Math.cos(t), r * Math.sin(t));
        }
        c[n] = c[0].copy();
        return GF.createPolygon(c);
    }

    /** Flange ring: outer radius r, width w. */
    static Polygon ring(double r, double w) {
        LinearRing shell = GF.createLinearRing(circle(r, true).getExteriorRing().getCoordinates());
        LinearRing hole = GF.createLinearRing(circle(r - w, false).getExteriorRing().getCoordinates());
        return GF.createPolygon(shell, new LinearRing[] {hole});
    }

    static Polygon disc(double r) {
        return circle(r, true);
    }
}
