package dev.sheetwright.cli.run;

import dev.sheetwright.cli.job.JobFileException;
import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.cli.output.PatternsJson;
import dev.sheetwright.core.develop.DevelopContext;
import dev.sheetwright.core.develop.DevelopedPiece;
import dev.sheetwright.core.develop.Developers;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.geom.Pattern;
import dev.sheetwright.core.job.Job;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Develops every fitting of a job, turning a fitting error into one that also names the job file. */
public final class JobDevelopment {

    private JobDevelopment() {
    }

    public static List<Development> developAll(Job job, String file) {
        DevelopContext ctx = job.developContext();
        List<Development> out = new ArrayList<>();
        for (FittingSpec f : job.fittings()) {
            try {
                out.add(Developers.develop(f, ctx));
            } catch (FittingException e) {
                String prefix = "fitting '" + e.fitting() + "', field '" + e.field() + "': ";
                String msg = e.getMessage().startsWith(prefix) ? e.getMessage().substring(prefix.length())
                        : e.getMessage();
                throw new JobFileException(file, e.fitting(), dev.sheetwright.cli.job.JobReader.jobFieldName(e.field()), msg);
            } catch (IllegalArgumentException e) {
                throw new JobFileException(file, f.id(), null, e.getMessage());
            }
        }
        refuseSameFileNames(out, file);
        return out;
    }

    /**
     * Two fittings whose ids differ only in characters a file name cannot hold ({@code a/b}, {@code a-b}) or in
     * letter case would write one part file over the other; the job is refused naming both ids.
     */
    private static void refuseSameFileNames(List<Development> developments, String file) {
        Map<String, String> owner = new HashMap<>();
        for (Development d : developments) {
            for (DevelopedPiece piece : d.pieces()) {
                Pattern p = piece.pattern();
                String name = PatternsJson.partFile(p);
                String earlier = owner.putIfAbsent(name.toLowerCase(Locale.ROOT), p.fitting());
                if (earlier != null && !earlier.equals(p.fitting())) {
                    throw new JobFileException(file, p.fitting(), "id", "fittings '" + earlier + "' and '"
                            + p.fitting() + "' would both write " + name + ".dxf (a file name keeps only letters,"
                            + " digits, '.', '_' and '-', and some disks ignore letter case); rename one of them");
                }
            }
        }
    }
}
