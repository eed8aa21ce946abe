package dev.sheetwright.dxf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DxfWriterTest {

    /** Golden file of {@link Fixtures#tiny()}; rewrite it with {@code -Dsheetwright.updateGoldens=true}. */
    private static final Path GOLDEN = Path.of("src/test/resources/dev/sheetwright/dxf/tiny.dxf");

    @TempDir
    Path dir;

    private static List<Layer> layers() {
        return List.of(Fixtures.CUT, Fixtures.MARK);
    }

    @Test
    void write_tinyDrawing_matchesGoldenFileByteForByte() throws IOException {
        byte[] written = DxfWriter.toDxf(Fixtures.tiny()).getBytes(StandardCharsets.US_ASCII);
        if (Boolean.getBoolean("sheetwright.updateGoldens")) {
            Files.write(GOLDEN, written);
        }
        assertArrayEquals(Files.readAllBytes(GOLDEN), written,
                "differs from " + GOLDEN + "; if the change is intended, rerun with -Dsheetwright.updateGoldens=true"
                        + " and review the diff");
    }

    @Test
    void write_tinyDrawing_headerTablesAndEntitiesInOrder() {
        List<GroupPairs.Pair> pairs = GroupPairs.read(DxfWriter.toDxf(Fixtures.tiny()));
        assertEquals(List.of("HEADER", "TABLES", "BLOCKS", "ENTITIES"), GroupPairs.values(pairs, 2).stream()
                .filter(v -> v.equals("HEADER") || v.equals("TABLES") || v.equals("BLOCKS") || v.equals("ENTITIES"))
                .toList());
        assertEquals(4, GroupPairs.count(pairs, "ENDSEC"));
        assertEquals(1, GroupPairs.count(pairs, "POLYLINE"));
        assertEquals(4, GroupPairs.count(pairs, "VERTEX"));
        assertEquals(1, GroupPairs.count(pairs, "SEQEND"));
        assertEquals(1, GroupPairs.count(pairs, "LINE"));
        assertEquals(1, GroupPairs.count(pairs, "TEXT"));
        assertEquals(List.of("0.25"), GroupPairs.values(pairs, 42).stream().filter(v -> !v.equals("2.5")).toList(),
                "one bulge; 2.5 is the STANDARD style's last height");
        // the top edge's arc rises 5 above the chord at y = 20 (sagitta = bulge x chord / 2, computed)
        String text = DxfWriter.toDxf(Fixtures.tiny());
        assertTrue(text.contains("$EXTMAX\r\n 10\r\n40\r\n 20\r\n25\r\n"), "true extents include the arc");
        assertTrue(text.startsWith("999\r\ndrawing units: mm (1 unit = 1 millimetre)\r\n  0\r\nSECTION\r\n"),
                "millimetres said in a comment");
    }

    @Test
    void write_underGermanLocale_sameText() {
        String english = DxfWriter.toDxf(Fixtures.coneAndPlate());
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals(english, DxfWriter.toDxf(Fixtures.coneAndPlate()));
        } finally {
            Locale.setDefault(before);
        }
        assertFalse(english.matches("(?s).*\\d,\\d.*"), "no decimal comma");
        assertFalse(english.matches("(?s).*\\dE-?\\d.*"), "no exponent");
    }

    @Test
    void write_everyLine_endsWithCrlfAndIsAscii() {
        String text = DxfWriter.toDxf(Fixtures.coneAndPlate());
        assertEquals(text.split("\r\n", -1).length - 1, text.split("\n", -1).length - 1, "no bare LF");
        assertTrue(text.chars().allMatch(c -> c == '\r' || c == '\n' || (c >= 0x20 && c <= 0x7E)));
        assertFalse(text.startsWith("\uFEFF"), "no byte order mark");
    }

    @Test
    void write_inchDrawing_unitInComment_noLaterReleaseVariables() {
        Drawing inches = Drawing.of("in", List.of(Fixtures.CUT), List.of(Fixtures.circle("CUT", 0, 0, 3)));
        String text = DxfWriter.toDxf(inches);
        assertTrue(text.startsWith("999\r\ndrawing units: in (1 unit = 1 inch)\r\n"), "inches said in a comment");
        assertEquals(DrawingUnit.INCH, DrawingUnit.fromDxfComment(text.split("\r\n")[1]));
        // AC1009 has no $INSUNITS or $MEASUREMENT (they came with later releases)
        assertFalse(text.contains("$INSUNITS"));
        assertFalse(text.contains("$MEASUREMENT"));
    }

    @Test
    void write_labelWithGroupCodeInjection_staysOneTextEntity() {
        Drawing d = Drawing.of("mm", List.of(Fixtures.CUT, Fixtures.LABEL), List.of(Fixtures.circle("CUT", 0, 0, 5),
                new Text("LABEL", 0, 0, 2, "P1\r\n  0\r\nEOF\r\n  0\r\nLINE\n%%d^J\u00E9")));
        List<GroupPairs.Pair> pairs = GroupPairs.read(DxfWriter.toDxf(d));
        assertEquals(1, GroupPairs.count(pairs, "TEXT"));
        assertEquals(1, GroupPairs.count(pairs, "EOF"));
        assertEquals(0, GroupPairs.count(pairs, "LINE"));
        assertEquals(List.of("P1??  0??EOF??  0??LINE?%d^ Je"), GroupPairs.values(pairs, 1).stream()
                .filter(v -> v.startsWith("P1")).toList());
    }

    @Test
    void write_layerTable_listsLayerZeroOnceAndEveryDeclaredLayer() {
        List<GroupPairs.Pair> pairs = GroupPairs.read(DxfWriter.toDxf(Fixtures.tiny()));
        assertEquals(4, GroupPairs.count(pairs, "LAYER"), "0, CUT, MARK, LABEL");
        Drawing zero = Drawing.of("mm", List.of(Layer.of("0", 2)), List.of(Fixtures.circle("0", 0, 0, 1)));
        String text = DxfWriter.toDxf(zero);
        assertTrue(text.contains("  2\r\nLAYER\r\n 70\r\n1\r\n  0\r\nLAYER\r\n  2\r\n0\r\n 70\r\n0\r\n 62\r\n2\r\n"),
                "a declared layer 0 keeps its colour and is listed once");
    }

    @Test
    void stateMachine_misuse_throwsExactMessages() {
        DxfWriter fresh = new DxfWriter(new StringWriter());
        assertEquals("header(...) must be written before the first shape", assertThrows(IllegalStateException.class,
                () -> fresh.shape(Fixtures.circle("CUT", 0, 0, 1))).getMessage());
        assertEquals("header(...) must be written before finish()",
                assertThrows(IllegalStateException.class, fresh::finish).getMessage());

        DxfWriter started = new DxfWriter(new StringWriter()).header(DrawingUnit.MILLIMETRE, layers(), Bounds.of(0, 0));
        assertEquals("header(...) can be written only once, before any shape", assertThrows(
                IllegalStateException.class,
                () -> started.header(DrawingUnit.MILLIMETRE, layers(), Bounds.of(0, 0))).getMessage());
        started.finish();
        assertEquals("finish() was already called", assertThrows(IllegalStateException.class,
                started::finish).getMessage());
        assertEquals("no shape can follow finish(): the file already ends with EOF", assertThrows(
                IllegalStateException.class, () -> started.shape(Fixtures.circle("CUT", 0, 0, 1))).getMessage());
        started.close();
        assertEquals("the DxfWriter is closed", assertThrows(IllegalStateException.class,
                () -> started.shape(Fixtures.circle("CUT", 0, 0, 1))).getMessage());
    }

    @Test
    void shape_layerNotInHeader_rejected() {
        DxfWriter dxf = new DxfWriter(new StringWriter()).header(DrawingUnit.MILLIMETRE, layers(), Bounds.of(0, 0));
        assertEquals("shape layer \"LABEL\" is not one of the header's layers [CUT, MARK]", assertThrows(
                IllegalArgumentException.class, () -> dxf.shape(new Text("LABEL", 0, 0, 1, "x"))).getMessage());
    }

    @Test
    void streaming_sameShapes_sameTextAsWholeDrawing() {
        Drawing d = Fixtures.coneAndPlate();
        StringWriter out = new StringWriter();
        try (DxfWriter dxf = new DxfWriter(out)) {
            dxf.header(d.units(), d.layers(), d.extents());
            d.shapes().forEach(dxf::shape);
            dxf.finish();
        }
        assertEquals(DxfWriter.toDxf(d), out.toString());
    }

    @Test
    void write_toPath_leavesOnlyTheTargetFile() throws IOException {
        Path target = dir.resolve("sheet-01.dxf");
        DxfWriter.write(Fixtures.coneAndPlate(), target);
        assertEquals(List.of(target), listing());
        assertEquals(DxfWriter.toDxf(Fixtures.coneAndPlate()), Files.readString(target, StandardCharsets.US_ASCII));
    }

    @Test
    void write_toPath_replacesAnExistingFile() throws IOException {
        Path target = dir.resolve("sheet-01.dxf");
        Files.writeString(target, "old contents");
        DxfWriter.write(Fixtures.tiny(), target);
        assertEquals(DxfWriter.toDxf(Fixtures.tiny()), Files.readString(target));
        assertEquals(List.of(target), listing());
    }

    @Test
    void write_toPathThatIsAFolder_failsAndLeavesNoTemporaryFile() throws IOException {
        Path target = Files.createDirectory(dir.resolve("taken.dxf"));
        Files.writeString(target.resolve("keep.txt"), "x");
        UncheckedIOException e = assertThrows(UncheckedIOException.class,
                () -> DxfWriter.write(Fixtures.tiny(), target));
        assertTrue(e.getMessage().startsWith("cannot write " + target.toAbsolutePath()), e.getMessage());
        assertEquals(List.of(target), listing());
        assertEquals("x", Files.readString(target.resolve("keep.txt")));
    }

    @Test
    void write_toMissingFolder_failsWithUncheckedIoException() {
        Path target = dir.resolve("no-such-folder").resolve("a.dxf");
        assertThrows(UncheckedIOException.class, () -> DxfWriter.write(Fixtures.tiny(), target));
        assertFalse(Files.exists(target.getParent()));
    }

    private List<Path> listing() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }
}
