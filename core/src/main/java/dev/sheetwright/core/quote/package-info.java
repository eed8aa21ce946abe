/**
 * Material and cutting quotes for a finished nest: per stock line count, area, weight and cost; totals for stock,
 * part and scrap weight, utilization, cut length, pierces, estimated cut time, machine and material cost.
 *
 * <p>The arithmetic follows trade-reference §8.4 (weights and material cost) and §9.5 (cut time). Every rate in a
 * {@link dev.sheetwright.core.quote.Quote} carries where it came from: a published source tag, {@code common practice},
 * {@code from memory}, the shop settings file or the job. Nothing here guesses: a cut speed the chart cannot give is a
 * warning and an unknown cut time, never an extrapolation. JDK only; engine code never prints.
 */
package dev.sheetwright.core.quote;
