package dev.sheetwright.inventory;

import dev.sheetwright.core.material.MaterialType;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import org.sqlite.SQLiteConfig;

/**
 * The remnant inventory: one SQLite database file, in millimetres.
 *
 * <p>The file uses write-ahead logging and a busy timeout, so several processes (or several stores in one
 * process) can use it at once. Every changing call is one {@code BEGIN IMMEDIATE} transaction: it either
 * happens completely or not at all, also when the process dies halfway. A store object itself is safe to
 * share between threads (its methods are synchronized), but each planner normally opens its own.
 *
 * <p>Reservations are leases: {@link #reserve} flips matching {@code available} remnants to
 * {@code reserved} for a plan until an expiry time; once that time has passed another plan may take them.
 * {@link #commit} then marks the remnants the plan cut as {@code used}, returns the rest to the rack and
 * records the plan's new offcuts, all at once.
 */
public final class RemnantStore implements AutoCloseable {
    /** How long a call waits for another process's write to finish before giving up. */
    public static final Duration BUSY_TIMEOUT = Duration.ofSeconds(30);
    /** Longest reservation accepted. */
    public static final Duration MAX_TTL = Duration.ofDays(30);
    /** Most offcut ids one plan may hold. */
    public static final int MAX_OFFCUTS_PER_PLAN = 10_000;

    private static final String COLUMNS = "seq, material, gauge, thickness_mm, outline, location, added, source,"
            + " state, reserved_by, reserved_until";

    private final Path file;
    private final Connection db;
    private final Clock clock;
    private final FaultPoint faults;

    /** A place where tests can make a transaction fail halfway. Package-private. */
    interface FaultPoint {
        FaultPoint NONE = step -> { };

        void reached(String step);
    }

    private RemnantStore(Path file, Connection db, Clock clock, FaultPoint faults) {
        this.file = file;
        this.db = db;
        this.clock = clock;
        this.faults = faults;
    }

    /** {@code ~/.sheetwright/remnants.db}. */
    public static Path defaultPath() {
        return Path.of(System.getProperty("user.home"), ".sheetwright", "remnants.db");
    }

    /** Opens (creating if needed) the inventory at {@link #defaultPath()}. */
    public static RemnantStore openDefault() {
        return open(defaultPath());
    }

    /**
     * Opens the inventory in {@code file}, creating the folder and the file on first use and bringing the
     * schema up to date.
     *
     * @throws InventoryStorageException if the file cannot be opened or is not an inventory
     */
    public static RemnantStore open(Path file) {
        return open(file, Clock.systemUTC(), Migrations.ALL, FaultPoint.NONE);
    }

    /** As {@link #open(Path)}, reading the time from {@code clock} (for reservation expiry and dates). */
    public static RemnantStore open(Path file, Clock clock) {
        return open(file, clock, Migrations.ALL, FaultPoint.NONE);
    }

    static RemnantStore open(Path file, Clock clock, List<Migration> migrations, FaultPoint faults) {
        if (file == null) {
            throw new IllegalArgumentException("inventory: file is null");
        }
        if (Files.isDirectory(file)) {
            throw new IllegalArgumentException("inventory: " + file + " is a folder; give a database file");
        }
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
        } catch (IOException e) {
            throw new InventoryStorageException("inventory: cannot create the folder for " + file + ": " + e, e);
        }
        SQLiteConfig config = new SQLiteConfig();
        config.setBusyTimeout((int) BUSY_TIMEOUT.toMillis());
        config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
        Connection db = null;
        try {
            db = config.createConnection("jdbc:sqlite:" + file);
            try (Statement s = db.createStatement()) {
                s.execute("PRAGMA journal_mode=WAL");
            }
            RemnantStore store = new RemnantStore(file, db, clock, faults);
            store.migrate(migrations);
            return store;
        } catch (SQLException | RuntimeException e) {
            closeQuietly(db);
            if (e instanceof SQLException) {
                throw new InventoryStorageException("inventory: cannot open " + file + ": " + e.getMessage(), e);
            }
            throw (RuntimeException) e;
        }
    }

    /** The database file. */
    public Path file() {
        return file;
    }

    /** The schema version of the open file. */
    public synchronized int schemaVersion() {
        return read(() -> {
            try (Statement s = db.createStatement();
                 ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(version), 0) FROM schema_version")) {
                return rs.getInt(1);
            }
        });
    }

    private void migrate(List<Migration> migrations) {
        transaction(() -> {
            try (Statement s = db.createStatement()) {
                s.execute("CREATE TABLE IF NOT EXISTS schema_version (version INTEGER PRIMARY KEY,"
                        + " description TEXT NOT NULL, applied TEXT NOT NULL)");
            }
            int current;
            try (Statement s = db.createStatement();
                 ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(version), 0) FROM schema_version")) {
                current = rs.getInt(1);
            }
            int latest = migrations.isEmpty() ? 0 : migrations.get(migrations.size() - 1).version();
            if (current > latest) {
                throw new InventoryStorageException("inventory: " + file + " has schema version " + current
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
                try (Statement s = db.createStatement()) {
                    for (String sql : m.statements()) {
                        s.execute(sql);
                    }
                }
                try (PreparedStatement p = db.prepareStatement(
                        "INSERT INTO schema_version (version, description, applied) VALUES (?, ?, ?)")) {
                    p.setInt(1, m.version());
                    p.setString(2, m.description());
                    p.setString(3, now().toString());
                    p.executeUpdate();
                }
            }
            return null;
        });
    }

    // ---------------------------------------------------------------- basic records

    /** Records a new remnant as {@code available} and returns it with its new id. */
    public synchronized Remnant add(NewRemnant remnant) {
        requireNonNull("remnant", remnant);
        return transaction(() -> get(insert(remnant, null, now(), RemnantState.AVAILABLE)).orElseThrow());
    }

    /** The remnant with this id, if there is one. */
    public synchronized Optional<Remnant> get(String id) {
        long seq = RemnantId.parse(id);
        return read(() -> get(seq));
    }

    /** The remnants matching {@code filter}, in {@code sort} order. */
    public synchronized List<Remnant> list(RemnantFilter filter, RemnantSort sort) {
        requireNonNull("filter", filter);
        requireNonNull("sort", sort);
        return read(() -> {
            List<Object> args = new ArrayList<>();
            String where = where(filter, args, !filter.includeUsed());
            return query("SELECT " + COLUMNS + " FROM remnant WHERE " + where + " ORDER BY " + sort.orderBy(),
                    args);
        });
    }

    /**
     * Deletes a remnant (its id is never issued again).
     *
     * @throws IllegalArgumentException   if there is no such remnant
     * @throws RemnantConflictException   if a plan holds an unexpired reservation on it
     */
    public void remove(String id) {
        removeAll(List.of(id));
    }

    /** Deletes several remnants at once: all of them, or, if one cannot be removed, none. */
    public synchronized void removeAll(Collection<String> ids) {
        requireNonNull("ids", ids);
        Set<Long> seqs = seqsOf(ids);
        transaction(() -> {
            Instant now = now();
            for (long seq : seqs) {
                Remnant r = get(seq).orElseThrow(() -> noSuch(seq));
                if (r.state() == RemnantState.RESERVED && !r.isFreeAt(now)) {
                    throw new RemnantConflictException(r.id() + " is reserved by plan " + r.reservedBy()
                            + " until " + r.reservedUntil() + "; release that plan first");
                }
                try (PreparedStatement p = db.prepareStatement("DELETE FROM remnant WHERE seq = ?")) {
                    p.setLong(1, seq);
                    p.executeUpdate();
                }
            }
            return null;
        });
    }

    // ---------------------------------------------------------------- reservations

    /**
     * Reserves every free remnant matching {@code filter} for {@code planId}; see
     * {@link #reserve(RemnantFilter, String, Duration, int)}.
     */
    public List<Remnant> reserve(RemnantFilter filter, String planId, Duration ttl) {
        return reserve(filter, planId, ttl, Integer.MAX_VALUE);
    }

    /**
     * Reserves for {@code planId}, until now + {@code ttl}, up to {@code maxCount} free remnants matching
     * {@code filter} (smallest area first). Free means {@code available}, or {@code reserved} with an
     * expired lease. Reservations the plan already holds are renewed to the same expiry.
     * {@code filter.includeUsed()} is ignored: used remnants are never reserved.
     *
     * @return every remnant now reserved for the plan (earlier ones included), by id
     */
    public synchronized List<Remnant> reserve(RemnantFilter filter, String planId, Duration ttl, int maxCount) {
        requireNonNull("filter", filter);
        checkPlanId(planId);
        checkTtl(ttl);
        if (maxCount < 0) {
            throw new IllegalArgumentException("maxCount: " + maxCount + " is out of range; must be >= 0");
        }
        return transaction(() -> {
            long now = now().toEpochMilli();
            long until = now + ttl.toMillis();
            List<Object> args = new ArrayList<>();
            args.add(planId);
            args.add(until);
            String where = where(filter, args, true);
            args.add(now);
            args.add(maxCount);
            update("UPDATE remnant SET state = 'reserved', reserved_by = ?, reserved_until = ? WHERE seq IN ("
                    + "SELECT seq FROM remnant WHERE " + where
                    + " AND (state = 'available' OR (state = 'reserved' AND reserved_until <= ?))"
                    + " ORDER BY area_mm2 ASC, seq ASC LIMIT ?)", args);
            update("UPDATE remnant SET reserved_until = ? WHERE state = 'reserved' AND reserved_by = ?",
                    List.of(until, planId));
            return reservedFor(planId);
        });
    }

    /** The remnants currently reserved for {@code planId} (expired leases included until someone takes them). */
    public synchronized List<Remnant> reservedFor(String planId) {
        checkPlanId(planId);
        return read(() -> query("SELECT " + COLUMNS + " FROM remnant WHERE state = 'reserved' AND reserved_by = ?"
                + " ORDER BY seq", List.of(planId)));
    }

    /** Returns every remnant reserved for {@code planId} to {@code available}; returns how many. */
    public synchronized int release(String planId) {
        checkPlanId(planId);
        return transaction(() -> releaseAllBut(planId, Set.of()));
    }

    /**
     * Finishes a plan in one transaction: marks {@code usedIds} {@code used}, returns the plan's other
     * reserved remnants to {@code available}, and adds each of {@code newOffcuts} as {@code available}.
     * A used remnant must still be reserved by this plan; a lease that expired without anyone else taking
     * it still counts. If anything is refused or fails, nothing changes.
     *
     * @return the new offcuts' records, in the given order, with their ids
     * @throws IllegalArgumentException if an id is malformed or not in the inventory
     * @throws RemnantConflictException if a used remnant is not reserved by this plan or is already used
     */
    public synchronized List<Remnant> commit(String planId, Set<String> usedIds, List<NewRemnant> newOffcuts) {
        checkPlanId(planId);
        requireNonNull("usedIds", usedIds);
        requireNonNull("newOffcuts", newOffcuts);
        Set<Long> seqs = seqsOf(usedIds);
        for (int i = 0; i < newOffcuts.size(); i++) {
            if (newOffcuts.get(i) == null) {
                throw new IllegalArgumentException("newOffcuts: element " + i + " is null");
            }
        }
        return transaction(() -> {
            markUsed(planId, seqs);
            releaseAllBut(planId, Set.of());
            List<Remnant> added = new ArrayList<>();
            Instant now = now();
            for (NewRemnant offcut : newOffcuts) {
                added.add(get(insert(offcut, null, now, RemnantState.AVAILABLE)).orElseThrow());
                faults.reached("commit:offcut " + added.size());
            }
            return List.copyOf(added);
        });
    }

    /** Returns the remnants reserved for {@code planId}, except {@code keep}, to {@code available}; returns how many. */
    private int releaseAllBut(String planId, Set<Long> keep) throws SQLException {
        List<Object> args = new ArrayList<>();
        args.add(planId);
        StringBuilder marks = new StringBuilder();
        for (long seq : keep) {
            marks.append(marks.length() == 0 ? "" : ", ").append('?');
            args.add(seq);
        }
        return update("UPDATE remnant SET state = 'available', reserved_by = NULL, reserved_until = NULL"
                + " WHERE state = 'reserved' AND reserved_by = ?"
                + (keep.isEmpty() ? "" : " AND seq NOT IN (" + marks + ")"), args);
    }

    /** Marks {@code seqs} used; each must be reserved by {@code planId} (an expired lease nobody took counts). */
    private void markUsed(String planId, Set<Long> seqs) throws SQLException {
        for (long seq : seqs) {
            Remnant r = get(seq).orElseThrow(() -> noSuch(seq));
            if (r.state() == RemnantState.USED) {
                throw new RemnantConflictException(r.id() + " is already used; plan " + planId
                        + " cannot cut it again");
            }
            if (r.state() != RemnantState.RESERVED || !planId.equals(r.reservedBy())) {
                String now = r.state() == RemnantState.AVAILABLE ? "it is available"
                        : "it is reserved by plan " + r.reservedBy() + " until " + r.reservedUntil();
                throw new RemnantConflictException(r.id() + " is not reserved by plan " + planId + " (" + now
                        + "); reserve it before committing");
            }
            int n = update("UPDATE remnant SET state = 'used', reserved_by = NULL, reserved_until = NULL"
                    + " WHERE seq = ? AND state = 'reserved' AND reserved_by = ?", List.of(seq, planId));
            if (n != 1) {
                throw new IllegalStateException("commit: " + r.id() + " changed during the transaction");
            }
            faults.reached("commit:used " + r.id());
        }
    }

    // ---------------------------------------------------------------- plans

    /**
     * Reserves exactly the remnants {@code ids} for {@code planId} until now + {@code ttl}: all of them or none.
     *
     * @return every remnant now reserved for the plan, by id
     * @throws IllegalArgumentException if an id is malformed or not in the inventory
     * @throws RemnantConflictException if one is used, or reserved by another plan whose lease has not expired
     */
    public synchronized List<Remnant> reserveIds(Collection<String> ids, String planId, Duration ttl) {
        requireNonNull("ids", ids);
        checkPlanId(planId);
        checkTtl(ttl);
        Set<Long> seqs = seqsOf(ids);
        return transaction(() -> {
            Instant now = now();
            long until = now.toEpochMilli() + ttl.toMillis();
            for (long seq : seqs) {
                Remnant r = get(seq).orElseThrow(() -> noSuch(seq));
                if (r.state() == RemnantState.USED) {
                    throw new RemnantConflictException(r.id() + " is already used; it cannot be planned again");
                }
                if (!r.isFreeAt(now) && !planId.equals(r.reservedBy())) {
                    throw new RemnantConflictException(r.id() + " is reserved by plan " + r.reservedBy() + " until "
                            + r.reservedUntil() + "; wait for that plan or choose another remnant");
                }
                update("UPDATE remnant SET state = 'reserved', reserved_by = ?, reserved_until = ? WHERE seq = ?",
                        List.of(planId, until, seq));
            }
            return reservedFor(planId);
        });
    }

    /**
     * Settles a plan once its nest is made, in one transaction: keeps the remnants {@code usedIds} reserved for
     * it (renewed until now + {@code ttl}), returns its other reservations to the rack, records the plan for
     * {@code job}, and hands out {@code offcutCount} new ids held by the plan for the offcuts it will leave, so
     * they can be etched on the sheets before the plan is committed. Ids handed out are never issued again,
     * whether or not the plan is committed.
     *
     * @throws IllegalArgumentException if an id is malformed or not in the inventory
     * @throws RemnantConflictException if the plan was settled before, or a used remnant is no longer reserved
     *                                  by it (its lease expired and another plan took it)
     */
    public synchronized PlanHold hold(String planId, String job, Set<String> usedIds, int offcutCount, Duration ttl) {
        checkPlanId(planId);
        requireNonNull("usedIds", usedIds);
        checkTtl(ttl);
        RemnantSource.job(job, 1); // checks the job name the way offcut sources will carry it
        if (offcutCount < 0 || offcutCount > MAX_OFFCUTS_PER_PLAN) {
            throw new IllegalArgumentException("offcutCount: " + offcutCount + " is out of range; must be 0 to "
                    + MAX_OFFCUTS_PER_PLAN);
        }
        Set<Long> seqs = seqsOf(usedIds);
        return transaction(() -> {
            if (plan(planId).isPresent()) {
                throw new RemnantConflictException("plan " + planId + " was settled before; make a new plan");
            }
            Instant now = now();
            long until = now.toEpochMilli() + ttl.toMillis();
            List<Remnant> kept = new ArrayList<>();
            for (long seq : seqs) {
                Remnant r = get(seq).orElseThrow(() -> noSuch(seq));
                if (r.state() != RemnantState.RESERVED || !planId.equals(r.reservedBy())) {
                    String state = r.state() == RemnantState.RESERVED
                            ? "reserved by plan " + r.reservedBy() + " until " + r.reservedUntil() : r.state().word();
                    throw new RemnantConflictException(r.id() + " is no longer reserved by plan " + planId + " (it is "
                            + state + "); its reservation ran out while nesting; nest again");
                }
                update("UPDATE remnant SET reserved_until = ? WHERE seq = ?", List.of(until, seq));
                kept.add(get(seq).orElseThrow());
            }
            releaseAllBut(planId, seqs);
            update("INSERT INTO plan (id, job, made, committed) VALUES (?, ?, ?, NULL)",
                    List.of(planId, RemnantSource.job(job, 1).job(), now.toString()));
            long issued = highestIssued();
            List<String> ids = new ArrayList<>();
            for (int i = 1; i <= offcutCount; i++) {
                update("INSERT INTO plan_offcut_id (seq, plan_id) VALUES (?, ?)", List.of(issued + i, planId));
                ids.add(RemnantId.format(issued + i));
            }
            if (offcutCount > 0) {
                int n = update("UPDATE sqlite_sequence SET seq = ? WHERE name = 'remnant'", List.of(issued + offcutCount));
                if (n == 0) {
                    update("INSERT INTO sqlite_sequence (name, seq) VALUES ('remnant', ?)", List.of(issued + offcutCount));
                }
            }
            return new PlanHold(planId, List.copyOf(kept), List.copyOf(ids), Instant.ofEpochMilli(until));
        });
    }

    /**
     * Commits a settled plan in one transaction: marks {@code usedIds} used, returns the plan's other
     * reservations to the rack, records each of {@code offcuts} as {@code available} under the id the plan
     * holds for it, and marks the plan committed. A plan is committed at most once. If anything is refused or
     * fails, nothing changes.
     *
     * @param offcuts the new offcuts by the ids {@link #hold} handed out (some ids may be left out; they stay unused)
     * @return the new offcuts' records, in the order given
     * @throws IllegalArgumentException if the plan is not in this inventory or an offcut id is not held by it
     * @throws RemnantConflictException if the plan was already committed, or a used remnant is not (or no longer)
     *                                  reserved by it
     */
    public synchronized List<Remnant> commitPlan(String planId, Set<String> usedIds, Map<String, NewRemnant> offcuts) {
        checkPlanId(planId);
        requireNonNull("usedIds", usedIds);
        requireNonNull("offcuts", offcuts);
        Set<Long> seqs = seqsOf(usedIds);
        Map<Long, NewRemnant> bySeq = new LinkedHashMap<>();
        for (Map.Entry<String, NewRemnant> e : offcuts.entrySet()) {
            requireNonNull("offcut " + e.getKey(), e.getValue());
            bySeq.put(RemnantId.parse(e.getKey()), e.getValue());
        }
        return transaction(() -> {
            PlanRecord plan = plan(planId).orElseThrow(() -> new IllegalArgumentException("plan " + planId
                    + " is not in " + file + "; commit it to the inventory it was nested against"));
            if (plan.committed() != null) {
                throw new RemnantConflictException("plan " + planId + " was already committed at " + plan.committed()
                        + "; nothing was changed");
            }
            markUsed(planId, seqs);
            releaseAllBut(planId, Set.of());
            Instant now = now();
            List<Remnant> added = new ArrayList<>();
            for (Map.Entry<Long, NewRemnant> e : bySeq.entrySet()) {
                String id = RemnantId.format(e.getKey());
                List<String> holder = new ArrayList<>();
                try (PreparedStatement p = db.prepareStatement("SELECT plan_id FROM plan_offcut_id WHERE seq = ?")) {
                    p.setLong(1, e.getKey());
                    try (ResultSet rs = p.executeQuery()) {
                        while (rs.next()) {
                            holder.add(rs.getString(1));
                        }
                    }
                }
                if (!holder.equals(List.of(planId))) {
                    throw new IllegalArgumentException("offcut id " + id + " is not held by plan " + planId);
                }
                if (get(e.getKey()).isPresent()) {
                    throw new IllegalStateException("commit: " + id + " is already recorded");
                }
                added.add(get(insert(e.getValue(), e.getKey(), now, RemnantState.AVAILABLE)).orElseThrow());
                faults.reached("commit:offcut " + added.size());
            }
            update("UPDATE plan SET committed = ? WHERE id = ?", List.of(now.toString(), planId));
            return List.copyOf(added);
        });
    }

    /** The plan {@code planId} as recorded by {@link #hold}, if this inventory has it. */
    public synchronized Optional<PlanRecord> findPlan(String planId) {
        checkPlanId(planId);
        return read(() -> plan(planId));
    }

    private Optional<PlanRecord> plan(String planId) throws SQLException {
        try (PreparedStatement p = db.prepareStatement("SELECT id, job, made, committed FROM plan WHERE id = ?")) {
            p.setString(1, planId);
            try (ResultSet rs = p.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                String committed = rs.getString("committed");
                return Optional.of(new PlanRecord(rs.getString("id"), rs.getString("job"),
                        Instant.parse(rs.getString("made")), committed == null ? null : Instant.parse(committed)));
            }
        }
    }

    private static void checkTtl(Duration ttl) {
        if (ttl == null || ttl.isNegative() || ttl.isZero() || ttl.compareTo(MAX_TTL) > 0) {
            throw new IllegalArgumentException("ttl: " + ttl + " is out of range; must be > 0 and at most " + MAX_TTL);
        }
    }

    // ---------------------------------------------------------------- CSV

    /**
     * Imports remnants from a CSV file (see {@link #exportCsv}). All rows or none: the first bad row
     * aborts the import with a message naming the row (the header is row 1) and the column.
     * Rows with an id keep it (it must not be in use or have been issued before); rows without one get a
     * new id. A {@code reserved} state is imported as {@code available}: reservations do not travel.
     *
     * @return the imported remnants, in file order
     */
    public synchronized List<Remnant> importCsv(Path csv) {
        requireNonNull("csv", csv);
        List<RemnantCsv.Row> rows = RemnantCsv.read(csv, clock);
        return transaction(() -> {
            long issued = highestIssued();
            Set<Long> seen = new TreeSet<>();
            for (RemnantCsv.Row row : rows) {
                if (row.seq() != null) {
                    String id = RemnantId.format(row.seq());
                    if (!seen.add(row.seq())) {
                        throw new IllegalArgumentException(csv + " row " + row.number() + ", column id: " + id
                                + " appears twice in the file");
                    }
                    if (get(row.seq()).isPresent()) {
                        throw new IllegalArgumentException(csv + " row " + row.number() + ", column id: " + id
                                + " is already in " + file);
                    }
                    if (row.seq() <= issued) {
                        throw new IllegalArgumentException(csv + " row " + row.number() + ", column id: " + id
                                + " was issued before and removed; ids are never reused (leave the cell empty)");
                    }
                }
            }
            Long[] assigned = new Long[rows.size()];
            for (int i = 0; i < rows.size(); i++) {
                RemnantCsv.Row row = rows.get(i);
                if (row.seq() != null) {
                    assigned[i] = insert(row.remnant(), row.seq(), row.added(), row.state());
                }
            }
            for (int i = 0; i < rows.size(); i++) {
                RemnantCsv.Row row = rows.get(i);
                if (row.seq() == null) {
                    assigned[i] = insert(row.remnant(), null, row.added(), row.state());
                }
            }
            List<Remnant> out = new ArrayList<>();
            for (Long seq : assigned) {
                out.add(get(seq).orElseThrow());
            }
            return List.copyOf(out);
        });
    }

    /** Writes every remnant, by id, as CSV with a header row (columns in {@link RemnantCsv#HEADER}). */
    public synchronized void exportCsv(Writer out) {
        requireNonNull("out", out);
        List<Remnant> all = list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID);
        RemnantCsv.write(all, out);
    }

    @Override
    public synchronized void close() {
        closeQuietly(db);
    }

    // ---------------------------------------------------------------- internals

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.SECONDS);
    }

    private long highestIssued() throws SQLException {
        try (Statement s = db.createStatement();
             ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(seq), 0) FROM sqlite_sequence WHERE name = 'remnant'")) {
            return rs.getLong(1);
        }
    }

    private long insert(NewRemnant r, Long seq, Instant added, RemnantState state) throws SQLException {
        RemnantState stored = state == RemnantState.RESERVED ? RemnantState.AVAILABLE : state;
        try (PreparedStatement p = db.prepareStatement("INSERT INTO remnant (seq, material, gauge, thickness_mm,"
                + " outline, width_mm, height_mm, area_mm2, location, added, source, state)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            if (seq == null) {
                p.setNull(1, Types.INTEGER);
            } else {
                p.setLong(1, seq);
            }
            p.setString(2, r.material().word());
            if (r.gauge() == null) {
                p.setNull(3, Types.INTEGER);
            } else {
                p.setInt(3, r.gauge());
            }
            if (r.thicknessMm() == null) {
                p.setNull(4, Types.REAL);
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
        try (Statement s = db.createStatement(); ResultSet rs = s.executeQuery("SELECT last_insert_rowid()")) {
            return rs.getLong(1);
        }
    }

    private Optional<Remnant> get(long seq) throws SQLException {
        List<Remnant> found = query("SELECT " + COLUMNS + " FROM remnant WHERE seq = ?", List.of(seq));
        return found.isEmpty() ? Optional.empty() : Optional.of(found.get(0));
    }

    private static String where(RemnantFilter f, List<Object> args, boolean excludeUsed) {
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

    private List<Remnant> query(String sql, List<?> args) throws SQLException {
        try (PreparedStatement p = db.prepareStatement(sql)) {
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

    private int update(String sql, List<?> args) throws SQLException {
        try (PreparedStatement p = db.prepareStatement(sql)) {
            bind(p, args);
            return p.executeUpdate();
        }
    }

    private static void bind(PreparedStatement p, List<?> args) throws SQLException {
        for (int i = 0; i < args.size(); i++) {
            p.setObject(i + 1, args.get(i));
        }
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

    private IllegalArgumentException noSuch(long seq) {
        return new IllegalArgumentException("no remnant " + RemnantId.format(seq) + " in " + file);
    }

    /** The sequence numbers of {@code ids}, ascending and without repeats. */
    private static Set<Long> seqsOf(Collection<String> ids) {
        Set<Long> seqs = new TreeSet<>();
        for (String id : ids) {
            seqs.add(RemnantId.parse(id));
        }
        return seqs;
    }

    private static void checkPlanId(String planId) {
        if (planId == null || planId.isBlank() || planId.length() > 100
                || planId.chars().anyMatch(Character::isISOControl) || !planId.equals(planId.strip())) {
            throw new IllegalArgumentException("planId: '" + planId
                    + "' must be 1 to 100 printable characters without surrounding blanks");
        }
    }

    private static void requireNonNull(String field, Object value) {
        if (value == null) {
            throw new IllegalArgumentException(field + ": is null");
        }
    }

    private static void closeQuietly(Connection c) {
        if (c != null) {
            try {
                c.close();
            } catch (SQLException ignored) {
                // closing is best effort; the data is already committed or rolled back
            }
        }
    }

    @FunctionalInterface
    private interface SqlWork<T> {
        T run() throws SQLException;
    }

    private <T> T read(SqlWork<T> work) {
        try {
            return work.run();
        } catch (SQLException e) {
            throw new InventoryStorageException("inventory: cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    /** Runs {@code work} in one BEGIN IMMEDIATE transaction; any exception rolls everything back. */
    private <T> T transaction(SqlWork<T> work) {
        try {
            try (Statement s = db.createStatement()) {
                s.execute("BEGIN IMMEDIATE");
            }
        } catch (SQLException e) {
            throw new InventoryStorageException("inventory: cannot start a change in " + file + ": "
                    + e.getMessage(), e);
        }
        boolean done = false;
        try {
            T result = work.run();
            try (Statement s = db.createStatement()) {
                s.execute("COMMIT");
            }
            done = true;
            return result;
        } catch (SQLException e) {
            throw new InventoryStorageException("inventory: cannot write " + file + ": " + e.getMessage(), e);
        } finally {
            if (!done) {
                try (Statement s = db.createStatement()) {
                    s.execute("ROLLBACK");
                } catch (SQLException ignored) {
                    // the transaction is already gone (e.g. the connection broke); SQLite rolls it back
                }
            }
        }
    }
}
