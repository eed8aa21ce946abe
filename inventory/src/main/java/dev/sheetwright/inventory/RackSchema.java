package dev.sheetwright.inventory;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Opening a rack: connect, make sure the database is a sheetwright rack (or empty, when a new rack may be started
 * there), and bring its schema up to date with the {@link Migrations}. Package-private.
 */
final class RackSchema {
    /** The tables that make a database a rack. */
    static final List<String> MARKER_TABLES = List.of("schema_version", "remnant");

    private RackSchema() {
    }

    /**
     * Opens the rack of {@code backend}.
     *
     * @param mayCreate whether an empty database (or a missing file) may become a new rack
     * @throws RackAccessException when there is no rack and none may be made, or the database is not a rack
     */
    static RackDb open(RackBackend backend, boolean mayCreate, Clock clock, List<Migration> migrations,
            FaultPoint faults) {
        Connection c = backend.connect(mayCreate);
        try {
            List<String> tables;
            try {
                tables = tables(c, backend);
            } catch (SQLException e) {
                throw new RackAccessException("inventory " + backend.location() + ": not a sheetwright rack ("
                        + e.getMessage() + ")", e);
            }
            List<String> lower = tables.stream().map(t -> t.toLowerCase(Locale.ROOT)).toList();
            if (!lower.containsAll(MARKER_TABLES)) {
                if (!tables.isEmpty()) {
                    throw new RackAccessException("inventory " + backend.location() + ": not a sheetwright rack (it"
                            + " holds other tables: " + String.join(", ", tables.subList(0, Math.min(5,
                            tables.size()))) + "); give the rack's file or database", null);
                }
                if (!mayCreate) {
                    throw new RackAccessException("inventory " + backend.location() + ": no rack there (the database"
                            + " is empty); start one with 'sheetwright remnant add' or 'remnant import'", null);
                }
            }
            backend.configure(c);
            RackDb db = new RackDb(backend, c, clock, faults);
            migrate(db, migrations);
            return db;
        } catch (SQLException e) {
            close(c);
            throw new InventoryStorageException("inventory: cannot open " + backend.describe(e), e);
        } catch (RuntimeException e) {
            close(c);
            throw e;
        }
    }

    private static List<String> tables(Connection c, RackBackend backend) throws SQLException {
        List<String> out = new ArrayList<>();
        try (ResultSet rs = c.getMetaData().getTables(null, c.getSchema(), "%", new String[] {"TABLE"})) {
            while (rs.next()) {
                String name = rs.getString("TABLE_NAME");
                if (!backend.isEngineTable(name)) {
                    out.add(name);
                }
            }
        }
        return out;
    }

    private static void migrate(RackDb db, List<Migration> migrations) {
        db.transaction(() -> {
            db.backend.lockSchema(db.conn);
            try (Statement s = db.conn.createStatement()) {
                s.execute("CREATE TABLE IF NOT EXISTS schema_version (version INTEGER PRIMARY KEY,"
                        + " description TEXT NOT NULL, applied TEXT NOT NULL)");
                for (String sql : db.backend.bootstrap()) {
                    s.execute(sql);
                }
            }
            int current = (int) db.number("SELECT COALESCE(MAX(version), 0) FROM schema_version", List.of());
            int latest = migrations.isEmpty() ? 0 : migrations.get(migrations.size() - 1).version();
            if (current > latest) {
                throw new InventoryStorageException("inventory: " + db.location() + " has schema version " + current
                        + "; this program knows versions up to " + latest, null);
            }
            int expected = 1;
            for (Migration m : migrations) {
                if (m.version() != expected++) {
                    throw new IllegalStateException("migrations must be numbered 1, 2, 3...; found " + m.version());
                }
                if (m.version() <= current) {
                    continue;
                }
                try (Statement s = db.conn.createStatement()) {
                    for (String sql : m.statements()) {
                        s.execute(db.backend.ddl(sql));
                    }
                }
                try (PreparedStatement p = db.conn.prepareStatement(
                        "INSERT INTO schema_version (version, description, applied) VALUES (?, ?, ?)")) {
                    p.setInt(1, m.version());
                    p.setString(2, m.description());
                    p.setString(3, db.now().toString());
                    p.executeUpdate();
                }
            }
            return null;
        });
    }

    private static void close(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // best effort; nothing was changed
        }
    }
}
