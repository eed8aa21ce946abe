package dev.sheetwright.core.geom;

/** A mark line on a pattern: one line or arc of a given kind, moved with the pattern, never cut. */
public record Mark(MarkKind kind, Edge edge) {

    public Mark {
        if (kind == null || edge == null) {
            throw new IllegalArgumentException("mark kind and edge must not be null");
        }
    }

    public Mark transformed(Transform2 t) {
        return new Mark(kind, edge.transformed(t));
    }
}
