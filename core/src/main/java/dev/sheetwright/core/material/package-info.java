/**
 * Sheet material: the four material families a duct shop cuts, their gauge tables, the weight arithmetic
 * and the common sheet sizes.
 *
 * <p>{@link dev.sheetwright.core.material.MaterialType} names a family; {@link dev.sheetwright.core.material.GaugeTable}
 * holds one published gauge series per family (each row carries its source tag from the trade reference);
 * {@link dev.sheetwright.core.material.Material} is one chosen sheet (by gauge or by decimal thickness) with its
 * weight per area; {@link dev.sheetwright.core.material.StandardSheets} lists common-practice sheet and coil sizes.
 *
 * <p>Gauge is not a dimension: everything downstream works on the decimal thickness, and gauge is kept only to
 * label reports. Weights are theoretical (steel is bought by theoretical weight on nominal thickness). Nothing here
 * decides which gauge a duct needs: that is set by the project specification and the adopted duct construction
 * standard.
 *
 * <p>All values are immutable. Bad input raises {@link java.lang.IllegalArgumentException} naming the field, the value
 * and the valid range. Inches are the primary unit; millimetre and kilogram views are computed with the factors in
 * {@link dev.sheetwright.core.material.UnitFactors}.
 */
package dev.sheetwright.core.material;
