/**
 * A small, trade-neutral drawing model and the two writers that export it.
 *
 * <p>What belongs here: the drawing values ({@link dev.sheetwright.dxf.Drawing}, {@link dev.sheetwright.dxf.Layer},
 * {@link dev.sheetwright.dxf.Shape} with {@link dev.sheetwright.dxf.Polyline}, {@link dev.sheetwright.dxf.Line} and
 * {@link dev.sheetwright.dxf.Text}, {@link dev.sheetwright.dxf.Vertex}, {@link dev.sheetwright.dxf.Bounds}), the
 * DXF R12 (AC1009) writer {@link dev.sheetwright.dxf.DxfWriter} and the SVG preview writer
 * {@link dev.sheetwright.dxf.SvgWriter} with its {@link dev.sheetwright.dxf.SvgStyle}. Package-private helpers are
 * named for their job: {@code Ordinates} (locale-independent number text shared by both writers), {@code BulgeArc}
 * (the arc a bulge stands for), {@code AsciiLabels} (text made safe for DXF), {@code AtomicFiles}
 * (write to a temporary file, then move it into place) and {@code Checks} (argument checks with exact messages).
 *
 * <p>What does not: anything about ducts, fittings, sheets, nesting or quoting. Callers in other modules turn their
 * outlines into polylines with bulges and choose the layer names; this package only knows that a layer has a name
 * and an ACI colour. It depends on the JDK alone.
 *
 * <p>Arcs are stored as DXF bulges: the bulge of a vertex is {@code tan(sweep / 4)} of the segment from that vertex
 * to the next, positive when the arc runs counter-clockwise; on a closed polyline the last vertex's bulge belongs to
 * the closing segment. Lengths are in the drawing's unit ({@link dev.sheetwright.dxf.DrawingUnit}), +y is up.
 */
package dev.sheetwright.dxf;
