package dev.sheetwright.core.fitting;

import dev.sheetwright.core.units.LengthUnit;
import dev.sheetwright.core.units.Lengths;
import java.util.Locale;

/**
 * Every default allowance width in one table (inches), and the reading of allowance words from a job file.
 * All values are defaults a shop overrides in the job: its own roll-formers set the real numbers
 * (trade-reference §7).
 */
public final class AllowanceTable {

    // ---- The table (inches). Source beside each value. ----
    /** Plain lap seam: 3/8-1/2 in on one edge (common practice; rule [S:NAVY ch.2]). */
    static final double LAP_SEAM = 0.375;
    /** Grooved seam lock width W; the seam takes 3W, half on each edge ([S:NAVY ch.2] [S:TALL]); W 1/4 in common practice. */
    static final double GROOVE_LOCK = 0.25;
    /** Pittsburgh lock: pocket edge about 1 in (common practice, trade-reference §7.2). */
    static final double PITTSBURGH_POCKET = 1.0;
    /** Pittsburgh lock: right-angle flange edge about 1/4 in (common practice, trade-reference §7.2). */
    static final double PITTSBURGH_FLANGE = 0.25;
    /** Button-punch snap lock, female (pocket) edge about 1 in (from memory; pocket >= 5/8 in [S:MH p.1445]). */
    static final double SNAP_LOCK_FEMALE = 1.0;
    /** Button-punch snap lock, male edge about 5/8 in (from memory, trade-reference §7.2). */
    static final double SNAP_LOCK_MALE = 0.625;
    /** Lap end (slip) allowance 1/2 in (common practice, trade-reference §7.3). */
    static final double LAP_END = 0.5;
    /** Bead allowance 3/8 in (from memory: bead about 1/4-3/8 in behind the crimp, trade-reference §7.4). */
    static final double BEAD_END = 0.375;
    /** Crimp length 1 1/4 in (from memory: 1 1/4-1 1/2 in, trade-reference §7.4). */
    static final double CRIMP_END = 1.25;
    /**
     * Circumferential (between-gore) seam of a gored elbow: a plain lap of 1/4 in on the lower piece's miter edge,
     * riveted or screwed and sealed (common practice; lap rule [S:NAVY ch.2], trade-reference §3.4).
     */
    static final double ELBOW_MITER_LAP = 0.25;
    /**
     * Tap flange turned out on the joint edge of a tap, 1/2 in (common practice: taps get tab or flange
     * allowances, trade-reference §4.3 and §6; the width is a shop default, verify on the job).
     */
    static final double TAP_FLANGE = 0.5;

    // ---- Rectangular work (trade-reference §13.1, §7.2, §7.3). ----
    /**
     * Pittsburgh lock, male flange on a curved cheek edge (elbow and offset cheeks) 3/16 in; straight edges take
     * {@link #PITTSBURGH_FLANGE} (common practice, trade-reference §13.1).
     */
    static final double PITTSBURGH_CURVED_FLANGE = 0.1875;
    /** Drive-slip edge: a 180 degree hem made from about 1/2 in of extra metal (common practice, §7.3). */
    static final double DRIVE_HEM = 0.5;
    /** Edge entering a flat S slip: about 1/2 in beyond the net line so the S can grip (common practice, §7.3). */
    static final double S_SLIP_EDGE = 0.5;
    /** Flange or tabs on a rectangular tap's main edge, about 1 in (common practice, trade-reference §13.7). */
    static final double RECT_TAP_FLANGE = 1.0;
    /** Tabs on a tap's main edge: each 1 in along the edge (common practice; depth as the flange, §13.7). */
    static final double TAB_LENGTH = 1.0;
    /** Tabs at most 6 in apart, centre to centre (common practice). */
    static final double TAB_PITCH = 6.0;
    /** The end tabs 1/2 in in from the corners, clear of the corner seams (common practice). */
    static final double TAB_INSET = 0.5;
    /**
     * Flanges of a rectangular end cap turned over the duct end, 1 in (common practice: same width as the tap
     * flange of trade-reference §13.7; the cap itself is W x D plus flanges, §13.7).
     */
    static final double END_CAP_FLANGE = 1.0;

    private final LengthUnit unit;

    private AllowanceTable(LengthUnit unit) {
        this.unit = unit;
    }

    /** The table with its widths expressed in {@code unit}. */
    public static AllowanceTable in(LengthUnit unit) {
        return new AllowanceTable(unit);
    }

    private double inches(double value) {
        return unit.convert(value, LengthUnit.INCH);
    }

    /** The seam used when a job gives none: a grooved (pipe-lock) seam with the default lock (common practice). */
    public SeamAllowance defaultSeam() {
        return seam(SeamKind.GROOVE, inches(GROOVE_LOCK));
    }

    /** The seam between elbow gores when a job gives none: a 1/4 in lap (common practice). */
    public SeamAllowance defaultMiterSeam() {
        return seam(SeamKind.LAP, inches(ELBOW_MITER_LAP));
    }

    /** A seam of the given kind with lock/lap width {@code w} (ignored where the kind has fixed widths). */
    public SeamAllowance seam(SeamKind kind, double w) {
        return switch (kind) {
            case NONE, BUTT -> new SeamAllowance(kind, 0, 0);
            case LAP -> new SeamAllowance(kind, w, 0);
            case GROOVE -> new SeamAllowance(kind, 1.5 * w, 1.5 * w);
            case PITTSBURGH -> new SeamAllowance(kind, inches(PITTSBURGH_POCKET), inches(PITTSBURGH_FLANGE));
            case SNAP_LOCK -> new SeamAllowance(kind, inches(SNAP_LOCK_FEMALE), inches(SNAP_LOCK_MALE));
        };
    }

    /**
     * Reads a seam as written in a job: {@code none}, {@code butt}, {@code pittsburgh}, {@code snap-lock},
     * {@code lap [W]}, {@code groove [W]} (W in the job's unit, fractions allowed).
     */
    public SeamAllowance parseSeam(String text) {
        String[] words = split(text);
        SeamKind kind = null;
        for (SeamKind k : SeamKind.values()) {
            if (k.word().equals(words[0])) {
                kind = k;
            }
        }
        if (kind == null) {
            throw new IllegalArgumentException("unknown seam '" + text
                    + "': use none, lap W, groove W, pittsburgh, snap-lock or butt");
        }
        boolean takesWidth = kind == SeamKind.LAP || kind == SeamKind.GROOVE;
        if (!takesWidth && words.length > 1) {
            throw new IllegalArgumentException("seam '" + words[0] + "' takes no width (got '" + text
                    + "'); its widths come from the allowance table");
        }
        double w = words.length > 1 ? positive(words[1], text)
                : kind == SeamKind.LAP ? inches(LAP_SEAM) : inches(GROOVE_LOCK);
        return seam(kind, w);
    }

    /** The flange on the joint edge of a tap when the job gives none (common practice, trade-reference §4.3). */
    public EndAllowance defaultTapFlange() {
        return new EndAllowance(EndKind.FLANGE, inches(TAP_FLANGE));
    }

    // ---- Rectangular work. ----

    /** The longitudinal seam of rectangular fittings when neither the fitting nor the job gives one: Pittsburgh. */
    public SeamAllowance defaultRectSeam() {
        return seam(SeamKind.PITTSBURGH, 0);
    }

    /**
     * The width of the male edge of {@code seam} where it runs along a curved cheek edge: the curved-edge
     * Pittsburgh flange (3/16 in, common practice §13.1); other seams keep their straight male width.
     */
    public double curvedEdgeFlange(SeamAllowance seam) {
        return seam.kind() == SeamKind.PITTSBURGH ? inches(PITTSBURGH_CURVED_FLANGE) : seam.left();
    }

    /** True for the longitudinal seams rectangular fittings take: {@code pittsburgh}, {@code snap-lock}, {@code none}. */
    public static boolean rectangularSeam(SeamKind kind) {
        return kind == SeamKind.PITTSBURGH || kind == SeamKind.SNAP_LOCK || kind == SeamKind.NONE;
    }

    /** Reads a rectangular longitudinal seam: {@code pittsburgh}, {@code snap-lock} or {@code none}. */
    public SeamAllowance parseRectSeam(String text) {
        SeamAllowance s;
        try {
            s = parseSeam(text);
        } catch (IllegalArgumentException e) {
            s = null;
        }
        if (s == null || !rectangularSeam(s.kind())) {
            throw new IllegalArgumentException("'" + text + "' is not a rectangular seam: use pittsburgh, snap-lock"
                    + " or none");
        }
        return s;
    }

    /**
     * Reads a transverse connector of a rectangular end: {@code none}, {@code slip [W]}, {@code drive [W]} or
     * {@code flange W} (a formed-on flange's width comes from the shop's roll-former, so it must be given).
     */
    public EndAllowance parseRectEnd(String text) {
        String[] words = split(text);
        EndKind kind = switch (words[0]) {
            case "none" -> EndKind.NONE;
            case "slip" -> EndKind.SLIP;
            case "drive" -> EndKind.DRIVE;
            case "flange" -> EndKind.FLANGE;
            case "tabs" -> EndKind.TABS;
            default -> throw new IllegalArgumentException("unknown rectangular end '" + text
                    + "': use none, slip [W], drive [W], flange W (or, on a tap's main edge, tabs [W])");
        };
        if (kind == EndKind.NONE) {
            if (words.length > 1) {
                throw new IllegalArgumentException("end 'none' takes no width (got '" + text + "')");
            }
            return EndAllowance.NONE;
        }
        if (kind == EndKind.FLANGE && words.length == 1) {
            throw new IllegalArgumentException("'flange' needs its width (flange W): a formed-on flange is as wide as"
                    + " the shop's roll-former makes it");
        }
        return new EndAllowance(kind, words.length > 1 ? positive(words[1], text) : defaultEnd(kind));
    }

    /** The flange on a rectangular tap's main edge when the job gives none, 1 in (common practice, §13.7). */
    public EndAllowance defaultRectTapFlange() {
        return new EndAllowance(EndKind.FLANGE, inches(RECT_TAP_FLANGE));
    }

    /**
     * Where tabs go along a straight edge of length {@code edge}: pairs of (start, end) distances from the edge's
     * start, {@link #TAB_LENGTH} long, the end ones {@link #TAB_INSET} in from the corners and at most
     * {@link #TAB_PITCH} apart; one tab in the middle when the edge is short (common practice).
     */
    public double[][] tabs(double edge) {
        double len = inches(TAB_LENGTH);
        double inset = inches(TAB_INSET);
        double pitch = inches(TAB_PITCH);
        if (edge < 2 * inset + 2 * len) {
            double l = Math.min(len, edge / 2);
            return new double[][] {{(edge - l) / 2, (edge + l) / 2}};
        }
        double span = edge - 2 * inset - len; // first tab start to last tab start
        int n = Math.max(2, (int) Math.ceil(span / pitch) + 1);
        double[][] out = new double[n][];
        for (int i = 0; i < n; i++) {
            double start = inset + span * i / (n - 1);
            out[i] = new double[] {start, start + len};
        }
        return out;
    }

    /** The flange width of an end cap when the job gives none, 1 in (common practice, §13.7). */
    public double defaultCapFlange() {
        return inches(END_CAP_FLANGE);
    }

    /**
     * Reads an end allowance: {@code none}, {@code lap [W]}, {@code bead [W]}, {@code crimp [W]},
     * {@code flange [W]}.
     */
    public EndAllowance parseEnd(String text) {
        String[] words = split(text);
        EndKind kind = null;
        for (EndKind k : EndKind.values()) {
            if (k.word().equals(words[0])) {
                kind = k;
            }
        }
        if (kind == null || kind.rectangularOnly()) {
            throw new IllegalArgumentException("unknown end allowance '" + text
                    + "': use none, lap W, bead W, crimp W or flange W"
                    + (kind == null ? "" : " (" + kind.word() + " is for rectangular duct ends)"));
        }
        if (kind == EndKind.NONE) {
            if (words.length > 1) {
                throw new IllegalArgumentException("end allowance 'none' takes no width (got '" + text + "')");
            }
            return EndAllowance.NONE;
        }
        double w = words.length > 1 ? positive(words[1], text) : defaultEnd(kind);
        return new EndAllowance(kind, w);
    }

    private double defaultEnd(EndKind kind) {
        return switch (kind) {
            case NONE -> 0;
            case LAP -> inches(LAP_END);
            case BEAD -> inches(BEAD_END);
            case CRIMP -> inches(CRIMP_END);
            case FLANGE -> inches(TAP_FLANGE);
            case SLIP -> inches(S_SLIP_EDGE);
            case DRIVE -> inches(DRIVE_HEM);
            case TABS -> inches(RECT_TAP_FLANGE);
        };
    }

    private static String[] split(String text) {
        String t = text == null ? "" : text.trim().toLowerCase(Locale.ROOT);
        if (t.isEmpty()) {
            throw new IllegalArgumentException("allowance must not be empty");
        }
        int space = t.indexOf(' ');
        return space < 0 ? new String[] {t} : new String[] {t.substring(0, space), t.substring(space + 1).trim()};
    }

    private static double positive(String number, String text) {
        double v = Lengths.parse(number);
        if (!(v > 0)) {
            throw new IllegalArgumentException("allowance width must be positive in '" + text + "'");
        }
        return v;
    }
}
