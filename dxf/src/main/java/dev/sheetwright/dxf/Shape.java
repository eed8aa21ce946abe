package dev.sheetwright.dxf;

/** Something drawn on one layer. The set of shapes is closed so that every writer handles each of them. */
public sealed interface Shape permits Polyline, Line, Text {

    /** Name of the layer the shape is drawn on; must be declared in the {@link Drawing}. */
    String layer();

    /** Exact bounding box; arcs count with their extreme points, a text with its insertion point only. */
    Bounds bounds();
}
