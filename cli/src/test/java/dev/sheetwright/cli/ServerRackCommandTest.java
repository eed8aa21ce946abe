package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.sheetwright.inventory.RackLocation;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.UUID;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The rack commands against a PostgreSQL database, end to end: the same commands and answers as with a file, and the
 * password never shown or written. Needs the test server of {@code SHEETWRIGHT_TEST_POSTGRES} (an admin URL; .ci/run
 * starts one); skipped without it unless {@code SHEETWRIGHT_REQUIRE_EXTERNAL=1}.
 */
class ServerRackCommandTest {
    private static final String JOB = RackCommandTest.JOB;

    @TempDir
    Path dir;
    private RackLocation.Server admin;
    private String database;
    private String url;

    @BeforeEach
    void createDatabase() throws SQLException {
        String adminUrl = System.getenv("SHEETWRIGHT_TEST_POSTGRES");
        if (adminUrl == null || adminUrl.isBlank()) {
            if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
                fail("SHEETWRIGHT_TEST_POSTGRES is unset but SHEETWRIGHT_REQUIRE_EXTERNAL=1");
            }
            Assumptions.abort("no PostgreSQL test server (SHEETWRIGHT_TEST_POSTGRES unset)");
        }
        admin = (RackLocation.Server) RackLocation.parse(adminUrl);
        database = "sw_cli_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);
        execute("CREATE DATABASE " + database);
        url = "postgresql://" + admin.user() + ":" + admin.password() + "@" + admin.host() + ":" + admin.port() + "/"
                + database;
    }

    @AfterEach
    void dropDatabase() throws SQLException {
        if (database != null) {
            execute("DROP DATABASE IF EXISTS " + database + " WITH (FORCE)");
        }
    }

    private void execute(String sql) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", admin.user());
        p.setProperty("password", admin.password());
        try (Connection c = new org.postgresql.Driver().connect("jdbc:postgresql://" + admin.host() + ":"
                + admin.port() + "/" + admin.database(), p); Statement s = c.createStatement()) {
            s.execute(sql);
        }
    }

    private CommandRun run(String... args) {
        CommandRun r = CommandRun.of(args);
        assertFalse(r.out().contains(admin.password()) || r.err().contains(admin.password()),
                "the password was shown:\n" + r);
        return r;
    }

    private static void exit(int code, CommandRun run) {
        assertEquals(code, run.exitCode(), run.toString());
    }

    @Test
    void rackCommands_onAServerDatabase_workAsOnAFile() throws Exception {
        CommandRun empty = run("remnant", "list", "--inventory", url);
        exit(2, empty);
        assertTrue(empty.err().contains("no rack there (the database is empty)"), empty.err());

        exit(0, run("remnant", "add", "--inventory", url, "--material", "galvanized", "--gauge", "24", "--size",
                "40x30", "--location", "A1"));
        Path csv = Files.writeString(dir.resolve("in.csv"), "material,gauge,width_mm,height_mm,location\n"
                + "galvanized,24,600,300,A2\nsteel,20,900,400,A3\n");
        CommandRun imported = run("remnant", "import", "--inventory", url, csv.toString());
        exit(0, imported);
        assertEquals("imported 2 remnant(s): R-0002 R-0003", imported.out().strip());
        exit(0, run("remnant", "remove", "--inventory", url, "R-0003"));

        Path job = Files.writeString(dir.resolve("job.yaml"), JOB);
        CommandRun nest = run("nest", job.toString(), "-o", dir.resolve("out").toString(), "--iterations", "0",
                "--inventory", url, "--use-remnants");
        exit(0, nest);
        String nestJson = Files.readString(dir.resolve("out/nest.json"));
        assertFalse(nestJson.contains(admin.password()), "nest.json holds the password");
        assertTrue(nestJson.contains("\"inventory\" : \"postgresql://" + admin.user() + "@" + admin.host() + ":"
                + admin.port() + "/" + database + "\""), nestJson);

        // the plan names the server without a password: the commit needs it from elsewhere
        List<String> commit = new ArrayList<>(List.of("commit", dir.resolve("out").toString(), "--inventory", url,
                "--location", "B2"));
        CommandRun committed = run(commit.toArray(String[]::new));
        exit(0, committed);
        assertTrue(committed.out().startsWith("committed plan "), committed.out());
        exit(2, run(commit.toArray(String[]::new)));

        CommandRun list = run("remnant", "list", "--inventory", url, "--all", "--json");
        exit(0, list);
        assertTrue(list.out().contains("\"state\" : \"used\""), list.out());
        CommandRun export = run("remnant", "export", "--inventory", url);
        exit(0, export);
        assertTrue(export.out().startsWith("id,material,gauge,thickness_mm,width_mm,height_mm"), export.out());
        assertEquals(4, export.out().lines().count(), export.out());
    }
}
