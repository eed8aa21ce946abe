/**
 * Input and output of the nesting engine as validated records over plain JTS geometry: pieces, stock (sheets,
 * remnants, coil), rules, options, and the resulting layouts with placements, offcuts and unplaced copies.
 */
package dev.sheetwright.nest.model;
