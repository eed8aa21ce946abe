package dev.sheetwright.core.geom;

import java.util.List;

/** One piece of a contour or mark: a straight line or a true circular arc. */
public sealed interface Edge permits Line, Arc {

    Point2 start();

    Point2 end();

    /** True length of the edge. */
    double length();

    /** Twice the signed area swept from the origin, {@code integral of (x dy - y dx)} along the edge. */
    double twiceSignedArea();

    /** The exact bounding box of the edge (arcs include the axis extremes they pass through). */
    Box2 bounds();

    Edge reversed();

    Edge transformed(Transform2 t);

    /**
     * Points along the edge from the start (included) towards the end (excluded) such that chords between them
     * stay within {@code chord} of the true edge.
     */
    List<Point2> flatten(double chord);
}
