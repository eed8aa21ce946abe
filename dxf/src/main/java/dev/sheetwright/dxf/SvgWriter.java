package dev.sheetwright.dxf;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Writes a {@link Drawing} as a standalone SVG 1.1 preview (UTF-8, LF line ends).
 *
 * <ul>
 *   <li>The viewBox is the drawing's {@link Drawing#extents() extents} plus a margin (a fraction of the drawing
 *       size, the larger of width and height; one drawing unit stands for the size of a drawing without extent).
 *       {@code width} and {@code height} carry the drawing's unit ({@code mm} or {@code in}), so the preview
 *       prints at true scale and keeps its aspect.</li>
 *   <li>Geometry sits in a group with {@code transform="scale(1,-1)"}, so path data are the drawing's own
 *       coordinates and +y points up. One {@code <path>} per polyline or line; a bulge becomes an {@code A}
 *       command with radius {@code chord / (2 sin(2 atan|b|))}, large-arc flag {@code |b| > 1} and sweep flag 1
 *       for {@code b > 0}: inside the flipped group the positive-angle direction is the drawing's
 *       counter-clockwise.</li>
 *   <li>Texts sit outside that group at {@code (x, -y)}, so they read upright; font size is the text height
 *       divided by {@value #CAP_HEIGHT_PER_EM}, a usual cap-height-to-em ratio of sans-serif fonts.</li>
 *   <li>Each layer is drawn with its {@link SvgStyle}: layers without one use {@link SvgStyle#cut()}. A style with
 *       a fill adds, under the layer's lines, one path with all closed polylines of the layer and
 *       {@code fill-rule="evenodd"}, so holes show.</li>
 *   <li>Text is XML-escaped; characters XML 1.0 cannot carry (control characters, unpaired surrogates) become
 *       {@code ?}.</li>
 * </ul>
 *
 * <p>Instances are immutable; {@code style(...)} and {@code margin(...)} return a changed copy.
 *
 * <pre>{@code
 * SvgWriter.create().style("MARK", SvgStyle.mark()).style("CUT", SvgStyle.filledPart())
 *          .write(drawing, Path.of("sheet-01.svg"));
 * }</pre>
 */
public final class SvgWriter {

    static final double CAP_HEIGHT_PER_EM = 0.7;
    static final double DEFAULT_MARGIN = 0.02;
    private static final String NL = "\n";

    private final Map<String, SvgStyle> styles;
    private final double margin;

    private SvgWriter(Map<String, SvgStyle> styles, double margin) {
        this.styles = Map.copyOf(styles);
        this.margin = margin;
    }

    /** A writer with no layer styles (every layer drawn as {@link SvgStyle#cut()}) and a 2 % margin. */
    public static SvgWriter create() {
        return new SvgWriter(Map.of(), DEFAULT_MARGIN);
    }

    /** A copy that draws {@code layer} with {@code style}. */
    public SvgWriter style(String layer, SvgStyle style) {
        Checks.notNull("layer", layer);
        Checks.notNull("style", style);
        Map<String, SvgStyle> copy = new HashMap<>(styles);
        copy.put(layer, style);
        return new SvgWriter(copy, margin);
    }

    /** A copy with another margin around the extents, as a fraction of the drawing size, in [0, 0.5]. */
    public SvgWriter margin(double fraction) {
        if (!(fraction >= 0 && fraction <= 0.5)) {
            throw new IllegalArgumentException("margin must be in [0, 0.5], got " + fraction);
        }
        return new SvgWriter(styles, fraction);
    }

    /** The style {@code layer} is drawn with. */
    public SvgStyle styleOf(String layer) {
        return styles.getOrDefault(layer, SvgStyle.cut());
    }

    /** The area the preview shows, in drawing coordinates (+y up): the extents plus the margin. */
    public Bounds viewArea(Drawing drawing) {
        return drawing.extents().expand(margin * size(drawing.extents()));
    }

    /** The drawing as SVG text. */
    public String toSvg(Drawing drawing) {
        StringWriter text = new StringWriter();
        write(drawing, text);
        return text.toString();
    }

    /** Writes the drawing to {@code file} atomically (temporary file in the same directory, then moved). */
    public void write(Drawing drawing, Path file) {
        Checks.notNull("drawing", drawing);
        AtomicFiles.write(file, StandardCharsets.UTF_8, out -> write(drawing, out));
    }

    /** Writes the drawing to {@code out} (not closed) and flushes it. */
    public void write(Drawing drawing, Writer out) {
        Checks.notNull("drawing", drawing);
        Checks.notNull("out", out);
        Bounds extents = drawing.extents();
        double size = size(extents);
        Bounds view = viewArea(drawing);
        String unit = drawing.units().symbol();
        StringBuilder svg = new StringBuilder();
        svg.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>").append(NL);
        svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\"")
                .append(" width=\"").append(num(view.width())).append(unit).append('"')
                .append(" height=\"").append(num(view.height())).append(unit).append('"')
                .append(" viewBox=\"").append(num(view.minX())).append(' ').append(num(-view.maxY())).append(' ')
                .append(num(view.width())).append(' ').append(num(view.height())).append("\">").append(NL);
        svg.append("<g transform=\"scale(1,-1)\" fill=\"none\" stroke-linecap=\"round\" stroke-linejoin=\"round\">")
                .append(NL);
        for (Layer layer : drawing.layers()) {
            geometry(svg, layer.name(), styleOf(layer.name()), drawing.shapes(), size);
        }
        svg.append("</g>").append(NL);
        StringBuilder texts = new StringBuilder();
        for (Layer layer : drawing.layers()) {
            for (Shape shape : drawing.shapes()) {
                if (shape instanceof Text t && t.layer().equals(layer.name())) {
                    texts.append("<text data-layer=\"").append(layer.name()).append("\" x=\"").append(num(t.x()))
                            .append("\" y=\"").append(num(-t.y())).append("\" font-size=\"")
                            .append(num(t.height() / CAP_HEIGHT_PER_EM)).append("\" fill=\"")
                            .append(styleOf(layer.name()).stroke()).append("\">").append(xml(t.value()))
                            .append("</text>").append(NL);
                }
            }
        }
        if (texts.length() > 0) {
            svg.append("<g font-family=\"sans-serif\" stroke=\"none\">").append(NL).append(texts).append("</g>")
                    .append(NL);
        }
        svg.append("</svg>").append(NL);
        try {
            out.write(svg.toString());
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void geometry(StringBuilder svg, String layer, SvgStyle style, List<Shape> shapes, double size) {
        StringBuilder fill = new StringBuilder();
        StringBuilder lines = new StringBuilder();
        for (Shape shape : shapes) {
            if (!shape.layer().equals(layer)) {
                continue;
            }
            if (shape instanceof Polyline p) {
                String d = pathData(p);
                lines.append("<path d=\"").append(d).append("\"/>").append(NL);
                if (p.closed()) {
                    fill.append(fill.length() > 0 ? " " : "").append(d);
                }
            } else if (shape instanceof Line l) {
                lines.append("<path d=\"M ").append(num(l.x1())).append(' ').append(num(l.y1())).append(" L ")
                        .append(num(l.x2())).append(' ').append(num(l.y2())).append("\"/>").append(NL);
            }
        }
        if (lines.length() == 0) {
            return;
        }
        svg.append("<g data-layer=\"").append(layer).append("\" stroke=\"").append(style.stroke())
                .append("\" stroke-width=\"").append(num(style.strokeWidth() * size)).append('"');
        if (style.dash() > 0) {
            String dash = num(style.dash() * size);
            svg.append(" stroke-dasharray=\"").append(dash).append(' ').append(dash).append('"');
        }
        svg.append('>').append(NL);
        if (style.filled() && fill.length() > 0) {
            svg.append("<path fill=\"").append(style.fill()).append("\" fill-rule=\"evenodd\" stroke=\"none\" d=\"")
                    .append(fill).append("\"/>").append(NL);
        }
        svg.append(lines).append("</g>").append(NL);
    }

    /** {@code M x y}, then {@code L} or {@code A} per segment, {@code Z} when closed. */
    static String pathData(Polyline p) {
        List<Vertex> vs = p.vertices();
        StringBuilder d = new StringBuilder("M ").append(num(vs.get(0).x())).append(' ').append(num(vs.get(0).y()));
        for (int i = 0; i < p.segmentCount(); i++) {
            Vertex a = vs.get(i);
            Vertex b = p.next(i);
            if (a.bulge() == 0) {
                d.append(" L ");
            } else {
                String r = num(p.arc(i).radius);
                d.append(" A ").append(r).append(' ').append(r).append(" 0 ")
                        .append(Math.abs(a.bulge()) > 1 ? '1' : '0').append(' ')
                        .append(a.bulge() > 0 ? '1' : '0').append(' ');
            }
            d.append(num(b.x())).append(' ').append(num(b.y()));
        }
        if (p.closed()) {
            d.append(" Z");
        }
        return d.toString();
    }

    private static double size(Bounds extents) {
        double size = Math.max(extents.width(), extents.height());
        return size > 0 ? size : 1;
    }

    private static String num(double v) {
        return Ordinates.length(v);
    }

    /** XML-escaped text; characters XML 1.0 cannot carry become {@code ?}. */
    static String xml(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        text.codePoints().forEach(cp -> {
            switch (cp) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&apos;");
                default -> {
                    boolean bad = cp < 0x20 || (cp >= 0x7F && cp <= 0x9F) || Character.getType(cp) == Character.SURROGATE
                            || cp == 0xFFFE || cp == 0xFFFF;
                    if (bad) {
                        sb.append('?');
                    } else {
                        sb.appendCodePoint(cp);
                    }
                }
            }
        });
        return sb.toString();
    }
}
