package dev.sheetwright.nest.overlap;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.LongFunction;

/**
 * Runs a fixed number of logical workers on at most a given number of threads and returns their results in worker
 * order, so that a run's outcome does not depend on the thread count. Each worker gets its own seed derived from
 * the run's seed.
 */
final class LogicalWorkers {
    private LogicalWorkers() {
    }

    /** The seed of worker {@code w} (from 0) of a run with seed {@code seed}. */
    static long seedOf(long seed, int w) {
        return seed * 0x9E3779B97F4A7C15L + (w + 1) * 0xD1B54A32D192ED03L;
    }

    /** Results of {@code workers} workers made by {@code work} from their seeds, run on at most {@code threads}. */
    static <T> List<T> run(String name, int workers, int threads, long seed, LongFunction<Callable<T>> work) {
        List<T> results = new ArrayList<>();
        ExecutorService ex = Executors.newFixedThreadPool(Math.max(1, Math.min(workers, threads)), r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<T>> fs = new ArrayList<>();
            for (int w = 0; w < workers; w++) {
                fs.add(ex.submit(work.apply(seedOf(seed, w))));
            }
            for (Future<T> f : fs) {
                results.add(f.get());
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(name + " was interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            ex.shutdownNow();
        }
        return results;
    }
}
