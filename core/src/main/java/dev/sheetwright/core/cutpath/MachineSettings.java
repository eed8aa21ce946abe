package dev.sheetwright.core.cutpath;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

/**
 * The table's G-code dialect, from the shop file's {@code machine:} section.
 *
 * @param torchOn M-code that starts the arc or beam (default {@code M03})
 * @param torchOff M-code that stops it (default {@code M05})
 * @param pierceDelaySeconds dwell after torch on (G4 P seconds); empty: the cut chart's pierce time
 * @param header lines written after our comment head, before the first move
 * @param footer lines written after the last contour (default {@code M30}, end of program)
 * @param lineNumbers whether blocks get N numbers (N10, N20, ...)
 * @param heights Z moves for a machine with a Z axis, else empty
 */
public record MachineSettings(String torchOn, String torchOff, OptionalDouble pierceDelaySeconds,
        List<String> header, List<String> footer, boolean lineNumbers, Optional<Heights> heights) {

    private static final Pattern M_CODE = Pattern.compile("M[0-9]{1,3}");
    private static final Pattern PLAIN_LINE = Pattern.compile("[\\x20-\\x7e]{1,120}");

    /** The built-in dialect: M03/M05, pierce delay from the cut chart, M30 at the end, no line numbers, no Z. */
    public static final MachineSettings DEFAULT = new MachineSettings("M03", "M05", OptionalDouble.empty(), List.of(),
            List.of("M30"), false, Optional.empty());

    /**
     * Torch heights above the metal in millimetres: rapids at {@code safe}, pierce at {@code pierce}, cut at
     * {@code cut}.
     */
    public record Heights(double safeMm, double pierceMm, double cutMm) {
        public Heights {
            for (double v : new double[] {safeMm, pierceMm, cutMm}) {
                if (!(v >= 0) || !Double.isFinite(v)) {
                    throw new IllegalArgumentException("heights must be finite and >= 0, got " + v);
                }
            }
            if (safeMm < pierceMm || pierceMm < cutMm) {
                throw new IllegalArgumentException("heights must be safe >= pierce >= cut, got " + safeMm + ", "
                        + pierceMm + ", " + cutMm + " mm");
            }
        }
    }

    public MachineSettings {
        requireMCode("torch-on", torchOn);
        requireMCode("torch-off", torchOff);
        if (sameCode(torchOn, torchOff)) {
            throw new IllegalArgumentException("torch-on and torch-off must differ, both are " + torchOn);
        }
        if (pierceDelaySeconds == null || heights == null) {
            throw new IllegalArgumentException("pierce delay and heights must not be null (use empty)");
        }
        pierceDelaySeconds.ifPresent(v -> {
            if (!(v >= 0 && v <= 60)) {
                throw new IllegalArgumentException("pierce-delay must be from 0 to 60 seconds, got " + v);
            }
        });
        header = List.copyOf(header);
        footer = List.copyOf(footer);
        for (String line : header) {
            requirePlain("header", line);
        }
        for (String line : footer) {
            requirePlain("footer", line);
        }
    }

    /** True when two M-codes are the same code however written ({@code M7} and {@code M07}). */
    public static boolean sameCode(String a, String b) {
        return Integer.parseInt(a.substring(1)) == Integer.parseInt(b.substring(1));
    }

    /** True for an M-code word such as {@code M03} or {@code M7}. */
    public static boolean isMCode(String word) {
        return word != null && M_CODE.matcher(word).matches();
    }

    private static void requireMCode(String field, String code) {
        if (!isMCode(code)) {
            throw new IllegalArgumentException(field + " must be an M-code such as M03, got '" + code + "'");
        }
    }

    private static void requirePlain(String field, String line) {
        if (line == null || !PLAIN_LINE.matcher(line).matches()) {
            throw new IllegalArgumentException(field + " lines must be 1 to 120 printable ASCII characters, got '"
                    + line + "'");
        }
    }
}
