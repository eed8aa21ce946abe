/**
 * The shop's rack of offcuts (remnants), kept in an embedded SQLite database so that a plan can take
 * material from scrap before a new sheet is opened, and the offcut a job leaves behind is recorded.
 *
 * <p>Everything in this package is in millimetres; callers convert with {@link dev.sheetwright.core.units.LengthUnit},
 * and a remnant's material is a {@link dev.sheetwright.core.material.MaterialType}. Parsing of user-typed sizes
 * belongs to the command line, not here.
 *
 * <p>{@link dev.sheetwright.inventory.RemnantStore} is the entry point. Two processes (or two threads,
 * each with its own store) may work on the same file at once: reservations are leases with an expiry,
 * and every change is one SQLite transaction.
 */
package dev.sheetwright.inventory;
