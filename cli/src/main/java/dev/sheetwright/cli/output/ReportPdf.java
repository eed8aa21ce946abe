package dev.sheetwright.cli.output;

import dev.sheetwright.core.develop.LayoutTable;
import dev.sheetwright.dxf.Bounds;
import dev.sheetwright.dxf.BulgeArc;
import dev.sheetwright.dxf.Drawing;
import dev.sheetwright.dxf.Line;
import dev.sheetwright.dxf.Polyline;
import dev.sheetwright.dxf.Shape;
import dev.sheetwright.dxf.Text;
import dev.sheetwright.dxf.Vertex;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * {@code report.pdf}, the same content as {@code report.html}: summary pages (job, quote, warnings), one page per sheet
 * with the sheet drawn as vector paths (arcs as cubic Bézier curves, at most a quarter turn each) and labels, then the
 * part list, hand-layout dimensions and safety cautions. US letter, landscape.
 */
public final class ReportPdf {

    private static final PDRectangle PAGE = new PDRectangle(PDRectangle.LETTER.getHeight(),
            PDRectangle.LETTER.getWidth());
    private static final float MARGIN = 36;
    private static final float BODY = 9.5f;
    private static final float LEAD = 1.35f;

    /**
     * PDFBox talks through java.util.logging (font cache at INFO, "Using fallback font LiberationSans" for the
     * standard Helvetica at WARNING: it draws with the Liberation Sans metrics it ships). Users see only our own
     * messages; a PDFBox failure still reaches them as an exception.
     */
    private static final java.util.logging.Logger PDFBOX_LOG = quiet();

    private final PDDocument doc;
    private final PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    private final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    private PDPageContentStream out;
    private float y;

    private static java.util.logging.Logger quiet() {
        java.util.logging.Logger log = java.util.logging.Logger.getLogger("org.apache.pdfbox");
        log.setLevel(java.util.logging.Level.OFF);
        return log;
    }

    private ReportPdf(PDDocument doc) {
        this.doc = doc;
    }

    public static void write(ShopReport r, Path file) {
        try (PDDocument doc = new PDDocument()) {
            ReportPdf pdf = new ReportPdf(doc);
            pdf.render(r);
            doc.save(file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    private void render(ShopReport r) throws IOException {
        newPage();
        text(bold, 15, r.title());
        for (String f : r.facts()) {
            wrapped(regular, BODY, f);
        }
        gap();
        wrapped(bold, BODY, "Caution. " + r.cautions().get(0));
        heading("Quote");
        columns(r.stockHeader().toArray(new String[0]), r.stock(), new float[] {0, 150, 195, 265, 335, 420}, true);
        heading("Totals");
        columns(new String[] {"", "Value", "From"}, r.totals(), new float[] {0, 120, 250}, true);
        heading("Rates used");
        columns(new String[] {"Rate", "Value", "Source"}, r.rates(), new float[] {0, 160, 270}, true);
        if (!r.warnings().isEmpty()) {
            heading("Warnings");
            for (String w : r.warnings()) {
                wrapped(regular, BODY, "- " + w);
            }
        }
        if (!r.unplaced().isEmpty()) {
            heading("Not placed");
            for (String w : r.unplaced()) {
                wrapped(regular, BODY, "- " + w);
            }
        }
        for (ShopReport.SheetPage p : r.sheets()) {
            newPage();
            text(bold, 12, p.heading());
            float bottomText = 3 * BODY * LEAD;
            drawing(p.drawing(), MARGIN, MARGIN + bottomText, PAGE.getWidth() - 2 * MARGIN,
                    y - MARGIN - bottomText - 6);
            y = MARGIN + bottomText;
            wrapped(regular, 8, "Key: " + String.join("; ", p.parts()));
        }
        newPage();
        heading("Part list");
        columns(new String[] {"Fitting", "Piece", "Count", "Sheets"}, r.partList(), new float[] {0, 80, 200, 250},
                false);
        heading("Hand-layout dimensions");
        for (ShopReport.LayoutBlock b : r.layouts()) {
            need(4 * BODY * LEAD);
            text(bold, BODY, b.heading());
            columns(null, b.values(), new float[] {12, 230}, false);
            for (LayoutTable t : b.tables()) {
                wrapped(regular, BODY, t.label());
                List<String[]> rows = new ArrayList<>();
                for (List<Double> row : t.rows()) {
                    rows.add(row.stream().map(v -> String.format(Locale.ROOT, "%.4f", v)).toArray(String[]::new));
                }
                float[] xs = new float[t.columns().size()];
                for (int i = 0; i < xs.length; i++) {
                    xs[i] = 12 + 80 * i;
                }
                columns(t.columns().toArray(new String[0]), rows, xs, false);
            }
            gap();
        }
        heading("Safety");
        int i = 1;
        for (String c : r.cautions()) {
            wrapped(regular, BODY, (i++) + ". " + c);
        }
        out.close();
    }

    // ----- pages and text ----------------------------------------------------------------------------------------

    private void newPage() throws IOException {
        if (out != null) {
            out.close();
        }
        PDPage page = new PDPage(PAGE);
        doc.addPage(page);
        out = new PDPageContentStream(doc, page);
        y = PAGE.getHeight() - MARGIN;
    }

    private void need(float height) throws IOException {
        if (y - height < MARGIN) {
            newPage();
        }
    }

    private void gap() {
        y -= BODY * 0.6f;
    }

    private void heading(String s) throws IOException {
        need(4 * BODY * LEAD);
        y -= BODY * 0.6f;
        text(bold, 12, s);
    }

    private void text(PDType1Font font, float size, String s) throws IOException {
        need(size * LEAD);
        y -= size * LEAD;
        show(font, size, MARGIN, y, s);
    }

    private void show(PDType1Font font, float size, float x, float baseline, String s) throws IOException {
        out.beginText();
        out.setFont(font, size);
        out.newLineAtOffset(x, baseline);
        out.showText(encodable(font, s));
        out.endText();
    }

    private void wrapped(PDType1Font font, float size, String s) throws IOException {
        for (String line : wrap(font, size, encodable(font, s), PAGE.getWidth() - 2 * MARGIN)) {
            text(font, size, line);
        }
    }

    /** Rows of cells at the given x offsets; the last column wraps within the page. */
    private void columns(String[] header, List<String[]> rows, float[] xs, boolean lastWraps) throws IOException {
        if (header != null) {
            row(bold, header, xs, lastWraps);
        }
        for (String[] r : rows) {
            row(regular, r, xs, lastWraps);
        }
        gap();
    }

    private void row(PDType1Font font, String[] cells, float[] xs, boolean lastWraps) throws IOException {
        int last = cells.length - 1;
        float lastWidth = PAGE.getWidth() - 2 * MARGIN - xs[last];
        List<String> lastLines = lastWraps ? wrap(font, BODY, encodable(font, cells[last]), lastWidth)
                : List.of(encodable(font, cells[last]));
        need(lastLines.size() * BODY * LEAD);
        y -= BODY * LEAD;
        for (int i = 0; i < last; i++) {
            show(font, BODY, MARGIN + xs[i], y, cells[i]);
        }
        for (int k = 0; k < lastLines.size(); k++) {
            if (k > 0) {
                y -= BODY * LEAD;
            }
            show(font, BODY, MARGIN + xs[last], y, lastLines.get(k));
        }
    }

    private static List<String> wrap(PDType1Font font, float size, String s, float width) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : s.split(" ")) {
            String tryLine = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && font.getStringWidth(tryLine) / 1000 * size > width) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(tryLine);
            }
        }
        lines.add(line.toString());
        return lines;
    }

    /** The text with characters the standard font cannot encode replaced (minus sign to hyphen, others to '?'). */
    static String encodable(PDType1Font font, String s) {
        StringBuilder b = new StringBuilder();
        s.codePoints().forEach(cp -> {
            String c = new String(Character.toChars(cp == 0x2212 ? '-' : cp));
            try {
                font.encode(c);
                b.append(c);
            } catch (IOException | IllegalArgumentException e) {
                b.append('?');
            }
        });
        return b.toString();
    }

    // ----- drawings --------------------------------------------------------------------------------------------

    /** Draws a sheet fitted into the box (x, y, w, h) in page points, y up as in the drawing. */
    private void drawing(Drawing d, float bx, float by, float bw, float bh) throws IOException {
        Bounds e = d.extents();
        double s = Math.min(bw / e.width(), bh / e.height());
        double ox = bx + (bw - e.width() * s) / 2 - e.minX() * s;
        double oy = by + (bh - e.height() * s) / 2 - e.minY() * s;
        Mapping m = new Mapping(s, ox, oy);
        stroke(d, PatternDrawings.SHEET, 0.6f, 0.55f, m);
        stroke(d, PatternDrawings.MARK, 0.35f, 0.45f, m);
        stroke(d, PatternDrawings.CUT, 0.7f, 0f, m);
        out.setLineDashPattern(new float[] {2f, 2f}, 0);
        stroke(d, SheetDrawings.RAPID, 0.3f, 0.4f, m);
        out.setLineDashPattern(new float[] {}, 0);
        out.setNonStrokingColor(0.05f, 0.35f, 0.1f);
        for (Shape sh : d.shapes()) {
            if (sh instanceof Text t) {
                float size = (float) (t.height() * s / 0.72);
                show(regular, Math.max(size, 3f), (float) m.x(t.x()), (float) m.y(t.y()), t.value());
            }
        }
        out.setNonStrokingColor(0f, 0f, 0f);
    }

    private record Mapping(double s, double ox, double oy) {
        double x(double v) {
            return ox + v * s;
        }

        double y(double v) {
            return oy + v * s;
        }
    }

    private void stroke(Drawing d, String layer, float width, float grey, Mapping m) throws IOException {
        out.setLineWidth(width);
        out.setStrokingColor(grey, grey, grey);
        boolean any = false;
        for (Shape sh : d.shapes()) {
            if (!sh.layer().equals(layer)) {
                continue;
            }
            if (sh instanceof Polyline p) {
                path(p, m);
                any = true;
            } else if (sh instanceof Line l) {
                out.moveTo((float) m.x(l.x1()), (float) m.y(l.y1()));
                out.lineTo((float) m.x(l.x2()), (float) m.y(l.y2()));
                any = true;
            }
        }
        if (any) {
            out.stroke();
        }
    }

    private void path(Polyline p, Mapping m) throws IOException {
        List<Vertex> vs = p.vertices();
        out.moveTo((float) m.x(vs.get(0).x()), (float) m.y(vs.get(0).y()));
        int segments = p.closed() ? vs.size() : vs.size() - 1;
        for (int i = 0; i < segments; i++) {
            Vertex a = vs.get(i);
            Vertex b = vs.get((i + 1) % vs.size());
            if (a.bulge() == 0) {
                out.lineTo((float) m.x(b.x()), (float) m.y(b.y()));
            } else {
                for (double[] c : BulgeArc.of(a.x(), a.y(), b.x(), b.y(), a.bulge()).cubicBeziers()) {
                    out.curveTo((float) m.x(c[0]), (float) m.y(c[1]), (float) m.x(c[2]), (float) m.y(c[3]),
                            (float) m.x(c[4]), (float) m.y(c[5]));
                }
            }
        }
        if (p.closed()) {
            out.closePath();
        }
    }
}
