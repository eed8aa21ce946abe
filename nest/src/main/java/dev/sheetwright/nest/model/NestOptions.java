package dev.sheetwright.nest.model;

import java.time.Duration;
import java.util.OptionalLong;

/**
 * How long to search. With {@code iterations} present the search runs exactly that many improvement steps
 * (split over the threads) and the result depends only on the request, the seed and the iteration count;
 * otherwise it runs until {@code timeLimit} is spent.
 */
public record NestOptions(Duration timeLimit, OptionalLong iterations, long seed, int threads, ProgressListener listener) {
    public NestOptions {
        Checks.requireNonNull("timeLimit", timeLimit);
        if (timeLimit.isNegative()) {
            throw new IllegalArgumentException("timeLimit must be >= 0, got " + timeLimit);
        }
        Checks.requireNonNull("iterations", iterations);
        if (iterations.isPresent() && iterations.getAsLong() < 0) {
            throw new IllegalArgumentException("iterations must be >= 0, got " + iterations.getAsLong());
        }
        if (threads < 1 || threads > 64) {
            throw new IllegalArgumentException("threads must be in 1..64, got " + threads);
        }
        Checks.requireNonNull("listener", listener);
    }

    /** Run for a time, on {@code threads} threads. */
    public static NestOptions timed(Duration timeLimit, long seed, int threads) {
        return new NestOptions(timeLimit, OptionalLong.empty(), seed, threads, ProgressListener.NONE);
    }

    /** Run exactly {@code iterations} steps: reproducible. */
    public static NestOptions steps(long iterations, long seed, int threads) {
        return new NestOptions(Duration.ofDays(1), OptionalLong.of(iterations), seed, threads, ProgressListener.NONE);
    }

    /**
     * The same options with {@code reserve} taken off a timed run's limit (never below half of it), so that the
     * caller has that time left after the nest for checking and writing it; a run of fixed steps is unchanged.
     */
    public NestOptions reserving(Duration reserve) {
        Checks.requireNonNull("reserve", reserve);
        if (iterations.isPresent() || reserve.isNegative() || reserve.isZero()) {
            return this;
        }
        Duration half = timeLimit.dividedBy(2);
        Duration limit = timeLimit.minus(reserve.compareTo(half) > 0 ? half : reserve);
        return new NestOptions(limit, iterations, seed, threads, listener);
    }

    /**
     * The same options with {@code fraction} (in (0, 1]) of a timed run's limit, for the first stage of a search
     * that runs in stages; a run of fixed steps is unchanged.
     */
    public NestOptions share(double fraction) {
        if (!(fraction > 0 && fraction <= 1)) {
            throw new IllegalArgumentException("fraction must be in (0, 1], got " + fraction);
        }
        if (iterations.isPresent()) {
            return this;
        }
        return new NestOptions(Duration.ofNanos((long) (timeLimit.toNanos() * fraction)), iterations, seed, threads,
                listener);
    }

    /** Only the constructive pass, no improvement search. */
    public static NestOptions constructiveOnly() {
        return steps(0, 0, 1);
    }
}
