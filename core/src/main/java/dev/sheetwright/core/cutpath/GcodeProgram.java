package dev.sheetwright.core.cutpath;

import dev.sheetwright.core.geom.Arc;
import dev.sheetwright.core.geom.Edge;
import dev.sheetwright.core.geom.Line;
import dev.sheetwright.core.geom.Point2;
import dev.sheetwright.core.units.LengthUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The RS-274 text of one sheet's plan: G20/G21 by the job unit, G90 absolute, G0 rapids with the torch off, G1
 * lines, G2/G3 arcs with I/J from the arc's start to its centre, one pierce (torch on, G4 dwell) per contour, torch
 * off after the lead-out. With controller compensation each contour is cut on its nominal path between G41 (scrap is
 * on the left of travel) and G40.
 */
public final class GcodeProgram {

    /** What the program needs besides the plan. Speeds and lengths in the job unit. */
    public record Settings(LengthUnit unit, double feedPerMinute, double pierceSeconds, double kerf,
            KerfCompensation compensation, MachineSettings machine) {
        public Settings {
            if (unit == null || compensation == null || machine == null) {
                throw new IllegalArgumentException("unit, compensation and machine must not be null");
            }
            if (!(feedPerMinute > 0) || !Double.isFinite(feedPerMinute)) {
                throw new IllegalArgumentException("feed must be finite and > 0, got " + feedPerMinute);
            }
            if (!(pierceSeconds >= 0) || !Double.isFinite(pierceSeconds)) {
                throw new IllegalArgumentException("pierce time must be finite and >= 0, got " + pierceSeconds);
            }
        }
    }

    /** Longest comment text on one line (controllers differ in how long a block may be). */
    static final int COMMENT_WIDTH = 72;
    /** Arcs shorter than this many output steps (chord) are written as lines. */
    static final int ARC_AS_LINE_STEPS = 10;

    private final Settings s;
    private final List<String> out = new ArrayList<>();
    private int number;

    private GcodeProgram(Settings s) {
        this.s = s;
    }

    /**
     * Every line of the program.
     *
     * @param labels one name per part of the plan (comments before each contour)
     */
    public static List<String> lines(SheetCutPlan plan, List<String> labels, ProgramHead head, Settings s) {
        GcodeProgram g = new GcodeProgram(s);
        g.write(plan, labels, head);
        return List.copyOf(g.out);
    }

    private void write(SheetCutPlan plan, List<String> labels, ProgramHead head) {
        String u = s.unit().symbol();
        comment("sheetwright cut program");
        comment("job: " + head.job());
        comment("sheet " + head.sheet() + " of " + head.sheets() + ": " + head.stock());
        comment("material: " + head.material() + "; process: " + head.process());
        comment(String.format(Locale.ROOT, "units: %s; kerf %s %s; compensation: %s; feed %s %s/min; pierce dwell"
                + " %s s", u, num(s.kerf()), u, s.compensation().word(), feed(), u, seconds(pierceSeconds())));
        comment(CutPlanner.summary(plan, u));
        if (s.compensation() == KerfCompensation.CONTROLLER) {
            comment("set the controller's kerf to " + num(s.kerf()) + " " + u + " (G41 offsets half of it)");
        }
        for (String c : head.cautions()) {
            comment("CAUTION: " + c);
        }
        s.machine().header().forEach(this::block);
        block(s.unit() == LengthUnit.INCH ? "G20" : "G21");
        block("G90");
        block("G40");
        s.machine().heights().ifPresent(h -> block("G0 Z" + num(s.unit().fromMm(h.safeMm()))));
        double pierce = pierceSeconds();
        for (int i = 0; i < plan.steps().size(); i++) {
            CutStep step = plan.steps().get(i);
            comment((i + 1) + ": " + labels.get(step.part()) + (step.hole() >= 0 ? " hole " + (step.hole() + 1)
                    : " outline"));
            Point2 p = step.lead().pierce();
            block("G0 X" + num(p.x()) + " Y" + num(p.y()));
            s.machine().heights().ifPresent(h -> block("G0 Z" + num(s.unit().fromMm(h.pierceMm()))));
            block(s.machine().torchOn());
            block("G4 P" + seconds(pierce));
            s.machine().heights().ifPresent(h -> block("G1 Z" + num(s.unit().fromMm(h.cutMm())) + " F" + feed()));
            String feed = " F" + feed();
            if (s.compensation() == KerfCompensation.CONTROLLER) {
                block("G41");
            }
            if (step.lead().leadIn().isPresent()) {
                Line in = step.lead().leadIn().get();
                block("G1 X" + num(in.end().x()) + " Y" + num(in.end().y()) + feed);
                feed = "";
            }
            for (Edge e : step.toolpath().edges()) {
                move(e, feed);
                feed = "";
            }
            step.lead().leadOut().ifPresent(l -> block("G1 X" + num(l.end().x()) + " Y" + num(l.end().y())));
            if (s.compensation() == KerfCompensation.CONTROLLER) {
                block("G40");
            }
            block(s.machine().torchOff());
            s.machine().heights().ifPresent(h -> block("G0 Z" + num(s.unit().fromMm(h.safeMm()))));
        }
        s.machine().footer().forEach(this::block);
    }

    private void move(Edge e, String feed) {
        Point2 to = e.end();
        // an arc whose ends are a few output steps apart is written as a line: a controller could read equal
        // rounded ends as a full circle (the sagitta left out is far below the output resolution)
        if (e instanceof Arc a && a.start().distance(to) > ARC_AS_LINE_STEPS * resolution()) {
            Point2 ij = a.centre().minus(a.start());
            block((a.sweep() < 0 ? "G2" : "G3") + " X" + num(to.x()) + " Y" + num(to.y()) + " I" + num(ij.x()) + " J"
                    + num(ij.y()) + feed);
        } else {
            block("G1 X" + num(to.x()) + " Y" + num(to.y()) + feed);
        }
    }

    private void block(String text) {
        if (s.machine().lineNumbers()) {
            number += 10;
            out.add("N" + number + " " + text);
        } else {
            out.add(text);
        }
    }

    /**
     * Comment lines of at most {@value #COMMENT_WIDTH} characters inside the parentheses, broken at spaces;
     * parentheses inside become brackets and anything outside printable ASCII a '?'.
     */
    private void comment(String text) {
        StringBuilder clean = new StringBuilder();
        for (char c : text.toCharArray()) {
            clean.append(c == '(' ? '[' : c == ')' ? ']' : c >= 0x20 && c < 0x7f ? c : '?');
        }
        String rest = clean.toString().strip();
        while (rest.length() > COMMENT_WIDTH) {
            int cut = rest.lastIndexOf(' ', COMMENT_WIDTH);
            if (cut <= 0) {
                cut = COMMENT_WIDTH;
            }
            out.add("(" + rest.substring(0, cut).strip() + ")");
            rest = rest.substring(cut).strip();
        }
        out.add("(" + rest + ")");
    }

    private double pierceSeconds() {
        return s.machine().pierceDelaySeconds().orElse(s.pierceSeconds());
    }

    private String feed() {
        return String.format(Locale.ROOT, "%.1f", s.feedPerMinute());
    }

    private static String seconds(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    /** The smallest step the program's numbers show: 0.0001 in or 0.001 mm. */
    private double resolution() {
        return s.unit() == LengthUnit.INCH ? 1e-4 : 1e-3;
    }

    private String num(double v) {
        String t = String.format(Locale.ROOT, s.unit() == LengthUnit.INCH ? "%.4f" : "%.3f", v);
        if (t.matches("-0\\.0+")) {
            t = t.substring(1);
        }
        return t;
    }
}
