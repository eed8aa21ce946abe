package dev.sheetwright.inventory;

import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.List;
import java.util.Properties;

/**
 * A rack in a PostgreSQL database. Changing transactions run SERIALIZABLE: when two writers race, the server
 * refuses one of them (SQLSTATE 40001, 40P01 for a deadlock, or 23505 for a key both chose; see
 * {@link #RETRYABLE_STATES}) and {@link RackDb} runs it again, so the SQL stays
 * the one shared with SQLite and no application lock is needed. Only the first migration of an empty database
 * takes a transaction-scoped advisory lock, so two first openings do not both create the tables.
 *
 * <p>The password comes from the URL, else {@code PGPASSWORD}, else the driver reads {@code ~/.pgpass} (or the
 * file named by {@code PGPASSFILE}). It is never put into a message. Package-private.
 */
final class PostgresBackend implements RackBackend {
    /** How long opening the TCP connection may take before the command gives up. */
    static final Duration CONNECT_TIMEOUT = Duration.ofSeconds(5);
    /** How long connecting and logging in together may take (a loaded client loads the driver meanwhile). */
    static final Duration LOGIN_TIMEOUT = Duration.ofSeconds(10);
    /** Longest wait for one answer of the server once connected. */
    static final Duration ANSWER_TIMEOUT = Duration.ofSeconds(60);
    /** Advisory lock key for migrations: the bytes of "sheetwri" as a number (any fixed key would do). */
    private static final long MIGRATION_LOCK_KEY = 0x7368656574777269L;

    private final RackLocation.Server location;
    private final String passwordFromEnvironment;

    /** {@code pgPassword} is the value of {@code PGPASSWORD} (null when unset). */
    PostgresBackend(RackLocation.Server location, String pgPassword) {
        this.location = location;
        this.passwordFromEnvironment = pgPassword;
    }

    @Override
    public RackLocation location() {
        return location;
    }

    @Override
    public Connection connect(boolean mayCreate) {
        Properties p = new Properties();
        p.setProperty("user", location.user());
        String password = location.password() != null ? location.password() : passwordFromEnvironment;
        if (password != null) {
            p.setProperty("password", password);
        }
        p.setProperty("connectTimeout", Long.toString(CONNECT_TIMEOUT.toSeconds()));
        p.setProperty("loginTimeout", Long.toString(LOGIN_TIMEOUT.toSeconds()));
        p.setProperty("socketTimeout", Long.toString(ANSWER_TIMEOUT.toSeconds()));
        p.setProperty("tcpKeepAlive", "true");
        p.setProperty("ApplicationName", "sheetwright");
        String host = location.host().contains(":") ? "[" + location.host() + "]" : location.host();
        String url = "jdbc:postgresql://" + host + ":" + location.port() + "/" + location.database();
        try {
            // the driver itself, not DriverManager: the command's single jar keeps only one java.sql.Driver service file
            Connection c = new org.postgresql.Driver().connect(url, p);
            if (c == null) {
                throw new SQLException("the driver did not accept " + url);
            }
            return c;
        } catch (SQLException e) {
            throw new RackAccessException("inventory " + location + ": " + connectFailure(e), e);
        }
    }

    /** What went wrong while connecting, in words, from the SQLSTATE. */
    private String connectFailure(SQLException e) {
        String state = e.getSQLState() == null ? "" : e.getSQLState();
        String where = location.host() + ":" + location.port();
        String message = e.getMessage() == null ? "" : e.getMessage();
        if (state.equals("28P01")) {
            return "authentication failed for user " + location.user() + " (check the password in the URL,"
                    + " PGPASSWORD or ~/.pgpass)";
        }
        if (state.startsWith("28")) {
            return "the server refused user " + location.user() + " for database " + location.database() + " ("
                    + firstLine(message) + ")";
        }
        if (state.equals("3D000")) {
            return "database " + location.database() + " does not exist on " + where + "; create it with 'createdb "
                    + location.database() + "'";
        }
        if (message.contains("refused")) {
            return "connection refused by " + where + "; is the server running and listening there?";
        }
        if (e.getCause() instanceof java.net.UnknownHostException) {
            return "unknown host " + location.host();
        }
        if (e.getCause() instanceof java.net.SocketTimeoutException || message.contains("timed out")) {
            return "no answer from " + where + " within " + LOGIN_TIMEOUT.toSeconds() + " s";
        }
        return "cannot connect to " + where + " (" + firstLine(message) + ")";
    }

    private static String firstLine(String s) {
        int n = s.indexOf('\n');
        return n < 0 ? s : s.substring(0, n);
    }

    @Override
    public void configure(Connection db) throws SQLException {
        db.setTransactionIsolation(Connection.TRANSACTION_SERIALIZABLE);
    }

    @Override
    public void begin(Connection db) throws SQLException {
        db.setAutoCommit(false);
    }

    @Override
    public void commit(Connection db) throws SQLException {
        db.commit();
        db.setAutoCommit(true);
    }

    @Override
    public void rollback(Connection db) throws SQLException {
        try {
            db.rollback();
        } finally {
            db.setAutoCommit(true);
        }
    }

    /**
     * Refusals that running the change again may overcome: a serialization failure (40001), a deadlock (40P01), and
     * a unique-key failure (23505). The last is how the server reports two writers that read the highest id issued
     * and both insert the next one (a plan's offcut ids): it cannot see the connection between the insert and the
     * earlier read, so it reports the key, not a serialization failure (PostgreSQL documentation, section 13.5,
     * "Serialization Failure Handling"). A key taken for good fails again on every run and is then reported.
     */
    static final List<String> RETRYABLE_STATES = List.of("40001", "40P01", "23505");

    @Override
    public boolean retryable(SQLException e) {
        return refusedForRace(e);
    }

    /** Whether e, or an exception it was caused by, has one of the {@link #RETRYABLE_STATES}. */
    static boolean refusedForRace(SQLException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && s.getSQLState() != null && RETRYABLE_STATES.contains(s.getSQLState())) {
                return true;
            }
        }
        return false;
    }

    @Override
    public void lockSchema(Connection db) throws SQLException {
        try (Statement s = db.createStatement()) {
            s.execute("SELECT pg_advisory_xact_lock(" + MIGRATION_LOCK_KEY + ")");
        }
    }

    /** SQLite's INTEGER is 64-bit and REAL is double; PostgreSQL's are not. AUTOINCREMENT: ids come from the counter. */
    @Override
    public String ddl(String sql) {
        return sql.replace(" AUTOINCREMENT", "")
                .replaceAll("\\bINTEGER\\b", "BIGINT")
                .replaceAll("\\bREAL\\b", "DOUBLE PRECISION");
    }

    @Override
    public List<String> bootstrap() {
        return List.of("CREATE TABLE IF NOT EXISTS remnant_issued (name TEXT PRIMARY KEY, seq BIGINT NOT NULL)");
    }

    @Override
    public String counterTable() {
        return "remnant_issued";
    }

    @Override
    public boolean isEngineTable(String name) {
        return false;
    }

    @Override
    public String describe(SQLException e) {
        String state = e.getSQLState() == null ? "" : e.getSQLState();
        if (state.startsWith("08") || state.equals("57P01") || state.equals("57P02") || state.equals("57P03")) {
            return location + ": lost the connection to the server (" + firstLine(String.valueOf(e.getMessage()))
                    + "); the change was not recorded";
        }
        return location + ": " + firstLine(String.valueOf(e.getMessage()));
    }
}
