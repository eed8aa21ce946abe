package dev.sheetwright.inventory;

import java.util.List;

/**
 * One forward step of the database schema. Migrations are applied in version order, each inside the
 * same transaction as the row that records it in {@code schema_version}.
 *
 * @param version     1 for the initial schema, then 2, 3...
 * @param description what the step does
 * @param statements  the SQL statements, run in order
 */
record Migration(int version, String description, List<String> statements) {
    Migration {
        if (version < 1) {
            throw new IllegalArgumentException("version: " + version + " must be >= 1");
        }
        statements = List.copyOf(statements);
    }
}
