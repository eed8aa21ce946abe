package dev.sheetwright.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A test-side reader of the sheet DXF files, independent of the writer: closed POLYLINEs (vertices and bulges) and
 * TEXT entities, each with its layer.
 */
record SheetDxf(List<Outline> polylines, List<Label> texts) {

    record Outline(String layer, List<double[]> vertices, List<Double> bulges) {
    }

    record Label(String layer, double x, double y, String value) {
    }

    static SheetDxf read(Path file) {
        List<String> lines;
        try {
            lines = Files.readAllLines(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<String[]> pairs = new ArrayList<>();
        for (int i = 0; i + 1 < lines.size(); i += 2) {
            pairs.add(new String[] {lines.get(i).strip(), lines.get(i + 1).strip()});
        }
        List<Outline> polylines = new ArrayList<>();
        List<Label> texts = new ArrayList<>();
        for (int i = 0; i < pairs.size(); i++) {
            if (!pairs.get(i)[0].equals("0")) {
                continue;
            }
            String type = pairs.get(i)[1];
            if (type.equals("POLYLINE")) {
                String layer = value(pairs, i, "8");
                List<double[]> vs = new ArrayList<>();
                List<Double> bulges = new ArrayList<>();
                int j = i + 1;
                while (!(pairs.get(j)[0].equals("0") && pairs.get(j)[1].equals("SEQEND"))) {
                    if (pairs.get(j)[0].equals("0") && pairs.get(j)[1].equals("VERTEX")) {
                        vs.add(new double[] {Double.parseDouble(value(pairs, j, "10")),
                            Double.parseDouble(value(pairs, j, "20"))});
                        String b = value(pairs, j, "42");
                        bulges.add(b == null ? 0.0 : Double.parseDouble(b));
                    }
                    j++;
                }
                polylines.add(new Outline(layer, vs, bulges));
            } else if (type.equals("TEXT")) {
                texts.add(new Label(value(pairs, i, "8"), Double.parseDouble(value(pairs, i, "10")),
                        Double.parseDouble(value(pairs, i, "20")), value(pairs, i, "1")));
            }
        }
        return new SheetDxf(polylines, texts);
    }

    /** The value of {@code code} in the entity starting at pair {@code start}, or null. */
    private static String value(List<String[]> pairs, int start, String code) {
        for (int i = start + 1; i < pairs.size() && !pairs.get(i)[0].equals("0"); i++) {
            if (pairs.get(i)[0].equals(code)) {
                return pairs.get(i)[1];
            }
        }
        return null;
    }
}
