package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.fail;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.UUID;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;

/**
 * One empty rack for one test, on either backend, so the store tests run unchanged against both: a SQLite file in
 * the test's folder, or a new database on the PostgreSQL test server named by {@value #SERVER_VARIABLE} (an admin
 * URL; {@code .ci/run} starts a throwaway server and sets it). Without a server the PostgreSQL runs are skipped, but
 * they fail when {@code SHEETWRIGHT_REQUIRE_EXTERNAL=1}.
 */
final class TestRack implements AutoCloseable {
    static final String SERVER_VARIABLE = "SHEETWRIGHT_TEST_POSTGRES";

    enum Kind { SQLITE, POSTGRESQL }

    /** For {@code @MethodSource}: both backends. */
    static Stream<Kind> kinds() {
        return Stream.of(Kind.values());
    }

    final Kind kind;
    final RackLocation location;
    private final RackLocation.Server admin;

    private TestRack(Kind kind, RackLocation location, RackLocation.Server admin) {
        this.kind = kind;
        this.location = location;
        this.admin = admin;
    }

    /** A new empty rack location of {@code kind} (the SQLite file {@code dir/name}). */
    static TestRack make(Kind kind, Path dir, String name) {
        if (kind == Kind.SQLITE) {
            return new TestRack(kind, new RackLocation.File(dir.resolve(name)), null);
        }
        RackLocation.Server admin = server();
        String db = "sw_test_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);
        try (Connection c = connect(admin); Statement s = c.createStatement()) {
            s.execute("CREATE DATABASE " + db);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create test database " + db + ": " + e.getMessage(), e);
        }
        return new TestRack(kind, new RackLocation.Server(admin.user(), admin.password(), admin.host(),
                admin.port(), db), admin);
    }

    /** The test server's admin location; skips (or fails under SHEETWRIGHT_REQUIRE_EXTERNAL=1) when there is none. */
    static RackLocation.Server server() {
        String url = System.getenv(SERVER_VARIABLE);
        if (url == null || url.isBlank()) {
            if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
                fail(SERVER_VARIABLE + " is not set but SHEETWRIGHT_REQUIRE_EXTERNAL=1: the PostgreSQL rack tests"
                        + " need a test server (.ci/run starts one)");
            }
            Assumptions.abort("no PostgreSQL test server (" + SERVER_VARIABLE + " unset)");
        }
        return (RackLocation.Server) RackLocation.parse(url);
    }

    static Connection connect(RackLocation.Server s) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", s.user());
        if (s.password() != null) {
            p.setProperty("password", s.password());
        }
        return new org.postgresql.Driver().connect("jdbc:postgresql://" + s.host() + ":" + s.port() + "/"
                + s.database(), p);
    }

    /** The SQLite file (only for {@link Kind#SQLITE}). */
    Path file() {
        return ((RackLocation.File) location).path();
    }

    /** How the store names this rack in messages. */
    String shown() {
        return location.toString();
    }

    RemnantStore open() {
        return RemnantStore.open(location, true);
    }

    RemnantStore open(Clock clock) {
        return RemnantStore.open(location, true, clock);
    }

    RemnantStore open(Clock clock, List<Migration> migrations, FaultPoint faults) {
        return RemnantStore.open(RemnantStore.backend(location), true, clock, migrations, faults);
    }

    /** Every row of the rack's tables (remnants, id counter, schema versions, plans), to compare before and after. */
    List<String> snapshot() {
        List<String> rows = new ArrayList<>();
        try (Connection c = rawConnection(); Statement s = c.createStatement()) {
            dump(s, "SELECT * FROM remnant ORDER BY seq", rows);
            dump(s, "SELECT name, seq FROM " + (kind == Kind.SQLITE ? "sqlite_sequence" : "remnant_issued")
                    + " ORDER BY name", rows);
            dump(s, "SELECT * FROM schema_version ORDER BY version", rows);
            dump(s, "SELECT * FROM plan ORDER BY id", rows);
            dump(s, "SELECT * FROM plan_offcut_id ORDER BY seq", rows);
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
        return rows;
    }

    /** Runs SQL on the rack behind the store's back. */
    void execute(String sql) {
        try (Connection c = rawConnection(); Statement s = c.createStatement()) {
            s.execute(sql);
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Makes the database refuse to insert a remnant whose source is {@code source}, as a full disk would. */
    void refuseInsertsOfSource(String source, String message) {
        if (kind == Kind.SQLITE) {
            execute("CREATE TRIGGER refuse_insert BEFORE INSERT ON remnant WHEN NEW.source = '" + source + "'"
                    + " BEGIN SELECT RAISE(ABORT, '" + message + "'); END");
        } else {
            execute("CREATE FUNCTION refuse_insert() RETURNS trigger AS $$ BEGIN IF NEW.source = '" + source
                    + "' THEN RAISE EXCEPTION '" + message + "'; END IF; RETURN NEW; END $$ LANGUAGE plpgsql");
            execute("CREATE TRIGGER refuse_insert BEFORE INSERT ON remnant FOR EACH ROW EXECUTE FUNCTION"
                    + " refuse_insert()");
        }
    }

    Connection rawConnection() throws SQLException {
        if (kind == Kind.SQLITE) {
            return DriverManager.getConnection("jdbc:sqlite:" + file());
        }
        return connect((RackLocation.Server) location);
    }

    private static void dump(Statement s, String sql, List<String> rows) throws SQLException {
        try (ResultSet rs = s.executeQuery(sql)) {
            ResultSetMetaData md = rs.getMetaData();
            while (rs.next()) {
                StringBuilder sb = new StringBuilder();
                for (int i = 1; i <= md.getColumnCount(); i++) {
                    sb.append(md.getColumnName(i)).append('=').append(rs.getString(i)).append(' ');
                }
                rows.add(sb.toString());
            }
        }
    }

    @Override
    public void close() {
        if (admin == null) {
            return;
        }
        String db = ((RackLocation.Server) location).database();
        try (Connection c = connect(admin); Statement s = c.createStatement()) {
            s.execute("DROP DATABASE IF EXISTS " + db + " WITH (FORCE)");
        } catch (SQLException e) {
            throw new IllegalStateException("cannot drop test database " + db + ": " + e.getMessage(), e);
        }
    }
}
