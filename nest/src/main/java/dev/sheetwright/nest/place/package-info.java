/**
 * The placer: convex decomposition, no-fit polygons as unions of convex Minkowski sums (holes as convex pockets),
 * bottom-left placement from candidate vertices and edge crossings, and the order-based local search in
 * {@link dev.sheetwright.nest.place.Nester}.
 */
package dev.sheetwright.nest.place;
