package dev.sheetwright.nest.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import dev.sheetwright.nest.model.Coil;
import dev.sheetwright.nest.model.NestResult;
import dev.sheetwright.nest.model.Placement;
import dev.sheetwright.nest.model.SheetLayout;

/**
 * Layouts published for the strip instances. Convention: rotate the item polygon counter-clockwise by angleDeg about
 * its own (0, 0), then translate by (x, y), which is also {@link Placement}'s convention.
 */
public final class PublishedLayouts {
    private PublishedLayouts() {
    }

    /** One placement of an item type. */
    public record Item(int itemId, double angleDeg, double x, double y) {
    }

    /** One published layout. */
    public record Layout(String instance, String algorithm, double declaredStripLength, List<Item> placements) {
        public Layout {
            placements = List.copyOf(placements);
        }

        /**
         * This layout as a nest result on the instance's strip: copies are numbered per item type in the order
         * they appear; the used length is the declared strip length or the largest x reached, whichever is larger.
         */
        public NestResult toResult(StripInstance instance) {
            Map<Integer, Integer> next = new HashMap<>();
            List<Placement> parts = new ArrayList<>();
            double maxX = 0;
            Map<Integer, StripInstance.Item> items = new HashMap<>();
            for (StripInstance.Item i : instance.items()) {
                items.put(i.id(), i);
            }
            for (Item p : placements) {
                int copy = next.merge(p.itemId(), 1, Integer::sum) - 1;
                Placement pl = new Placement(instance.name(), StripInstance.pieceName(p.itemId()), copy, p.x(), p.y(), p.angleDeg(), false);
                parts.add(pl);
                StripInstance.Item it = items.get(p.itemId());
                if (it != null) {
                    maxX = Math.max(maxX, pl.apply(it.polygon()).getEnvelopeInternal().getMaxX());
                }
            }
            Coil strip = (Coil) instance.toRequest().stock().get(0);
            double used = Math.max(maxX, declaredStripLength);
            return new NestResult(List.of(new SheetLayout(strip, 0, used, parts, null,
                    Math.min(1, instance.itemArea() / (used * instance.stripHeight())))), List.of());
        }
    }

    public static List<Layout> read(Path file) {
        try {
            JsonNode root = new ObjectMapper().readTree(file.toFile());
            List<Layout> out = new ArrayList<>();
            for (JsonNode l : root) {
                List<Item> items = new ArrayList<>();
                for (JsonNode p : l.get("placements")) {
                    items.add(new Item(p.get("itemId").asInt(), p.get("angleDeg").asDouble(), p.get("x").asDouble(), p.get("y").asDouble()));
                }
                out.add(new Layout(l.get("instance").asText(), l.get("algorithm").asText(), l.get("declaredStripLength").asDouble(), items));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read published layouts " + file + ": " + e.getMessage(), e);
        }
    }
}
