package dev.sheetwright.cli.run;

import dev.sheetwright.nest.model.ProgressListener;
import java.io.PrintWriter;
import java.util.Locale;

/** A one-line progress display on stderr, shown only when stderr is a terminal. */
public final class Progress implements ProgressListener {

    private final PrintWriter err;
    private final boolean show;
    private final long start = System.nanoTime();
    private final double budget;
    private boolean drawn;

    private Progress(PrintWriter err, boolean show, double budgetSeconds) {
        this.err = err;
        this.show = show;
        this.budget = budgetSeconds;
    }

    public static Progress forTerminal(PrintWriter err, double budgetSeconds) {
        return new Progress(err, System.console() != null, budgetSeconds);
    }

    @Override
    public synchronized void improved(long iteration, int sheets, double cost, double lastLength, double utilization) {
        if (!show) {
            return;
        }
        double t = (System.nanoTime() - start) / 1e9;
        int width = 24;
        int filled = budget > 0 ? (int) Math.min(width, Math.round(width * t / budget)) : width;
        err.printf(Locale.ROOT, "\r[%s%s] %5.1f s  %d sheets  last sheet used to %.1f  (step %d)   ",
                "#".repeat(filled), ".".repeat(width - filled), t, sheets, lastLength, iteration);
        err.flush();
        drawn = true;
    }

    public synchronized void done() {
        if (drawn) {
            err.print("\r" + " ".repeat(90) + "\r");
            err.flush();
        }
    }
}
