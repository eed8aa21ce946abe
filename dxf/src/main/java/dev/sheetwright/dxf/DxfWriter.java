package dev.sheetwright.dxf;

import java.io.Closeable;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Writes DXF R12 (AC1009) text: a 999 comment naming the drawing unit ({@link DrawingUnit#dxfComment()}), HEADER, TABLES (LTYPE, LAYER, STYLE), an empty BLOCKS section, ENTITIES and EOF,
 * without handles and without extrusion. Polylines become POLYLINE / VERTEX (group 42 = bulge when not 0) /
 * SEQEND, lines LINE, texts TEXT in style STANDARD.
 *
 * <p>Output is byte-stable: every line ends with CRLF ({@value #LINE_END_NAME}, as AutoCAD writes it), group codes
 * are right-aligned in three columns, numbers are written the same in every locale with at most 6 decimals (bulges
 * 10) and never an exponent, and text is reduced to printable ASCII (see {@link #write(Drawing, Path)}), so a label
 * cannot break the code/value structure.
 *
 * <p>The writer is a small state machine: {@link #header} once, then any number of {@link #shape} calls, then
 * {@link #finish}. Calls out of that order throw {@link IllegalStateException}. {@link #write(Drawing, Writer)} and
 * {@link #write(Drawing, Path)} do all three for a whole {@link Drawing}; the header extents are then the drawing's
 * exact {@link Drawing#extents() extents}. Write errors are thrown as {@link UncheckedIOException}.
 *
 * <pre>{@code
 * DxfWriter.write(drawing, Path.of("sheet-01.dxf"));          // whole drawing, atomic
 * try (DxfWriter dxf = new DxfWriter(writer)) {                // streaming
 *     dxf.header(DrawingUnit.MILLIMETRE, layers, extents);
 *     for (Shape s : shapes) dxf.shape(s);
 *     dxf.finish();
 * }
 * }</pre>
 */
public final class DxfWriter implements Closeable {

    /** Line ending of every line written. */
    public static final String LINE_END = "\r\n";
    static final String LINE_END_NAME = "CRLF";

    static final String HEADER_TWICE = "header(...) can be written only once, before any shape";
    static final String SHAPE_BEFORE_HEADER = "header(...) must be written before the first shape";
    static final String SHAPE_AFTER_FINISH = "no shape can follow finish(): the file already ends with EOF";
    static final String FINISH_BEFORE_HEADER = "header(...) must be written before finish()";
    static final String FINISH_TWICE = "finish() was already called";
    static final String CLOSED = "the DxfWriter is closed";

    private static final String LAYER_ZERO = "0";
    private static final int LAYER_ZERO_COLOR = 7;

    private enum State { START, ENTITIES, FINISHED, CLOSED }

    private final Writer out;
    private State state = State.START;
    private final Set<String> layerNames = new LinkedHashSet<>();

    /** A writer that writes to {@code out}; {@link #close()} closes {@code out}. */
    public DxfWriter(Writer out) {
        this.out = Checks.notNull("out", out);
    }

    /** Writes a whole drawing to {@code out} (not closed) and flushes it. */
    public static void write(Drawing drawing, Writer out) {
        Checks.notNull("drawing", drawing);
        DxfWriter dxf = new DxfWriter(out);
        dxf.header(drawing.units(), drawing.layers(), drawing.extents());
        for (Shape shape : drawing.shapes()) {
            dxf.shape(shape);
        }
        dxf.finish();
    }

    /**
     * Writes a whole drawing to {@code file} atomically: into a temporary file in the same directory, then moved
     * over {@code file}, so a reader never sees half a file. The bytes are ASCII (a subset of ANSI_1252).
     */
    public static void write(Drawing drawing, Path file) {
        Checks.notNull("drawing", drawing);
        AtomicFiles.write(file, StandardCharsets.US_ASCII, out -> write(drawing, out));
    }

    /** The whole drawing as DXF text. */
    public static String toDxf(Drawing drawing) {
        StringWriter text = new StringWriter();
        write(drawing, text);
        return text.toString();
    }

    /**
     * Writes HEADER, TABLES and BLOCKS and opens ENTITIES. The LAYER table lists layer "0" (colour 7 unless
     * declared) and then every declared layer; {@code extents} become {@code $EXTMIN/$EXTMAX} and
     * {@code $LIMMIN/$LIMMAX}.
     */
    public DxfWriter header(DrawingUnit units, List<Layer> layers, Bounds extents) {
        requireOpen();
        if (state != State.START) {
            throw new IllegalStateException(HEADER_TWICE);
        }
        Checks.notNull("units", units);
        List<Layer> declared = Checks.copy("layers", layers);
        Checks.notNull("extents", extents);
        List<Layer> table = new ArrayList<>();
        if (declared.stream().noneMatch(l -> l.name().equals(LAYER_ZERO))) {
            table.add(Layer.of(LAYER_ZERO, LAYER_ZERO_COLOR));
        }
        table.addAll(declared);
        for (Layer layer : declared) {
            if (!layerNames.add(layer.name())) {
                throw new IllegalArgumentException("layers declares layer \"" + layer.name() + "\" twice");
            }
        }

        pair(999, units.dxfComment()); // R12 has no unit header variable; the unit is said in a comment
        section("HEADER");
        variable("$ACADVER", 1, "AC1009");
        variable("$DWGCODEPAGE", 3, "ANSI_1252");
        pointVariable("$INSBASE", 0, 0, true);
        pointVariable("$EXTMIN", extents.minX(), extents.minY(), true);
        pointVariable("$EXTMAX", extents.maxX(), extents.maxY(), true);
        pointVariable("$LIMMIN", extents.minX(), extents.minY(), false);
        pointVariable("$LIMMAX", extents.maxX(), extents.maxY(), false);
        variable("$LUNITS", 70, "2"); // decimal display; R12 has no unit variable
        variable("$LUPREC", 70, "4");
        pair(0, "ENDSEC");

        section("TABLES");
        table("LTYPE", 1);
        pair(0, "LTYPE");
        pair(2, "CONTINUOUS");
        pair(70, "0");
        pair(3, "Solid line");
        pair(72, "65");
        pair(73, "0");
        pair(40, "0");
        pair(0, "ENDTAB");
        table("LAYER", table.size());
        for (Layer layer : table) {
            pair(0, "LAYER");
            pair(2, layer.name());
            pair(70, "0");
            pair(62, Integer.toString(layer.color()));
            pair(6, "CONTINUOUS");
        }
        pair(0, "ENDTAB");
        table("STYLE", 1);
        pair(0, "STYLE");
        pair(2, "STANDARD");
        pair(70, "0");
        pair(40, "0");
        pair(41, "1");
        pair(50, "0");
        pair(71, "0");
        pair(42, "2.5");
        pair(3, "txt");
        pair(4, "");
        pair(0, "ENDTAB");
        pair(0, "ENDSEC");

        section("BLOCKS");
        pair(0, "ENDSEC");
        section("ENTITIES");
        state = State.ENTITIES;
        return this;
    }

    /** Writes one entity; its layer must be one of the layers given to {@link #header}. */
    public DxfWriter shape(Shape shape) {
        requireOpen();
        if (state == State.START) {
            throw new IllegalStateException(SHAPE_BEFORE_HEADER);
        }
        if (state == State.FINISHED) {
            throw new IllegalStateException(SHAPE_AFTER_FINISH);
        }
        Checks.notNull("shape", shape);
        if (!layerNames.contains(shape.layer())) {
            throw new IllegalArgumentException("shape layer \"" + shape.layer()
                    + "\" is not one of the header's layers " + layerNames);
        }
        if (shape instanceof Polyline p) {
            polyline(p);
        } else if (shape instanceof Line l) {
            line(l);
        } else {
            text((Text) shape); // Shape is sealed: Polyline, Line, Text
        }
        return this;
    }

    /** Closes ENTITIES, writes EOF and flushes; the underlying writer stays open until {@link #close()}. */
    public void finish() {
        requireOpen();
        if (state == State.START) {
            throw new IllegalStateException(FINISH_BEFORE_HEADER);
        }
        if (state == State.FINISHED) {
            throw new IllegalStateException(FINISH_TWICE);
        }
        pair(0, "ENDSEC");
        pair(0, "EOF");
        state = State.FINISHED;
        try {
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Closes the underlying writer. A writer closed before {@link #finish()} leaves an incomplete file. */
    @Override
    public void close() {
        if (state == State.CLOSED) {
            return;
        }
        state = State.CLOSED;
        try {
            out.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void polyline(Polyline p) {
        pair(0, "POLYLINE");
        pair(8, p.layer());
        pair(66, "1");
        point(10, 0, 0);
        pair(70, p.closed() ? "1" : "0");
        for (Vertex v : p.vertices()) {
            pair(0, "VERTEX");
            pair(8, p.layer());
            point(10, v.x(), v.y());
            String bulge = Ordinates.bulge(v.bulge());
            if (!bulge.equals("0")) {
                pair(42, bulge);
            }
            pair(70, "0");
        }
        pair(0, "SEQEND");
        pair(8, p.layer());
    }

    private void line(Line l) {
        pair(0, "LINE");
        pair(8, l.layer());
        point(10, l.x1(), l.y1());
        point(11, l.x2(), l.y2());
    }

    private void text(Text t) {
        pair(0, "TEXT");
        pair(8, t.layer());
        point(10, t.x(), t.y());
        pair(40, Ordinates.length(t.height()));
        pair(1, AsciiLabels.forDxf(t.value()));
        pair(7, "STANDARD");
    }

    private void section(String name) {
        pair(0, "SECTION");
        pair(2, name);
    }

    private void table(String name, int entries) {
        pair(0, "TABLE");
        pair(2, name);
        pair(70, Integer.toString(entries));
    }

    private void variable(String name, int code, String value) {
        pair(9, name);
        pair(code, value);
    }

    private void pointVariable(String name, double x, double y, boolean withZ) {
        pair(9, name);
        pair(10, Ordinates.length(x));
        pair(20, Ordinates.length(y));
        if (withZ) {
            pair(30, "0");
        }
    }

    /** Codes {@code base}, {@code base + 10} and {@code base + 20} (z = 0). */
    private void point(int base, double x, double y) {
        pair(base, Ordinates.length(x));
        pair(base + 10, Ordinates.length(y));
        pair(base + 20, "0");
    }

    private void pair(int code, String value) {
        if (value.indexOf('\r') >= 0 || value.indexOf('\n') >= 0) { // guard: values are built above, never raw
            throw new IllegalArgumentException("DXF value for group " + code + " must not hold a line break");
        }
        try {
            out.write(code < 10 ? "  " : code < 100 ? " " : "");
            out.write(Integer.toString(code));
            out.write(LINE_END);
            out.write(value);
            out.write(LINE_END);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void requireOpen() {
        if (state == State.CLOSED) {
            throw new IllegalStateException(CLOSED);
        }
    }
}
