package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.time.Instant;
import org.locationtech.jts.geom.Polygon;

/**
 * A remnant as recorded in the store.
 *
 * @param id            the label id, e.g. {@code R-0042}; unique and never reused
 * @param material      the material
 * @param gauge         the gauge, or null
 * @param thicknessMm   the thickness in mm, or null (at least one of gauge and thickness is set)
 * @param outline       the shape, mm
 * @param location      where it is kept (possibly empty)
 * @param added         when it was recorded (UTC, to the second)
 * @param source        where it came from
 * @param state         available, reserved or used
 * @param reservedBy    the plan id holding it, or null when not reserved
 * @param reservedUntil when that reservation expires, or null when not reserved
 */
public record Remnant(String id, MaterialType material, Integer gauge, Double thicknessMm, RemnantOutline outline,
                      String location, Instant added, RemnantSource source, RemnantState state, String reservedBy,
                      Instant reservedUntil) {
    public Remnant {
        RemnantId.parse(id);
        // Reuse NewRemnant's checks for the shared fields.
        new NewRemnant(material, gauge, thicknessMm, outline, location, source);
        location = location == null ? "" : location.strip();
        if (added == null || state == null) {
            throw new IllegalArgumentException("added/state: must not be null");
        }
        if ((state == RemnantState.RESERVED) != (reservedBy != null && reservedUntil != null)) {
            throw new IllegalArgumentException("state: " + state.word() + " does not agree with reservation "
                    + reservedBy + " until " + reservedUntil + "; only a reserved remnant has an owner and expiry");
        }
    }

    /** The outline as a new JTS polygon, mm. */
    public Polygon polygon() {
        return outline.toPolygon();
    }

    /** Bounding-box width, mm. */
    public double widthMm() {
        return outline.widthMm();
    }

    /** Bounding-box height, mm. */
    public double heightMm() {
        return outline.heightMm();
    }

    /** Area, mm². */
    public double areaMm2() {
        return outline.areaMm2();
    }

    /** True when it is free to be planned at {@code now}: available, or reserved with an expired lease. */
    public boolean isFreeAt(Instant now) {
        return state == RemnantState.AVAILABLE
                || (state == RemnantState.RESERVED && !reservedUntil.isAfter(now));
    }
}
