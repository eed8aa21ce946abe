package dev.sheetwright.inventory;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import org.sqlite.SQLiteConfig;

/**
 * A rack in one SQLite file: write-ahead logging and a busy timeout let several processes use it; every change is
 * one {@code BEGIN IMMEDIATE} transaction, so writers queue and never need a retry. Package-private.
 */
final class SqliteBackend implements RackBackend {
    /** How long a call waits for another process's write to finish before giving up. */
    static final Duration BUSY_TIMEOUT = Duration.ofSeconds(30);

    private final RackLocation.File location;

    SqliteBackend(RackLocation.File location) {
        this.location = location;
    }

    @Override
    public RackLocation location() {
        return location;
    }

    @Override
    public Connection connect(boolean mayCreate) {
        Path file = location.path();
        if (Files.isDirectory(file)) {
            throw new RackAccessException("inventory: " + file + " is a folder; give a database file", null);
        }
        if (!Files.exists(file)) {
            if (!mayCreate) {
                throw new RackAccessException("inventory " + file + ": no rack there; check the path, or start"
                        + " one with 'sheetwright remnant add ... --inventory " + file + "' or 'remnant import'", null);
            }
            try {
                Path parent = file.toAbsolutePath().getParent();
                if (parent != null) {
                    Files.createDirectories(parent);
                }
            } catch (IOException e) {
                throw new RackAccessException("inventory: cannot create the folder for " + file + ": " + e, e);
            }
        }
        SQLiteConfig config = new SQLiteConfig();
        config.setBusyTimeout((int) BUSY_TIMEOUT.toMillis());
        config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
        try {
            return config.createConnection("jdbc:sqlite:" + file);
        } catch (SQLException e) {
            if (String.valueOf(e.getMessage()).contains("SQLITE_NOTADB")) {
                throw new RackAccessException("inventory " + file + ": not a sheetwright rack (not a SQLite database"
                        + " file); give the rack's file", e);
            }
            throw new RackAccessException("inventory: cannot open " + file + ": " + e.getMessage(), e);
        }
    }

    @Override
    public void configure(Connection db) throws SQLException {
        execute(db, "PRAGMA journal_mode=WAL");
    }

    @Override
    public void begin(Connection db) throws SQLException {
        execute(db, "BEGIN IMMEDIATE");
    }

    @Override
    public void commit(Connection db) throws SQLException {
        execute(db, "COMMIT");
    }

    @Override
    public void rollback(Connection db) throws SQLException {
        execute(db, "ROLLBACK");
    }

    private static void execute(Connection db, String sql) throws SQLException {
        try (Statement s = db.createStatement()) {
            s.execute(sql);
        }
    }

    @Override
    public boolean retryable(SQLException e) {
        return false;
    }

    @Override
    public void lockSchema(Connection db) {
        // BEGIN IMMEDIATE already holds the file's write lock
    }

    @Override
    public String ddl(String sql) {
        return sql;
    }

    @Override
    public List<String> bootstrap() {
        return List.of();
    }

    @Override
    public String counterTable() {
        return "sqlite_sequence";
    }

    @Override
    public boolean isEngineTable(String name) {
        return name.toLowerCase(Locale.ROOT).startsWith("sqlite_");
    }

    @Override
    public String describe(SQLException e) {
        return location + ": " + e.getMessage();
    }
}
