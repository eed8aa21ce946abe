/**
 * Cutting data and cut-time arithmetic for CNC plasma and fibre-laser cutting of thin sheet.
 *
 * <p>{@link dev.sheetwright.core.cutting.CutChart} is a table of {@link dev.sheetwright.core.cutting.CutChartRow}s
 * keyed by process, material family and thickness, plus per-process rapid speed and sheet handling time. Speeds and
 * pierce times are interpolated linearly between the two nearest rows and are never extrapolated: a thickness outside
 * the table raises {@link dev.sheetwright.core.cutting.CutDataOutOfRange}. The built-in defaults are starting values
 * for estimates only; the machine's own chart (loaded as overrides with source {@code "shop"}) always wins. Every row
 * and setting carries a source string ({@code [S:...]} tag, {@code common practice}, {@code from memory} or
 * {@code shop}) so a quote can show which numbers are sourced.
 *
 * <p>{@link dev.sheetwright.core.cutting.CutTimeEstimate} applies the cut-time formula of trade-reference §9.5 and keeps
 * each term; the work it is applied to (cut length, pierces, rapids) comes from the sheets' cut plans
 * ({@code core.cutpath}).
 *
 * <p>Lengths are millimetres, speeds mm/min, pierce and sensing times seconds, handling minutes; inch helpers convert at
 * the edge. Bad input raises {@link java.lang.IllegalArgumentException} naming the field, value and valid range.
 */
package dev.sheetwright.core.cutting;
