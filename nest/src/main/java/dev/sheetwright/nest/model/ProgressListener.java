package dev.sheetwright.nest.model;

/** Told each time the improvement search finds a better nest. Called from worker threads. */
@FunctionalInterface
public interface ProgressListener {
    ProgressListener NONE = (iteration, sheets, cost, lastLength) -> { };

    /**
     * @param iteration  steps done so far by the worker that found it
     * @param sheets     stock pieces used
     * @param cost       total stock cost
     * @param lastLength length used along the compacting axis of the last sheet (coil: used length)
     */
    void improved(long iteration, int sheets, double cost, double lastLength);
}
