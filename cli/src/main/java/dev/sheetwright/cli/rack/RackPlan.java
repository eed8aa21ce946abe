package dev.sheetwright.cli.rack;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.core.material.MaterialType;
import dev.sheetwright.core.units.LengthUnit;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A nest's plan against the remnant rack, written into {@code nest.json} under {@code plan} and read back by
 * {@code sheetwright commit}. Lengths are in the job's unit.
 *
 * @param id            the plan id (a random UUID), as the inventory knows it
 * @param inventory     the rack the plan was made against: its file, or its server URL without a password
 * @param job           the job name, for the offcuts' source
 * @param unit          the job's unit
 * @param material      the job's material
 * @param gauge         the job's gauge, or null when it is given by thickness
 * @param thicknessMm   the job's thickness in mm
 * @param reservedUntil when the reservation of {@code remnantsUsed} runs out
 * @param remnantsUsed  ids of the rack remnants the nest cuts
 * @param offcuts       the new offcuts to record at commit, each with the id already etched on its sheet
 * @param minOffcut     the smallest offcut recorded
 */
public record RackPlan(String id, String inventory, String job, LengthUnit unit, MaterialType material, Integer gauge,
        double thicknessMm, Instant reservedUntil, List<String> remnantsUsed, List<PlannedOffcut> offcuts,
        MinOffcut minOffcut) {

    /**
     * A new offcut: the clean rectangle left on sheet {@code sheet} (from 1), in that sheet's coordinates.
     */
    public record PlannedOffcut(String id, int sheet, double x, double y, double width, double height) {
    }

    public RackPlan {
        remnantsUsed = List.copyOf(remnantsUsed);
        offcuts = List.copyOf(offcuts);
    }

    /**
     * Opens the rack this plan holds remnants in: {@code inventory} when given (an {@code --inventory} value), else
     * the one it was made against (whose password, if any, comes from PGPASSWORD or ~/.pgpass).
     */
    public dev.sheetwright.inventory.RemnantStore openRack(String inventory) {
        return dev.sheetwright.inventory.RemnantStore.open(dev.sheetwright.cli.mixin.InventoryOption.locate(
                inventory != null ? inventory : this.inventory), false);
    }

    /** The offcut planned for sheet {@code sheet} (from 1), or null. */
    public PlannedOffcut offcutOfSheet(int sheet) {
        return offcuts.stream().filter(o -> o.sheet() == sheet).findFirst().orElse(null);
    }

    /** The {@code plan} object of nest.json. */
    public Map<String, Object> toJson() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("id", id);
        m.put("inventory", inventory);
        m.put("job", job);
        m.put("units", unit.symbol());
        Map<String, Object> mat = new LinkedHashMap<>();
        mat.put("type", material.word());
        if (gauge != null) {
            mat.put("gauge", gauge);
        }
        mat.put("thicknessMm", thicknessMm);
        m.put("material", mat);
        m.put("reservedUntil", reservedUntil.toString());
        m.put("remnantsUsed", remnantsUsed);
        List<Object> os = new ArrayList<>();
        for (PlannedOffcut o : offcuts) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("id", o.id());
            e.put("sheet", o.sheet());
            e.put("x", o.x());
            e.put("y", o.y());
            e.put("width", o.width());
            e.put("height", o.height());
            os.add(e);
        }
        m.put("offcuts", os);
        Map<String, Object> min = new LinkedHashMap<>();
        min.put("width", minOffcut.width());
        min.put("area", minOffcut.area());
        m.put("minOffcut", min);
        return m;
    }

    /**
     * Reads the plan from {@code OUT/nest.json}.
     *
     * @throws IllegalArgumentException naming the file and the field when it is missing, has no plan or is damaged
     */
    public static RackPlan read(Path outFolder) {
        Path file = outFolder.resolve("nest.json");
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException(outFolder + ": no nest.json there; give the folder a nest wrote");
        }
        JsonNode doc;
        try {
            doc = new ObjectMapper().readTree(file.toFile());
        } catch (IOException e) {
            throw new IllegalArgumentException(file + ": not readable JSON (" + e.getMessage() + ")", e);
        }
        JsonNode p = doc.path("plan");
        if (p.isMissingNode() || p.isNull()) {
            throw new IllegalArgumentException(file + ": has no plan; nest with --use-remnants, --remnant,"
                    + " --inventory or --commit to plan against the rack");
        }
        try {
            LengthUnit unit = LengthUnit.parse(text(p, "units"));
            JsonNode mat = p.path("material");
            List<String> used = new ArrayList<>();
            for (JsonNode n : array(p, "remnantsUsed")) {
                used.add(n.asText());
            }
            List<PlannedOffcut> offcuts = new ArrayList<>();
            for (JsonNode o : array(p, "offcuts")) {
                offcuts.add(new PlannedOffcut(text(o, "id"), (int) number(o, "sheet"), number(o, "x"), number(o, "y"),
                        number(o, "width"), number(o, "height")));
            }
            JsonNode min = p.path("minOffcut");
            return new RackPlan(text(p, "id"), text(p, "inventory"), text(p, "job"), unit,
                    MaterialType.parse(text(mat, "type")), mat.has("gauge") ? (int) number(mat, "gauge") : null,
                    number(mat, "thicknessMm"), Instant.parse(text(p, "reservedUntil")), used, offcuts,
                    new MinOffcut(number(min, "width"), number(min, "area")));
        } catch (IllegalArgumentException | DateTimeParseException e) {
            throw new IllegalArgumentException(file + ": plan: " + e.getMessage(), e);
        }
    }

    private static String text(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (!v.isTextual() || v.asText().isBlank()) {
            throw new IllegalArgumentException(field + " is missing or not a text");
        }
        return v.asText();
    }

    private static double number(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (!v.isNumber()) {
            throw new IllegalArgumentException(field + " is missing or not a number");
        }
        return v.asDouble();
    }

    private static JsonNode array(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (!v.isArray()) {
            throw new IllegalArgumentException(field + " is missing or not a list");
        }
        return v;
    }
}
