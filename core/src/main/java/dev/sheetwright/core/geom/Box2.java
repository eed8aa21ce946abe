package dev.sheetwright.core.geom;

/** An axis-aligned bounding box. */
public record Box2(double minX, double minY, double maxX, double maxY) {

    public Box2 {
        if (!(minX <= maxX) || !(minY <= maxY)) {
            throw new IllegalArgumentException(
                    "box min must not exceed max: (" + minX + ", " + minY + ") .. (" + maxX + ", " + maxY + ")");
        }
    }

    public static Box2 of(Point2 p) {
        return new Box2(p.x(), p.y(), p.x(), p.y());
    }

    public Box2 include(Point2 p) {
        return new Box2(Math.min(minX, p.x()), Math.min(minY, p.y()), Math.max(maxX, p.x()), Math.max(maxY, p.y()));
    }

    public Box2 union(Box2 b) {
        return new Box2(Math.min(minX, b.minX), Math.min(minY, b.minY), Math.max(maxX, b.maxX), Math.max(maxY, b.maxY));
    }

    public double width() {
        return maxX - minX;
    }

    public double height() {
        return maxY - minY;
    }

    public Point2 centre() {
        return new Point2((minX + maxX) / 2, (minY + maxY) / 2);
    }
}
