package dev.sheetwright.dxf;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * A drawing: its unit, the layers it declares (in the order the writers list them) and its shapes (in drawing
 * order). Every shape's layer must be declared and layer names must be unique. A drawing holds at least one shape.
 */
public record Drawing(DrawingUnit units, List<Layer> layers, List<Shape> shapes) {

    public Drawing {
        Checks.notNull("Drawing.units", units);
        layers = Checks.copy("Drawing.layers", layers);
        shapes = Checks.copy("Drawing.shapes", shapes);
        Set<String> names = new HashSet<>();
        for (Layer layer : layers) {
            if (!names.add(layer.name())) {
                throw new IllegalArgumentException("Drawing.layers declares layer \"" + layer.name() + "\" twice");
            }
        }
        if (shapes.isEmpty()) {
            throw new IllegalArgumentException("Drawing.shapes must hold at least 1 shape, got 0");
        }
        for (int i = 0; i < shapes.size(); i++) {
            String layer = shapes.get(i).layer();
            if (!names.contains(layer)) {
                throw new IllegalArgumentException("Drawing.shapes[" + i + "].layer \"" + layer
                        + "\" is not declared; declared layers: " + declaredNames(layers));
            }
        }
    }

    /** The same drawing with the unit given by its symbol, "in" or "mm". */
    public static Drawing of(String units, List<Layer> layers, List<Shape> shapes) {
        return new Drawing(DrawingUnit.fromSymbol(units), layers, shapes);
    }

    /**
     * Exact extents of all shapes: vertices, line ends, text insertion points, and the extreme points of every
     * bulge arc where it crosses the horizontal or vertical through its centre.
     */
    public Bounds extents() {
        Bounds box = shapes.get(0).bounds();
        for (Shape shape : shapes) {
            box = box.union(shape.bounds());
        }
        return box;
    }

    private static String declaredNames(List<Layer> layers) {
        return layers.stream().map(Layer::name).collect(Collectors.joining(", ", "[", "]"));
    }
}
