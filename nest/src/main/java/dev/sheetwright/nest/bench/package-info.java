/**
 * Benchmarks: reading strip-packing instances and published layouts, packing a strip with the engine, and a
 * synthetic duct-like sheet job for timing.
 */
package dev.sheetwright.nest.bench;
