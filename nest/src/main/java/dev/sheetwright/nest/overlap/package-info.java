/**
 * Overlap-minimising nesting search: the layout's pieces may overlap while the search runs; one overlapping piece
 * at a time moves to its best sampled position and rotation under a weighted overlap measure (guided local search),
 * and a container (a strip length, or a set of sheets) shrinks whenever the overlap reaches zero.
 * Collision is decided exactly on conservative search shapes; how much two shapes overlap is measured by the
 * penetration of inscribed circles. Follows the published line of work (Egeblad, Nielsen and Odgaard 2007;
 * Umetani et al. 2009; Imamichi, Yagiura and Nagamochi 2009; Gardeyn and Wauters 2025) in this project's own code.
 */
package dev.sheetwright.nest.overlap;
