package dev.sheetwright.cli.run;

import dev.sheetwright.cli.job.JobFileException;
import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.core.develop.DevelopContext;
import dev.sheetwright.core.develop.Developers;
import dev.sheetwright.core.develop.Development;
import dev.sheetwright.core.fitting.FittingException;
import dev.sheetwright.core.fitting.FittingSpec;
import dev.sheetwright.core.job.Job;
import java.util.ArrayList;
import java.util.List;

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
        return out;
    }
}
