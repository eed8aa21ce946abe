package dev.sheetwright.cli.run;

import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.core.job.Stock;
import dev.sheetwright.core.job.StockRemnant;
import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.check.Violation;
import dev.sheetwright.nest.jobs.CleanOffcut;
import dev.sheetwright.nest.jobs.JobNestRequest;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Offcut;
import dev.sheetwright.nest.model.SheetLayout;
import dev.sheetwright.nest.overlap.SheetSearch;
import dev.sheetwright.nest.place.Nester;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Develops a job, nests every piece it needs and checks the nest by an independent route before anything is
 * written. A failing check is a bug: it stops the command with exit 1. {@code offcuts} holds, by layout index, the
 * clean offcut of each layout that has one (see {@link CleanOffcut}).
 */
public record JobNest(Job job, List<Development> developments, JobNestRequest plan, NestResult result,
        Map<Integer, Offcut> offcuts) {

    public JobNest {
        offcuts = Map.copyOf(offcuts);
    }

    /**
     * Time kept back from a timed search per piece, for checking the nest and writing its files, so that the whole
     * command ends within its --time plus a few seconds (with the time already spent and the fixed part below; at
     * most half the time is kept back): measured on the
     * 2-core development machine, checking and writing a 10,000-piece nest took about 10 s when the machine was
     * not busy (bench/run-scale-benchmark.sh).
     */
    static final Duration HANDOVER_PER_PIECE = Duration.ofNanos(1_000_000);
    /** Time kept back for the hand-over of any job: checking, the report and the PDF (common practice here). */
    static final Duration HANDOVER_FIXED = Duration.ofSeconds(1);

    /**
     * How long this process has run (starting the JVM, reading and developing the job): the time limit counts from
     * the command's start, not from the search's. Zero when the platform does not say.
     */
    static Duration sinceStart() {
        return ProcessHandle.current().info().startInstant()
                .map(t -> Duration.between(t, java.time.Instant.now()))
                .filter(d -> !d.isNegative())
                .orElse(Duration.ZERO);
    }

    public static JobNest run(Job job, String file, NestOptions options) {
        return run(job, file, options, List.of());
    }

    /** As {@link #run(Job, String, NestOptions, List, boolean)} without sheet elimination (the default). */
    public static JobNest run(Job job, String file, NestOptions options, List<StockRemnant> rackRemnants) {
        return run(job, file, options, rackRemnants, false);
    }

    /**
     * As {@link #run(Job, String, NestOptions)}, with {@code rackRemnants} (job units) offered after the job's own
     * remnants and before its sheets.
     *
     * With {@code sheetSearch}, {@link SheetSearch#nest} nests it (first layout, then sheet elimination), else
     * {@link Nester#nest}.
     *
     * @throws IllegalArgumentException if a rack remnant has the id of a remnant the job lists
     */
    public static JobNest run(Job job, String file, NestOptions options, List<StockRemnant> rackRemnants,
            boolean sheetSearch) {
        List<Development> developments = JobDevelopment.developAll(job, file);
        Map<Pattern, Integer> pieces = new LinkedHashMap<>();
        for (Development d : developments) {
            for (DevelopedPiece piece : d.pieces()) {
                Pattern p = piece.pattern().atOrigin();
                pieces.put(p, p.count() * d.fitting().qty());
            }
        }
        JobNestRequest plan = JobNestRequest.of(pieces, job.cutting(), withRack(job, file, rackRemnants),
                job.tolerance());
        NestOptions timed = options.reserving(sinceStart().plus(HANDOVER_FIXED)
                .plus(HANDOVER_PER_PIECE.multipliedBy(plan.request().totalCopies())));
        NestResult result = sheetSearch ? SheetSearch.nest(plan.request(), timed) : Nester.nest(plan.request(), timed);
        List<Violation> violations = NestChecker.check(plan.request(), result);
        if (!violations.isEmpty()) {
            throw new IllegalStateException("the nest failed its independent check (a bug; nothing was written): "
                    + violations.stream().limit(5).map(Violation::toString).collect(Collectors.joining("; ")));
        }
        Map<Integer, Offcut> offcuts = new LinkedHashMap<>();
        for (SheetLayout s : result.sheets()) {
            CleanOffcut.of(plan.request(), s, job.tolerance().linear(), job.tolerance().chord())
                    .ifPresent(o -> offcuts.put(s.index(), o));
        }
        return new JobNest(job, developments, plan, result, offcuts);
    }

    private static Stock withRack(Job job, String file, List<StockRemnant> rackRemnants) {
        if (rackRemnants.isEmpty()) {
            return job.stock();
        }
        Set<String> ids = new HashSet<>();
        job.stock().remnants().forEach(r -> ids.add(r.id()));
        List<StockRemnant> all = new ArrayList<>(job.stock().remnants());
        for (StockRemnant r : rackRemnants) {
            if (!ids.add(r.id())) {
                throw new IllegalArgumentException(file + ": stock.remnants lists " + r.id()
                        + ", which is also a remnant on the rack; rename it in the job or leave out --use-remnants");
            }
            all.add(r);
        }
        return new Stock(job.stock().sheets(), all, job.stock().coil());
    }

    /** The clean offcut of {@code layout}, or null when it has none. */
    public Offcut offcut(SheetLayout layout) {
        return offcuts.get(layout.index());
    }

    /** Net area of every placed part (exact patterns). */
    public double partArea() {
        return result.sheets().stream().flatMap(s -> s.parts().stream())
                .mapToDouble(p -> plan.pattern(p.fitting(), p.piece()).area()).sum();
    }
}
