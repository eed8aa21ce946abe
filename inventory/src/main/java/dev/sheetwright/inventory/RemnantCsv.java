package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads and writes the inventory's CSV form (RFC 4180 quoting, UTF-8, header row). Package-private;
 * reached through {@link RemnantStore#importCsv} and {@link RemnantStore#exportCsv}.
 *
 * <p>Columns: {@code id, material, gauge, thickness_mm, width_mm, height_mm, outline, location, added,
 * source, state}. {@code outline} holds polygon corners {@code "x1,y1 x2,y2 ..."} in mm and is empty for
 * rectangles, which are given by width and height. On import only {@code material}, a gauge or thickness,
 * and a size (width and height, or an outline) are required; the header may list the columns in any order.
 */
final class RemnantCsv {
    static final List<String> HEADER = List.of("id", "material", "gauge", "thickness_mm", "width_mm", "height_mm",
            "outline", "location", "added", "source", "state");
    /** An outline's bounding box and the row's width/height cells must agree within this, mm. */
    static final double SIZE_AGREEMENT_MM = 0.01;

    private RemnantCsv() {
    }

    /** One parsed data row; {@code number} counts rows as a spreadsheet does (header = 1). */
    record Row(int number, Long seq, NewRemnant remnant, Instant added, RemnantState state) {
    }

    static void write(List<Remnant> remnants, Writer out) {
        try {
            out.write(String.join(",", HEADER));
            out.write('\n');
            for (Remnant r : remnants) {
                List<String> cells = List.of(r.id(), r.material().word(),
                        r.gauge() == null ? "" : Integer.toString(r.gauge()),
                        r.thicknessMm() == null ? "" : MmFormat.format(r.thicknessMm()),
                        MmFormat.format(r.widthMm()), MmFormat.format(r.heightMm()),
                        r.outline().isRectangle() ? "" : r.outline().toText(),
                        r.location(), r.added().toString(), r.source().text(), r.state().word());
                for (int i = 0; i < cells.size(); i++) {
                    if (i > 0) {
                        out.write(',');
                    }
                    out.write(quote(cells.get(i)));
                }
                out.write('\n');
            }
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException("export: cannot write CSV: " + e.getMessage(), e);
        }
    }

    private static String quote(String cell) {
        boolean needs = cell.indexOf(',') >= 0 || cell.indexOf('"') >= 0 || cell.indexOf('\n') >= 0
                || cell.indexOf('\r') >= 0 || !cell.equals(cell.strip());
        return needs ? '"' + cell.replace("\"", "\"\"") + '"' : cell;
    }

    static List<Row> read(Path csv, Clock clock) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(csv);
        } catch (NoSuchFileException e) {
            throw new IllegalArgumentException("csv: no such file " + csv);
        } catch (IOException e) {
            throw new UncheckedIOException("csv: cannot read " + csv + ": " + e.getMessage(), e);
        }
        String text = utf8Text(csv, bytes);
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        List<List<String>> records = split(text, csv);
        if (records.isEmpty()) {
            throw new IllegalArgumentException(csv + " row 1: the file is empty; expected a header row "
                    + String.join(",", HEADER));
        }
        Map<String, Integer> column = new HashMap<>();
        List<String> header = records.get(0);
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i).strip().toLowerCase(Locale.ROOT);
            if (!HEADER.contains(name)) {
                throw new IllegalArgumentException(csv + " row 1, column " + (i + 1) + ": unknown column '"
                        + header.get(i) + "'; expected some of " + String.join(", ", HEADER));
            }
            if (column.put(name, i) != null) {
                throw new IllegalArgumentException(csv + " row 1, column " + name + ": appears twice");
            }
        }
        if (!column.containsKey("material")) {
            throw new IllegalArgumentException(csv + " row 1, column material: missing from the header");
        }
        Instant now = clock.instant().truncatedTo(ChronoUnit.SECONDS);
        List<Row> rows = new ArrayList<>();
        for (int r = 1; r < records.size(); r++) {
            List<String> cells = records.get(r);
            int number = r + 1;
            if (cells.size() == 1 && cells.get(0).isBlank()) {
                continue;
            }
            if (cells.size() != header.size()) {
                throw new IllegalArgumentException(csv + " row " + number + ": has " + cells.size()
                        + " cells but the header has " + header.size());
            }
            rows.add(new RowReader(csv, number, cells, column).read(now));
        }
        return rows;
    }

    /**
     * The file's text, refusing bytes that are not UTF-8 text (and NUL bytes, which no CSV text has) with the byte
     * offset and line of the first one.
     */
    private static String utf8Text(Path csv, byte[] bytes) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult result = decoder.decode(in, out, true);
        int bad = result.isError() ? in.position() : -1;
        for (int i = 0; i < bytes.length && (bad < 0 || i < bad); i++) {
            if (bytes[i] == 0) {
                bad = i;
                break;
            }
        }
        if (bad >= 0) {
            int line = 1;
            for (int i = 0; i < bad; i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw new IllegalArgumentException(csv + ": is not UTF-8 text (byte offset " + bad + ", line " + line
                    + "); save the sheet as CSV UTF-8");
        }
        decoder.flush(out);
        return out.flip().toString();
    }

    /** Reads the cells of one row, naming the row and column in every error. */
    private static final class RowReader {
        private final Path csv;
        private final int number;
        private final List<String> cells;
        private final Map<String, Integer> column;
        private String current = "";

        RowReader(Path csv, int number, List<String> cells, Map<String, Integer> column) {
            this.csv = csv;
            this.number = number;
            this.cells = cells;
            this.column = column;
        }

        Row read(Instant now) {
            try {
                String id = cell("id");
                Long seq = id.isEmpty() ? null : RemnantId.parse(id);
                MaterialType material = MaterialType.parse(cell("material"));
                String g = cell("gauge");
                Integer gauge = g.isEmpty() ? null : parseInt(g);
                String t = cell("thickness_mm");
                Double thickness = t.isEmpty() ? null : parseDouble(t);
                String w = cell("width_mm");
                Double width = w.isEmpty() ? null : parseDouble(w);
                String h = cell("height_mm");
                Double height = h.isEmpty() ? null : parseDouble(h);
                String o = cell("outline");
                RemnantOutline outline;
                if (o.isEmpty()) {
                    current = width == null ? "width_mm" : "height_mm";
                    if (width == null || height == null) {
                        throw new IllegalArgumentException("is empty; a rectangle needs width_mm and height_mm");
                    }
                    current = "width_mm/height_mm";
                    outline = RemnantOutline.rectangle(width, height);
                } else {
                    outline = RemnantOutline.parse(o);
                    current = "width_mm";
                    checkAgrees(width, outline.widthMm());
                    current = "height_mm";
                    checkAgrees(height, outline.heightMm());
                }
                String location = cell("location");
                String a = cell("added");
                Instant added = a.isEmpty() ? now : parseInstant(a);
                String s = cell("source");
                RemnantSource source = s.isEmpty() ? RemnantSource.manual() : RemnantSource.parse(s);
                String st = cell("state");
                RemnantState state = st.isEmpty() ? RemnantState.AVAILABLE : RemnantState.parse(st);
                current = "gauge/thickness_mm";
                NewRemnant remnant = new NewRemnant(material, gauge, thickness, outline, location, source);
                return new Row(number, seq, remnant, added, state);
            } catch (IllegalArgumentException e) {
                String message = e.getMessage();
                int colon = message.indexOf(": ");
                if (colon > 0 && (current.contains("/") || message.startsWith(current + ": "))
                        && HEADER.stream().anyMatch(message.substring(0, colon)::contains)) {
                    current = message.substring(0, colon);
                    message = message.substring(colon + 2);
                } else if (colon > 0 && message.substring(0, colon).equals("outline")) {
                    message = message.substring(colon + 2);
                }
                throw new IllegalArgumentException(csv + " row " + number + ", column " + current + ": "
                        + message, e);
            }
        }

        private String cell(String name) {
            current = name;
            Integer i = column.get(name);
            return i == null ? "" : cells.get(i).strip();
        }

        private void checkAgrees(Double given, double fromOutline) {
            if (given != null && Math.abs(given - fromOutline) > SIZE_AGREEMENT_MM) {
                throw new IllegalArgumentException(MmFormat.format(given) + " does not match the outline's "
                        + MmFormat.format(fromOutline) + " mm; leave it empty or correct it");
            }
        }

        private static int parseInt(String s) {
            try {
                return Integer.parseInt(s);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + s + "' is not a whole number");
            }
        }

        private static double parseDouble(String s) {
            try {
                return Double.parseDouble(s);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("'" + s + "' is not a number");
            }
        }

        private static Instant parseInstant(String s) {
            try {
                return s.length() == 10 ? LocalDate.parse(s).atStartOfDay(ZoneOffset.UTC).toInstant()
                        : Instant.parse(s).truncatedTo(ChronoUnit.SECONDS);
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("'" + s + "' is not an ISO-8601 date (2025-03-14) or"
                        + " instant (2025-03-14T09:30:00Z)");
            }
        }
    }

    /** Splits RFC 4180 text into records of cells; quoted cells may hold commas, quotes and line breaks. */
    private static List<List<String>> split(String text, Path csv) {
        List<List<String>> records = new ArrayList<>();
        List<String> cells = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        boolean any = false;
        int i = 0;
        while (i < text.length()) {
            char c = text.charAt(i);
            any = true;
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                        cell.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    cell.append(c);
                }
            } else if (c == '"' && cell.toString().isBlank()) {
                cell.setLength(0);
                quoted = true;
            } else if (c == ',') {
                cells.add(cell.toString());
                cell.setLength(0);
            } else if (c == '\r' || c == '\n') {
                if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                cells.add(cell.toString());
                cell.setLength(0);
                records.add(cells);
                cells = new ArrayList<>();
                any = false;
            } else {
                cell.append(c);
            }
            i++;
        }
        if (quoted) {
            throw new IllegalArgumentException(csv + " row " + (records.size() + 1)
                    + ": a quoted cell is not closed before the end of the file");
        }
        if (any) {
            cells.add(cell.toString());
            records.add(cells);
        }
        return records;
    }
}
