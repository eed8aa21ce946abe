package dev.sheetwright.cli.mixin;

import dev.sheetwright.cli.job.JobReader;
import dev.sheetwright.core.job.Job;
import java.nio.file.Path;
import picocli.CommandLine.Parameters;

/** The job file every job command takes as its first parameter. */
public final class JobFileOption {

    @Parameters(index = "0", paramLabel = "JOB.yaml", description = "the job file")
    Path file;

    public Path path() {
        return file;
    }

    /** The job file as named in messages. */
    public String label() {
        return file.toString();
    }

    public Job read() {
        return JobReader.read(file);
    }
}
