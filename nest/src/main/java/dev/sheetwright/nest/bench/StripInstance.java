package dev.sheetwright.nest.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestPiece;
import dev.sheetwright.nest.model.NestRequest;
import dev.sheetwright.nest.model.NestRules;
import dev.sheetwright.nest.model.RotationRule;

/**
 * A strip-packing benchmark instance (fixed strip height, minimise length): name, strip height, allowed rotations
 * (null = any angle) and item types with quantities and outer rings.
 */
public record StripInstance(String name, double stripHeight, List<Double> allowedRotationsDeg, List<Item> items) {
    private static final GeometryFactory GF = new GeometryFactory();

    /** An item type: id, number of copies, outline. */
    public record Item(int id, int quantity, Polygon polygon) {
        public Item {
            if (quantity < 1) {
                throw new IllegalArgumentException("quantity of item " + id + " must be >= 1, got " + quantity);
            }
            if (polygon == null || !(polygon.getArea() > 0)) {
                throw new IllegalArgumentException("polygon of item " + id + " must have area > 0");
            }
        }
    }

    public StripInstance {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("name must be non-blank, got " + name);
        }
        if (!(stripHeight > 0) || Double.isInfinite(stripHeight)) {
            throw new IllegalArgumentException("stripHeight must be finite and > 0, got " + stripHeight);
        }
        allowedRotationsDeg = allowedRotationsDeg == null ? null : List.copyOf(allowedRotationsDeg);
        items = List.copyOf(items);
        if (items.isEmpty()) {
            throw new IllegalArgumentException("items must not be empty");
        }
    }

    public static StripInstance read(Path file) {
        try {
            return fromJson(new ObjectMapper().readTree(file.toFile()));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read strip instance " + file + ": " + e.getMessage(), e);
        }
    }

    static StripInstance fromJson(JsonNode root) {
        for (String field : new String[] {"name", "stripHeight", "items"}) {
            if (root == null || !root.hasNonNull(field)) {
                throw new IllegalArgumentException("strip instance must have the field '" + field + "'; this file has not");
            }
        }
        List<Double> rot = null;
        JsonNode r = root.get("allowedRotationsDeg");
        if (r != null && !r.isNull()) {
            rot = new ArrayList<>();
            for (JsonNode a : r) {
                rot.add(a.asDouble());
            }
        }
        List<Item> items = new ArrayList<>();
        for (JsonNode it : root.get("items")) {
            items.add(new Item(it.get("id").asInt(), it.get("quantity").asInt(), ring(it.get("polygon"))));
        }
        return new StripInstance(root.get("name").asText(), root.get("stripHeight").asDouble(), rot, items);
    }

    static Polygon ring(JsonNode pts) {
        Coordinate[] cs = new Coordinate[pts.size() + 1];
        for (int i = 0; i < pts.size(); i++) {
            cs[i] = new Coordinate(pts.get(i).get(0).asDouble(), pts.get(i).get(1).asDouble());
        }
        cs[pts.size()] = cs[0].copy();
        return GF.createPolygon(cs);
    }

    public int pieceCount() {
        return items.stream().mapToInt(Item::quantity).sum();
    }

    public double itemArea() {
        return items.stream().mapToDouble(i -> i.quantity() * i.polygon().getArea()).sum();
    }

    /** Label used as the piece name of an item type. */
    public static String pieceName(int itemId) {
        return "item" + itemId;
    }

    public RotationRule rotationRule() {
        return allowedRotationsDeg == null ? RotationRule.free() : new RotationRule.Angles(allowedRotationsDeg);
    }

    /** The instance as a nesting request: one coil as tall as the strip, gap 0, margin 0, no mirroring. */
    public NestRequest toRequest() {
        List<NestPiece> pieces = new ArrayList<>();
        for (Item i : items) {
            pieces.add(new NestPiece(name, pieceName(i.id()), i.quantity(), i.polygon()));
        }
        return new NestRequest(pieces, List.of(new Coil(name + "-strip", stripHeight, 1.0)), NestRules.touching(rotationRule()));
    }
}
