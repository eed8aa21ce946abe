package dev.sheetwright.cli.output;

import dev.sheetwright.core.develop.LayoutTable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * {@code report.html}: one self-contained page (inline CSS and SVG, no scripts, nothing fetched). On paper each sheet
 * picture starts a new page.
 */
public final class ReportHtml {

    private static final String CSS = String.join("\n",
            "@page { size: letter landscape; margin: 12mm; }",
            "body { font: 10.5pt/1.4 'DejaVu Sans', Arial, sans-serif; color: #111; margin: 0 auto; max-width: 1120px;"
                    + " padding: 16px; }",
            "h1 { font-size: 17pt; margin: 0 0 4px; } h2 { font-size: 13pt; margin: 18px 0 6px;"
                    + " border-bottom: 2px solid #333; } h3 { font-size: 11pt; margin: 12px 0 4px; }",
            "p.fact { margin: 1px 0; }",
            "table { border-collapse: collapse; margin: 4px 0 10px; }",
            "th, td { border-bottom: 1px solid #bbb; padding: 3px 9px; text-align: left; vertical-align: top; }",
            "th { background: #eee; } td.n, th.n { text-align: right; font-variant-numeric: tabular-nums; }",
            "td.src { color: #444; font-size: 9pt; }",
            ".caution { border: 2px solid #a00; padding: 6px 10px; margin: 8px 0; }",
            ".warnings li { color: #7a3e00; }",
            "section.sheet { break-before: page; page-break-before: always; }",
            "section.sheet figure { margin: 0; } section.sheet svg { display: block; width: 100%; height: auto;"
                    + " max-height: 150mm; border: 1px solid #888; background: #fff; }",
            "section.sheet p.labels { font-size: 9pt; color: #333; }",
            "section.back { break-before: page; page-break-before: always; }",
            ".layout { display: inline-block; vertical-align: top; margin: 0 18px 8px 0; }",
            "@media print { body { max-width: none; padding: 0; font-size: 9.5pt; }"
                    + " section.sheet { break-inside: avoid; page-break-inside: avoid; }"
                    + " .layout, table { break-inside: avoid; page-break-inside: avoid; } }");

    private ReportHtml() {
    }

    public static String html(ShopReport r) {
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(esc(r.title())).append("</title>\n<style>\n").append(CSS).append("\n</style>\n</head>\n<body>\n");
        h.append("<header>\n<h1>").append(esc(r.title())).append("</h1>\n");
        for (String f : r.facts()) {
            h.append("<p class=\"fact\">").append(esc(f)).append("</p>\n");
        }
        h.append("<p class=\"caution\"><strong>Caution.</strong> ").append(esc(r.cautions().get(0)))
                .append("</p>\n</header>\n");

        h.append("<section id=\"quote\">\n<h2>Quote</h2>\n");
        table(h, r.stockHeader(), r.stock(),
                new boolean[] {false, true, true, true, true, false});
        h.append("<h3>Totals</h3>\n");
        table(h, List.of("", "Value", "From"), r.totals(), new boolean[] {false, true, false});
        h.append("<h3>Rates used</h3>\n");
        table(h, List.of("Rate", "Value", "Source"), r.rates(), new boolean[] {false, true, false});
        if (!r.warnings().isEmpty()) {
            h.append("<h3>Warnings</h3>\n<ul class=\"warnings\">\n");
            r.warnings().forEach(w -> h.append("<li>").append(esc(w)).append("</li>\n"));
            h.append("</ul>\n");
        }
        if (!r.unplaced().isEmpty()) {
            h.append("<h3>Not placed</h3>\n<ul class=\"warnings\">\n");
            r.unplaced().forEach(w -> h.append("<li>").append(esc(w)).append("</li>\n"));
            h.append("</ul>\n");
        }
        h.append("</section>\n");

        for (ShopReport.SheetPage p : r.sheets()) {
            h.append("<section class=\"sheet\" id=\"sheet-").append(p.number()).append("\">\n<h2>")
                    .append(esc(p.heading())).append("</h2>\n<figure>\n")
                    .append(inlineSvg(SheetDrawings.svgWriter().toSvg(p.drawing())))
                    .append("</figure>\n<p class=\"labels\">Key: ").append(esc(String.join("; ", p.parts())))
                    .append("</p>\n</section>\n");
        }

        h.append("<section class=\"back\" id=\"parts\">\n<h2>Part list</h2>\n");
        table(h, List.of("Fitting", "Piece", "Count", "Sheets"), r.partList(),
                new boolean[] {false, false, true, false});
        h.append("<h2>Hand-layout dimensions</h2>\n");
        for (ShopReport.LayoutBlock b : r.layouts()) {
            h.append("<div class=\"layout\">\n<h3>").append(esc(b.heading())).append("</h3>\n");
            table(h, List.of("Dimension", "Value"), b.values(), new boolean[] {false, true});
            for (LayoutTable t : b.tables()) {
                h.append("<p>").append(esc(t.label())).append("</p>\n<table>\n<tr>");
                t.columns().forEach(c -> h.append("<th class=\"n\">").append(esc(c)).append("</th>"));
                h.append("</tr>\n");
                for (List<Double> row : t.rows()) {
                    h.append("<tr>");
                    row.forEach(v -> h.append("<td class=\"n\">").append(String.format(Locale.ROOT, "%.4f", v))
                            .append("</td>"));
                    h.append("</tr>\n");
                }
                h.append("</table>\n");
            }
            h.append("</div>\n");
        }
        h.append("<h2>Safety</h2>\n<ol>\n");
        r.cautions().forEach(c -> h.append("<li>").append(esc(c)).append("</li>\n"));
        h.append("</ol>\n</section>\n</body>\n</html>\n");
        return h.toString();
    }

    public static void write(ShopReport r, Path file) {
        try {
            Files.writeString(file, html(r), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    /** An SVG document made fit for inlining: no XML declaration; CSS sets its size. */
    static String inlineSvg(String svg) {
        String s = svg.startsWith("<?xml") ? svg.substring(svg.indexOf("?>") + 2).stripLeading() : svg;
        return s.replaceFirst("<svg ", "<svg role=\"img\" preserveAspectRatio=\"xMidYMid meet\" ");
    }

    private static void table(StringBuilder h, List<String> header, List<String[]> rows,
                              boolean[] numeric) {
        h.append("<table>\n<tr>");
        for (int i = 0; i < header.size(); i++) {
            h.append(numeric[i] ? "<th class=\"n\">" : "<th>").append(esc(header.get(i))).append("</th>");
        }
        h.append("</tr>\n");
        for (String[] row : rows) {
            h.append("<tr>");
            for (int i = 0; i < row.length; i++) {
                String cls = numeric[i] ? " class=\"n\"" : i == row.length - 1 && row.length == 3 ? " class=\"src\"" : "";
                h.append("<td").append(cls).append('>').append(esc(row[i])).append("</td>");
            }
            h.append("</tr>\n");
        }
        h.append("</table>\n");
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
