package dev.sheetwright.inventory;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where a remnant came from: entered by hand, or left over from sheet {@code sheet} of job {@code job}.
 * Written as {@code manual} or {@code job NAME sheet N}.
 *
 * @param job   the job name, or null for a manual entry
 * @param sheet the sheet number within the job (from 1), or 0 for a manual entry
 */
public record RemnantSource(String job, int sheet) {
    private static final Pattern JOB_FORM = Pattern.compile("job (.+) sheet (\\d{1,6})");
    private static final RemnantSource MANUAL = new RemnantSource(null, 0);

    public RemnantSource {
        if (job == null) {
            if (sheet != 0) {
                throw new IllegalArgumentException("source: sheet " + sheet + " given without a job name");
            }
        } else {
            job = job.strip();
            if (job.isEmpty() || job.length() > 80 || job.chars().anyMatch(Character::isISOControl)) {
                throw new IllegalArgumentException("source: job name '" + job
                        + "' must be 1 to 80 printable characters on one line");
            }
            if (sheet < 1 || sheet > 999_999) {
                throw new IllegalArgumentException("source: sheet " + sheet + " is out of range; must be 1 to 999999");
            }
        }
    }

    /** A remnant entered by hand. */
    public static RemnantSource manual() {
        return MANUAL;
    }

    /** The offcut of sheet {@code sheet} (from 1) of job {@code job}. */
    public static RemnantSource job(String job, int sheet) {
        if (job == null) {
            throw new IllegalArgumentException("source: job name is null");
        }
        return new RemnantSource(job, sheet);
    }

    /** True for a manual entry. */
    public boolean isManual() {
        return job == null;
    }

    /** {@code manual} or {@code job NAME sheet N}. */
    public String text() {
        return isManual() ? "manual" : "job " + job + " sheet " + sheet;
    }

    /**
     * Reads {@code manual} or {@code job NAME sheet N}.
     *
     * @throws IllegalArgumentException naming the value and the two accepted forms
     */
    public static RemnantSource parse(String text) {
        String t = text == null ? "" : text.strip();
        if (t.equalsIgnoreCase("manual")) {
            return MANUAL;
        }
        Matcher m = JOB_FORM.matcher(t);
        if (m.matches()) {
            return job(m.group(1), Integer.parseInt(m.group(2)));
        }
        throw new IllegalArgumentException("source: '" + text + "' is not a source; expected 'manual' or 'job NAME sheet N'");
    }
}
