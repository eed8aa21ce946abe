/** Independent re-checking of nest results with JTS distance and overlay operations (no no-fit polygons). */
package dev.sheetwright.nest.check;
