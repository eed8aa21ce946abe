package dev.sheetwright.cli.mixin;

import dev.sheetwright.nest.model.NestOptions;
import dev.sheetwright.nest.model.ProgressListener;
import java.time.Duration;
import java.util.OptionalLong;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The nest search options every nesting command shares: {@code --time}, {@code --iterations}, {@code --seed} and
 * {@code --threads}. The default time is the command's own (a quote is a quick nest); the default thread count is
 * every processor the machine offers.
 */
public final class SearchOptions {

    /** Longest search a command accepts, in seconds: one day. */
    public static final double MAX_SECONDS = 86_400;
    /** Most search threads a command accepts. */
    public static final int MAX_THREADS = 64;

    @Spec(Spec.Target.MIXEE)
    CommandSpec mixee;

    @Option(names = "--time", paramLabel = "S",
            description = "seconds the nest search may run (default: 10 for nest and bench, 2 for quote)")
    Double seconds;

    @Option(names = "--iterations", paramLabel = "N",
            description = "run exactly N search steps instead of a time limit: the same seed and N give the same"
                    + " nest, whatever the thread count")
    Long iterations;

    @Option(names = "--seed", defaultValue = "1", paramLabel = "N", description = "search seed (default ${DEFAULT-VALUE})")
    long seed;

    @Option(names = "--threads", paramLabel = "N",
            description = "search threads (default: every available processor)")
    Integer threads;

    /** The search time in seconds, the command's default when {@code --time} is not given; validated. */
    public double seconds(double commandDefault) {
        double s = seconds == null ? commandDefault : seconds;
        if (!(s >= 0) || s > MAX_SECONDS) {
            throw new ParameterException(mixee.commandLine(), "--time must be from 0 to 86400 seconds, got " + s);
        }
        return s;
    }

    /** The thread count: {@code --threads}, else every available processor; validated. */
    public int threads() {
        int n = threads == null ? Math.min(MAX_THREADS, Runtime.getRuntime().availableProcessors()) : threads;
        if (n < 1 || n > MAX_THREADS) {
            throw new ParameterException(mixee.commandLine(), "--threads must be from 1 to " + MAX_THREADS
                    + ", got " + n);
        }
        return n;
    }

    /** The options for the nester, reporting progress to {@code listener}. */
    public NestOptions nestOptions(double commandDefaultSeconds, ProgressListener listener) {
        double s = seconds(commandDefaultSeconds);
        int n = threads();
        if (iterations != null) {
            if (iterations < 0) {
                throw new ParameterException(mixee.commandLine(), "--iterations must be >= 0, got " + iterations);
            }
            return new NestOptions(Duration.ofDays(1), OptionalLong.of(iterations), seed, n, listener);
        }
        return new NestOptions(Duration.ofMillis(Math.round(s * 1000)), OptionalLong.empty(), seed, n, listener);
    }
}
