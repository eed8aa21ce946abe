package dev.sheetwright.cli.run;

import dev.sheetwright.nest.model.ProgressListener;
import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;

/**
 * A one-line progress display on stderr, shown only when stderr is a terminal: a bar, elapsed and remaining time,
 * and the best layout so far (sheets, or strip length on a coil, and utilization). The engine reports through
 * {@link ProgressListener}; the line is redrawn on every report and twice a second so the clock moves.
 */
public final class Progress implements ProgressListener, AutoCloseable {

    private static final int BAR = 20;
    private static final long REDRAW_MS = 500;

    private final PrintWriter err;
    private final boolean show;
    private final boolean strip;
    private final long start = System.nanoTime();
    private final double budget;
    private ScheduledExecutorService ticker;
    private boolean drawn;
    private boolean known;
    private int sheets;
    private double lastLength;
    private double utilization;
    private int width;

    private Progress(PrintWriter err, boolean show, double budgetSeconds, boolean strip) {
        this.err = err;
        this.show = show;
        this.budget = budgetSeconds;
        this.strip = strip;
    }

    /** Sheets are counted; see {@link #forTerminal(PrintWriter, double, boolean)}. */
    public static Progress forTerminal(PrintWriter err, double budgetSeconds) {
        return forTerminal(err, budgetSeconds, false);
    }

    /** Shown when stderr is a terminal; {@code strip}: the stock is one coil, so the used length is shown. */
    public static Progress forTerminal(PrintWriter err, double budgetSeconds, boolean strip) {
        Progress p = new Progress(err, System.console() != null, budgetSeconds, strip);
        if (p.show) {
            p.ticker = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "progress");
                t.setDaemon(true);
                return t;
            });
            p.ticker.scheduleAtFixedRate(p::redraw, REDRAW_MS, REDRAW_MS, TimeUnit.MILLISECONDS);
        }
        return p;
    }

    @Override
    public synchronized void improved(long iteration, int sheets, double cost, double lastLength, double utilization) {
        this.known = true;
        this.sheets = sheets;
        this.lastLength = lastLength;
        this.utilization = utilization;
        redraw();
    }

    private synchronized void redraw() {
        if (!show) {
            return;
        }
        String s = line((System.nanoTime() - start) / 1e9, budget, known, sheets, lastLength, utilization, strip);
        err.print("\r" + s + " ".repeat(Math.max(0, width - s.length())));
        err.flush();
        width = Math.max(width, s.length());
        drawn = true;
    }

    /**
     * The progress line: bar, elapsed and remaining seconds of the budget, then the best layout so far ("searching"
     * before the first one).
     */
    static String line(double elapsed, double budget, boolean known, int sheets, double lastLength,
            double utilization, boolean strip) {
        int filled = budget > 0 ? (int) Math.min(BAR, Math.round(BAR * elapsed / budget)) : BAR;
        double left = Math.max(0, budget - elapsed);
        String best = !known ? "searching"
                : (strip ? String.format(Locale.ROOT, "strip %.1f long", lastLength)
                        : sheets + (sheets == 1 ? " sheet" : " sheets"))
                        + String.format(Locale.ROOT, ", utilization %.1f %%", 100 * utilization);
        return String.format(Locale.ROOT, "[%s%s] %.1f s elapsed, %.1f s left  best: %s", "#".repeat(filled),
                ".".repeat(BAR - filled), elapsed, left, best);
    }

    /** Whether the job's only stock is a coil (the progress then shows the used length). */
    public static boolean coilOnly(dev.sheetwright.core.job.Job job) {
        return job.stock().sheets().isEmpty() && job.stock().remnants().isEmpty() && job.stock().coil().isPresent();
    }

    /** Stops the redraw and clears the line. */
    public synchronized void done() {
        if (ticker != null) {
            ticker.shutdownNow();
            ticker = null;
        }
        if (drawn) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
            drawn = false;
        }
    }

    @Override
    public void close() {
        done();
    }
}
