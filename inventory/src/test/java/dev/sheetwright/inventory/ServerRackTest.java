package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.sheetwright.core.material.MaterialType;
import java.net.ServerSocket;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What only a server rack has: connection failures named, and a server that stops in the middle of a plan. */
class ServerRackTest {
    @TempDir
    Path dir;

    @Test
    void open_unknownDatabase_namesItAndSaysHowToMakeIt() {
        RackLocation.Server admin = TestRack.server();
        RackLocation.Server none = new RackLocation.Server(admin.user(), admin.password(), admin.host(), admin.port(),
                "no_such_rack");

        RackAccessException e = assertThrows(RackAccessException.class, () -> RemnantStore.open(none, true));

        assertEquals("inventory " + none + ": database no_such_rack does not exist on " + admin.host() + ":"
                + admin.port() + "; create it with 'createdb no_such_rack'", e.getMessage());
    }

    @Test
    void open_wrongPassword_saysAuthenticationFailedWithoutShowingIt() {
        RackLocation.Server admin = TestRack.server();
        RackLocation.Server wrong = new RackLocation.Server(admin.user(), "not-the-password", admin.host(),
                admin.port(), admin.database());

        RackAccessException e = assertThrows(RackAccessException.class, () -> RemnantStore.open(wrong, false));

        assertEquals("inventory " + wrong + ": authentication failed for user " + admin.user() + " (check the"
                + " password in the URL, PGPASSWORD or ~/.pgpass)", e.getMessage());
        assertFalse(e.getMessage().contains("not-the-password"));
    }

    @Test
    void open_nothingListening_saysRefusedNamingHostAndPort() throws Exception {
        int port;
        try (ServerSocket s = new ServerSocket(0, 1, java.net.InetAddress.getLoopbackAddress())) {
            port = s.getLocalPort();
        }
        RackLocation.Server nobody = new RackLocation.Server("u", null, "127.0.0.1", port, "rack");

        RackAccessException e = assertThrows(RackAccessException.class, () -> RemnantStore.open(nobody, false));

        assertEquals("inventory " + nobody + ": connection refused by 127.0.0.1:" + port + "; is the server running"
                + " and listening there?", e.getMessage());
    }

    @Test
    void open_emptyDatabaseWithoutCreate_refused_andOtherTablesAlwaysRefused() {
        try (TestRack rack = TestRack.make(TestRack.Kind.POSTGRESQL, dir, "")) {
            RackAccessException empty = assertThrows(RackAccessException.class,
                    () -> RemnantStore.open(rack.location, false));
            assertTrue(empty.getMessage().contains("no rack there (the database is empty)"), empty.getMessage());

            rack.execute("CREATE TABLE payroll (id INTEGER PRIMARY KEY)");
            RackAccessException other = assertThrows(RackAccessException.class,
                    () -> RemnantStore.open(rack.location, true));
            assertEquals("inventory " + rack.shown() + ": not a sheetwright rack (it holds other tables: payroll);"
                    + " give the rack's file or database", other.getMessage());
        }
    }

    @Test
    void hold_serverStoppedBeforeTheTransactionEnds_clearErrorAndNothingHalfRecorded() throws Exception {
        String data = System.getenv("SHEETWRIGHT_TEST_POSTGRES_DATA");
        String bin = System.getenv("SHEETWRIGHT_TEST_POSTGRES_BIN");
        if (data == null || bin == null) {
            if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
                fail("SHEETWRIGHT_TEST_POSTGRES_DATA/_BIN unset but SHEETWRIGHT_REQUIRE_EXTERNAL=1");
            }
            Assumptions.abort("the test server's folder is unknown; cannot stop and start it");
        }
        try (TestRack rack = TestRack.make(TestRack.Kind.POSTGRESQL, dir, "")) {
            try (RemnantStore store = rack.open()) {
                store.add(NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(1200, 600), ""));
                store.reserve(RemnantFilter.any(), "plan-s", Duration.ofMinutes(30));
            }
            List<String> before = rack.snapshot();
            FaultPoint stopServer = step -> {
                if (step.equals("hold:recorded")) {
                    pgCtl(bin, data, "-m", "immediate", "stop");
                }
            };
            try (RemnantStore store = rack.open(Clock.systemUTC(), Migrations.ALL, stopServer)) {
                InventoryStorageException e = assertThrows(InventoryStorageException.class,
                        () -> store.hold("plan-s", "J-5", Set.of("R-0001"), List.of(NewRemnant.offcut(
                                MaterialType.GALVANIZED, 24, null, RemnantOutline.rectangle(300, 300), "", "J-5", 1)),
                                Duration.ofMinutes(30)));
                assertTrue(e.getMessage().startsWith("inventory: cannot write " + rack.shown()
                        + ": lost the connection to the server"), e.getMessage());
                assertTrue(e.getMessage().endsWith("the change was not recorded"), e.getMessage());
            } finally {
                pgCtl(bin, data, "-l", Path.of(data).resolveSibling("server.log").toString(), "-w", "start");
            }

            assertEquals(before, rack.snapshot());
        }
    }

    @Test
    void open_passwordFromPgpasswordOrPgpassFile_whenTheUrlHasNone() throws Exception {
        try (TestRack rack = TestRack.make(TestRack.Kind.POSTGRESQL, dir, "")) {
            try (RemnantStore store = rack.open()) {
                store.add(NewRemnant.manual(MaterialType.GALVANIZED, 24, RemnantOutline.rectangle(100, 100), ""));
            }
            RackLocation.Server s = (RackLocation.Server) rack.location;
            String url = s.toString(); // no password in it

            assertEquals("1", count(url, java.util.Map.of("PGPASSWORD", s.password())));

            Path pgpass = java.nio.file.Files.writeString(dir.resolve("pgpass"), s.host() + ":" + s.port() + ":"
                    + s.database() + ":" + s.user() + ":" + s.password() + "\n");
            java.nio.file.Files.setPosixFilePermissions(pgpass, java.nio.file.attribute.PosixFilePermissions
                    .fromString("rw-------"));
            assertEquals("1", count(url, java.util.Map.of("PGPASSFILE", pgpass.toString())));
        }
    }

    /** Runs the {@code count} planner mode in a child JVM with exactly these password variables. */
    private static String count(String url, java.util.Map<String, String> env) throws Exception {
        String javaBin = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(javaBin, "-cp", System.getProperty("java.class.path"),
                PlannerMain.class.getName(), "count", url).redirectErrorStream(true);
        pb.environment().remove("PGPASSWORD");
        pb.environment().remove("PGPASSFILE");
        pb.environment().put("HOME", System.getProperty("java.io.tmpdir")); // no user ~/.pgpass
        pb.environment().putAll(env);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "child timed out");
        assertEquals(0, p.exitValue(), out);
        return out.strip();
    }

    private static void pgCtl(String bin, String data, String... args) {
        List<String> cmd = new java.util.ArrayList<>(List.of("runuser", "-u", "postgres", "--", bin + "/pg_ctl",
                "-D", data));
        cmd.addAll(List.of(args));
        try {
            Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(
                    ProcessBuilder.Redirect.DISCARD).start();
            if (!p.waitFor(60, TimeUnit.SECONDS) || p.exitValue() != 0) {
                throw new IllegalStateException("pg_ctl " + String.join(" ", args) + " failed");
            }
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }
}
