package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ThreadLocalRandom;

/**
 * One open rack: the connection, its backend, the clock, and the SQL every part of the store shares (remnant rows,
 * the id counter, transactions). Package-private; opened by {@link RackSchema}.
 */
final class RackDb implements AutoCloseable {
    /** How often a transaction that lost a race with another writer is run again before giving up. */
    static final int MAX_ATTEMPTS = 50;

    static final String COLUMNS = "seq, material, gauge, thickness_mm, outline, location, added, source,"
            + " state, reserved_by, reserved_until";

    final RackBackend backend;
    final Connection conn;
    final Clock clock;
    final FaultPoint faults;

    RackDb(RackBackend backend, Connection conn, Clock clock, FaultPoint faults) {
        this.backend = backend;
        this.conn = conn;
        this.clock = clock;
        this.faults = faults;
    }

    RackLocation location() {
        return backend.location();
    }

    Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.SECONDS);
    }

    @FunctionalInterface
    interface SqlWork<T> {
        T run() throws SQLException;
    }

    <T> T read(SqlWork<T> work) {
        try {
            return work.run();
        } catch (SQLException e) {
            throw new InventoryStorageException("inventory: cannot read " + backend.describe(e), e);
        }
    }

    /**
     * Runs {@code work} in one transaction; any exception rolls everything back. When the backend reports that the
     * transaction lost a race with another writer, it is run again from the start ({@code work} must only depend on
     * what it reads).
     */
    <T> T transaction(SqlWork<T> work) {
        for (int attempt = 1; ; attempt++) {
            try {
                backend.begin(conn);
            } catch (SQLException e) {
                throw new InventoryStorageException("inventory: cannot start a change in " + backend.describe(e), e);
            }
            SQLException failure;
            try {
                T result = work.run();
                backend.commit(conn);
                return result;
            } catch (SQLException e) {
                failure = e;
            } catch (RuntimeException | Error e) {
                rollbackQuietly();
                throw e;
            }
            rollbackQuietly();
            if (!backend.retryable(failure) || attempt >= MAX_ATTEMPTS) {
                throw new InventoryStorageException("inventory: cannot write " + backend.describe(failure), failure);
            }
            pause(attempt);
        }
    }

    private void rollbackQuietly() {
        try {
            backend.rollback(conn);
        } catch (SQLException ignored) {
            // the transaction is already gone (e.g. the connection broke); the database rolls it back
        }
    }

    /** A short random wait that grows with the attempt, so racing writers spread out (common practice). */
    private static void pause(int attempt) {
        try {
            Thread.sleep(ThreadLocalRandom.current().nextLong(1, 5L + 5L * Math.min(attempt, 20)));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new InventoryStorageException("inventory: interrupted while waiting to retry a change", e);
        }
    }

    // ---------------------------------------------------------------- shared SQL

    List<Remnant> query(String sql, List<?> args) throws SQLException {
        try (PreparedStatement p = conn.prepareStatement(sql)) {
            bind(p, args);
            List<Remnant> out = new ArrayList<>();
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    out.add(toRemnant(rs));
                }
            }
            return out;
        }
    }

    int update(String sql, List<?> args) throws SQLException {
        try (PreparedStatement p = conn.prepareStatement(sql)) {
            bind(p, args);
            return p.executeUpdate();
        }
    }

    /** The single number the query returns (0 when it returns NULL). */
    long number(String sql, List<?> args) throws SQLException {
        try (PreparedStatement p = conn.prepareStatement(sql)) {
            bind(p, args);
            try (ResultSet rs = p.executeQuery()) {
                return rs.next() ? rs.getLong(1) : 0;
            }
        }
    }

    private static void bind(PreparedStatement p, List<?> args) throws SQLException {
        for (int i = 0; i < args.size(); i++) {
            p.setObject(i + 1, args.get(i));
        }
    }

    Optional<Remnant> get(long seq) throws SQLException {
        List<Remnant> found = query("SELECT " + COLUMNS + " FROM remnant WHERE seq = ?", List.of(seq));
        return found.isEmpty() ? Optional.empty() : Optional.of(found.get(0));
    }

    /** The highest remnant id ever issued (also to removed remnants and to plans' offcuts). */
    long highestIssued() throws SQLException {
        return number("SELECT COALESCE(MAX(seq), 0) FROM " + backend.counterTable() + " WHERE name = 'remnant'",
                List.of());
    }

    /** Moves the id counter up to {@code seq} (never down). */
    void noteIssued(long seq) throws SQLException {
        String table = backend.counterTable();
        update("UPDATE " + table + " SET seq = ? WHERE name = 'remnant' AND seq < ?", List.of(seq, seq));
        update("INSERT INTO " + table + " (name, seq) SELECT 'remnant', ? WHERE NOT EXISTS"
                + " (SELECT 1 FROM " + table + " WHERE name = 'remnant')", List.of(seq));
    }

    /** Inserts a remnant under {@code seq}, or under the next id never issued when null; returns its seq. */
    long insert(NewRemnant r, Long seq, Instant added, RemnantState state) throws SQLException {
        long s = seq != null ? seq : highestIssued() + 1;
        RemnantState stored = state == RemnantState.RESERVED ? RemnantState.AVAILABLE : state;
        try (PreparedStatement p = conn.prepareStatement("INSERT INTO remnant (seq, material, gauge, thickness_mm,"
                + " outline, width_mm, height_mm, area_mm2, location, added, source, state)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            p.setLong(1, s);
            p.setString(2, r.material().word());
            if (r.gauge() == null) {
                p.setNull(3, Types.INTEGER);
            } else {
                p.setInt(3, r.gauge());
            }
            if (r.thicknessMm() == null) {
                p.setNull(4, Types.DOUBLE);
            } else {
                p.setDouble(4, r.thicknessMm());
            }
            p.setString(5, r.outline().toText());
            p.setDouble(6, r.outline().widthMm());
            p.setDouble(7, r.outline().heightMm());
            p.setDouble(8, r.outline().areaMm2());
            p.setString(9, r.location());
            p.setString(10, added.toString());
            p.setString(11, r.source().text());
            p.setString(12, stored.word());
            p.executeUpdate();
        }
        noteIssued(s);
        return s;
    }

    private static Remnant toRemnant(ResultSet rs) throws SQLException {
        long seq = rs.getLong("seq");
        int gauge = rs.getInt("gauge");
        Integer g = rs.wasNull() ? null : gauge;
        double thickness = rs.getDouble("thickness_mm");
        Double t = rs.wasNull() ? null : thickness;
        long until = rs.getLong("reserved_until");
        Instant u = rs.wasNull() ? null : Instant.ofEpochMilli(until);
        return new Remnant(RemnantId.format(seq), MaterialType.parse(rs.getString("material")), g, t,
                RemnantOutline.parse(rs.getString("outline")), rs.getString("location"),
                Instant.parse(rs.getString("added")), RemnantSource.parse(rs.getString("source")),
                RemnantState.parse(rs.getString("state")), rs.getString("reserved_by"), u);
    }

    /** The WHERE clause of a filter, its values appended to {@code args}. */
    static String where(RemnantFilter f, List<Object> args, boolean excludeUsed) {
        StringBuilder w = new StringBuilder("1 = 1");
        if (excludeUsed) {
            w.append(" AND state <> 'used'");
        }
        if (f.material() != null) {
            w.append(" AND material = ?");
            args.add(f.material().word());
        }
        if (f.gauge() != null) {
            w.append(" AND gauge = ?");
            args.add(f.gauge());
        }
        if (f.thicknessMm() != null) {
            w.append(" AND ABS(thickness_mm - ?) <= ?");
            args.add(f.thicknessMm());
            args.add(RemnantFilter.THICKNESS_MATCH_MM);
        }
        if (f.minAreaMm2() != null) {
            w.append(" AND area_mm2 >= ?");
            args.add(f.minAreaMm2());
        }
        return w.toString();
    }

    IllegalArgumentException noSuch(long seq) {
        return new IllegalArgumentException("no remnant " + RemnantId.format(seq) + " in " + location());
    }

    /** The sequence numbers of {@code ids}, ascending and without repeats. */
    static Set<Long> seqsOf(Collection<String> ids) {
        Set<Long> seqs = new TreeSet<>();
        for (String id : ids) {
            seqs.add(RemnantId.parse(id));
        }
        return seqs;
    }

    static void checkPlanId(String planId) {
        if (planId == null || planId.isBlank() || planId.length() > 100
                || planId.chars().anyMatch(Character::isISOControl) || !planId.equals(planId.strip())) {
            throw new IllegalArgumentException("planId: '" + planId
                    + "' must be 1 to 100 printable characters without surrounding blanks");
        }
    }

    static void requireNonNull(String field, Object value) {
        if (value == null) {
            throw new IllegalArgumentException(field + ": is null");
        }
    }

    @Override
    public void close() {
        try {
            conn.close();
        } catch (SQLException ignored) {
            // closing is best effort; the data is already committed or rolled back
        }
    }
}
