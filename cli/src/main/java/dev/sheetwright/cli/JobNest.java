package dev.sheetwright.cli;

import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import dev.sheetwright.nest.check.NestChecker;
import dev.sheetwright.nest.check.Violation;
import dev.sheetwright.nest.jobs.JobNestRequest;
import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.NestResult;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Develops a job, nests every piece it needs and checks the nest by an independent route before anything is
 * written. A failing check is a bug: it stops the command with exit 1.
 */
public record JobNest(Job job, List<Development> developments, JobNestRequest plan, NestResult result) {

    public static JobNest run(Job job, String file, NestOptions options) {
        List<Development> developments = JobDevelopment.developAll(job, file);
        Map<Pattern, Integer> pieces = new LinkedHashMap<>();
        for (Development d : developments) {
            for (DevelopedPiece piece : d.pieces()) {
                Pattern p = piece.pattern().atOrigin();
                pieces.put(p, p.count() * d.fitting().qty());
            }
        }
        JobNestRequest plan = JobNestRequest.of(pieces, job.cutting(), job.stock(), job.tolerance().chord());
        NestResult result = dev.sheetwright.nest.place.Nester.nest(plan.request(), options);
        List<Violation> violations = NestChecker.check(plan.request(), result);
        if (!violations.isEmpty()) {
            throw new IllegalStateException("the nest failed its independent check (a bug; nothing was written): "
                    + violations.stream().limit(5).map(Violation::toString).collect(Collectors.joining("; ")));
        }
        return new JobNest(job, developments, plan, result);
    }

    /** Net area of every placed part (exact patterns). */
    public double partArea() {
        return result.sheets().stream().flatMap(s -> s.parts().stream())
                .mapToDouble(p -> plan.pattern(p.fitting(), p.piece()).area()).sum();
    }
}
