package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheetwright.core.material.MaterialType;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.MethodSource;

@ParameterizedClass
@MethodSource("dev.sheetwright.inventory.TestRack#kinds")
class RemnantCsvTest {
    private static final Instant T0 = Instant.parse("2025-03-14T09:30:00Z");
    private static final String HEADER =
            "id,material,gauge,thickness_mm,width_mm,height_mm,outline,location,added,source,state\n";

    @Parameter
    TestRack.Kind kind;

    @TempDir
    Path dir;
    private final List<TestRack> racks = new ArrayList<>();

    /** A new empty rack on this run's backend, dropped after the test. */
    private TestRack rack(String name) {
        TestRack r = TestRack.make(kind, dir, name);
        racks.add(r);
        return r;
    }

    @AfterEach
    void drop() {
        racks.forEach(TestRack::close);
    }

    @Test
    void exportCsv_thenImportIntoEmptyStore_givesTheSameRecords() throws Exception {
        MutableClock clock = new MutableClock(T0);
        List<Remnant> original;
        StringWriter csv = new StringWriter();
        try (RemnantStore a = rack("a.db").open(clock)) {
            a.add(NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(1219.2, 762), "A1"));
            clock.advance(Duration.ofMinutes(5));
            a.add(new NewRemnant(MaterialType.STAINLESS, 18, 1.27,
                    RemnantOutline.parse("0,0 1000,0 1000,300.125 400,300.125 400,800 0,800"),
                    "rack \"B\", slot 3", RemnantSource.job("Smith, Kitchen", 2)));
            a.add(NewRemnant.manualMm(MaterialType.ALUMINUM, 0.8, RemnantOutline.rectangle(0.1, 1e-3), ""));
            a.add(NewRemnant.manual(MaterialType.STEEL, 16, RemnantOutline.rectangle(50, 50), "gone"));
            a.remove("R-0004");
            // R-0003 used by a plan, so the state column is exercised
            a.reserve(RemnantFilter.any().withMaterial(MaterialType.ALUMINUM), "p", Duration.ofMinutes(1));
            a.hold("p", "J-1", Set.of("R-0003"), List.of(), Duration.ofMinutes(1));
            a.commitPlan("p", "");
            a.exportCsv(csv);
            original = a.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID);
        }
        Path file = Files.writeString(dir.resolve("rack.csv"), csv.toString());

        try (RemnantStore b = rack("b.db").open(new MutableClock(T0.plusSeconds(86_400)))) {
            List<Remnant> imported = b.importCsv(file);

            assertEquals(original, imported);
            assertEquals(original, b.list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID));
            StringWriter again = new StringWriter();
            b.exportCsv(again);
            assertEquals(csv.toString(), again.toString());
        }
        assertTrue(csv.toString().startsWith(HEADER + "R-0001,galvanized,24,,1219.2,762,,A1,2025-03-14T09:30:00Z,"
                + "manual,available\n"), csv.toString());
        assertTrue(csv.toString().contains("R-0002,stainless,18,1.27,1000,800,"
                + "\"0,0 1000,0 1000,300.125 400,300.125 400,800 0,800\",\"rack \"\"B\"\", slot 3\","
                + "2025-03-14T09:35:00Z,\"job Smith, Kitchen sheet 2\",available\n"), csv.toString());
    }

    @Test
    void importCsv_rowsWithoutIds_getNewIdsAfterTheExplicitOnes() throws Exception {
        Path file = Files.writeString(dir.resolve("in.csv"), "material,gauge,width_mm,height_mm,id\n"
                + "galvanized,26,600,300,\n"
                + "steel,20,900,400,R-0001\n");
        try (RemnantStore store = rack("r.db").open()) {
            List<Remnant> imported = store.importCsv(file);

            assertEquals(List.of("R-0002", "R-0001"), RemnantStoreTest.ids(imported));
            assertEquals(MaterialType.GALVANIZED, store.get("R-0002").orElseThrow().material());
            assertEquals("R-0003", store.add(NewRemnant.manual(MaterialType.STEEL, 20,
                    RemnantOutline.rectangle(1, 1), "")).id());
        }
    }

    @Test
    void importCsv_badRow_importsNothingAndNamesRowAndColumn() throws Exception {
        TestRack db = rack("r.db");
        Path file = Files.writeString(dir.resolve("in.csv"), HEADER
                + ",galvanized,26,,600,300,,A1,,,\n"
                + ",steel,20,,-900,400,,A2,,,\n");
        try (RemnantStore store = db.open()) {
            store.add(NewRemnant.manual(MaterialType.STEEL, 20, RemnantOutline.rectangle(10, 10), ""));
            List<String> before = db.snapshot();

            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));

            assertEquals(file + " row 3, column width_mm: -900.0 is out of range; must be > 0 and at most 100000 mm",
                    e.getMessage());
            assertEquals(before, db.snapshot());
        }
    }

    @Test
    void importCsv_badCells_nameTheirColumns() throws Exception {
        assertImportError(",copper,26,,600,300,,,,,\n", "row 2, column material: material 'copper' is not"
                + " known; valid words: galvanized, steel, stainless, aluminum (or aluminium)");
        assertImportError(",steel,,,600,300,,,,,\n", "row 2, column gauge/thickness_mm: both are missing;"
                + " give a gauge or a thickness");
        assertImportError(",steel,99,,600,300,,,,,\n", "row 2, column gauge: 99 is out of range; must be 1 to 38");
        assertImportError(",steel,20,abc,600,300,,,,,\n", "row 2, column thickness_mm: 'abc' is not a number");
        assertImportError(",steel,20,,,,\"0,0 10,10 10,0 0,10\",,,,\n", "row 2, column outline: 0,0 10,10 10,0"
                + " 0,10 is not a simple polygon (self-intersection at (5,5)); edges must not cross or touch");
        assertImportError(",steel,20,,11,10,\"0,0 10,0 10,10\",,,,\n",
                "row 2, column width_mm: 11 does not match the outline's 10 mm; leave it empty or correct it");
        assertImportError(",steel,20,,600,,,,,,\n",
                "row 2, column height_mm: is empty; a rectangle needs width_mm and height_mm");
        assertImportError(",steel,20,,600,300,,,yesterday,,\n", "row 2, column added: 'yesterday' is not an"
                + " ISO-8601 date (2025-03-14) or instant (2025-03-14T09:30:00Z)");
        assertImportError(",steel,20,,600,300,,,,,lost\n",
                "row 2, column state: unknown state 'lost'; expected one of available | reserved | used");
        assertImportError("X-1,steel,20,,600,300,,,,,\n", "row 2, column id: 'X-1' is not a remnant id;"
                + " expected R- followed by a number from 1, e.g. R-0042");
        assertImportError(",steel,20,,600,300,,,\n", "row 2: has 9 cells but the header has 11");
        assertImportError("R-0005,steel,20,,600,300,,,,,\nR-0005,steel,20,,600,300,,,,,\n",
                "row 3, column id: R-0005 appears twice in the file");
    }

    @Test
    void importCsv_idIssuedBefore_isRefused() throws Exception {
        TestRack db = rack("r.db");
        Path file = Files.writeString(dir.resolve("in.csv"), HEADER + "R-0001,steel,20,,600,300,,,,,\n");
        try (RemnantStore store = db.open()) {
            store.add(NewRemnant.manual(MaterialType.STEEL, 20, RemnantOutline.rectangle(10, 10), ""));
            IllegalArgumentException inUse = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));
            assertEquals(file + " row 2, column id: R-0001 is already in " + db.shown(), inUse.getMessage());

            store.remove("R-0001");
            IllegalArgumentException reused = assertThrows(IllegalArgumentException.class,
                    () -> store.importCsv(file));
            assertEquals(file + " row 2, column id: R-0001 was issued before and removed; ids are never reused"
                    + " (leave the cell empty)", reused.getMessage());
        }
    }

    @Test
    void importCsv_unknownHeaderColumn_isRefused() throws Exception {
        Path file = Files.writeString(dir.resolve("in.csv"), "material,colour\nsteel,red\n");
        try (RemnantStore store = rack("r.db").open()) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));
            assertEquals(file + " row 1, column 2: unknown column 'colour'; expected some of id, material, gauge,"
                    + " thickness_mm, width_mm, height_mm, outline, location, added, source, state", e.getMessage());
        }
    }

    @Test
    void importCsv_missingFile_isBadInput() {
        try (RemnantStore store = rack("r.db").open()) {
            Path missing = dir.resolve("nope.csv");
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(missing));
            assertEquals("csv: no such file " + missing, e.getMessage());
        }
    }

    @Test
    void importCsv_binaryFile_isBadInputNamingTheByteAndNothingChanges() throws Exception {
        TestRack db = rack("r.db");
        byte[] bytes = "material,gauge,width_mm,height_mm\nsteel,20,600,300\n".getBytes(StandardCharsets.UTF_8);
        byte[] binary = java.util.Arrays.copyOf(bytes, bytes.length + 4);
        binary[bytes.length] = (byte) 0xC3;
        binary[bytes.length + 1] = (byte) 0x28;
        Path file = Files.write(dir.resolve("in.csv"), binary);
        try (RemnantStore store = db.open()) {
            List<String> before = db.snapshot();
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));
            assertEquals(file + ": is not UTF-8 text (byte offset " + bytes.length + ", line 3); save the sheet as"
                    + " CSV UTF-8", e.getMessage());
            assertEquals(before, db.snapshot());
        }
    }

    @Test
    void importCsv_latin1Location_isRefusedAsNotUtf8() throws Exception {
        TestRack db = rack("r.db");
        String header = "material,gauge,width_mm,height_mm,location\n";
        String before = "steel,20,600,300,Gie";
        Path file = Files.write(dir.resolve("in.csv"),
                (header + before + "\u00dferei\n").getBytes(StandardCharsets.ISO_8859_1));
        try (RemnantStore store = db.open()) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));
            assertEquals(file + ": is not UTF-8 text (byte offset " + (header.length() + before.length())
                    + ", line 2); save the sheet as CSV UTF-8",
                    e.getMessage());
        }
    }

    private void assertImportError(String row, String expected) throws Exception {
        TestRack db = rack("err.db");
        Path file = Files.writeString(dir.resolve("err.csv"), HEADER + row);
        try (RemnantStore store = db.open()) {
            List<String> before = db.snapshot();
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> store.importCsv(file));
            assertEquals(file + " " + expected, e.getMessage());
            assertEquals(before, db.snapshot());
        }
    }
}
