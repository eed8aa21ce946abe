package dev.sheetwright.nest.model;

/**
 * Told each time the search finds a better nest (the first complete layout included). Called from worker threads;
 * an implementation must be quick and thread-safe. The engine never prints: the command line shows these.
 */
@FunctionalInterface
public interface ProgressListener {
    ProgressListener NONE = (iteration, sheets, cost, lastLength, utilization) -> { };

    /**
     * @param iteration   steps done so far by the worker that found it
     * @param sheets      stock pieces used
     * @param cost        total stock cost
     * @param lastLength  length used along the compacting axis of the last sheet (coil or strip: used length)
     * @param utilization part area over the stock area used, 0..1
     */
    void improved(long iteration, int sheets, double cost, double lastLength, double utilization);
}
