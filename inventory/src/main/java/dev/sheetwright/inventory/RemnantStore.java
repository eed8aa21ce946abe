package dev.sheetwright.inventory;

import java.io.Writer;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * The remnant rack, in millimetres: in a SQLite file (the embedded default) or in a PostgreSQL database. The work
 * is split by concern: {@link RackSchema} opens and migrates, {@link RemnantRecords} keeps the records,
 * {@link RemnantLeases} the reservations, {@link RackPlans} the plans, {@link RemnantImport} the CSV import; all
 * share the SQL of {@link RackDb}, and the backend ({@link SqliteBackend}, {@link PostgresBackend}) supplies only
 * what the engines do differently.
 *
 * <p>Every changing call is one transaction: it happens completely or not at all, also when the process dies
 * halfway. On SQLite writers queue on the file's write lock; on PostgreSQL changes run SERIALIZABLE and a change
 * that lost a race is run again. A store object is safe to share between threads (its methods are synchronized),
 * but each planner normally opens its own.
 *
 * <p>Reservations are leases: {@link #reserve} flips matching {@code available} remnants to {@code reserved} for a
 * plan until an expiry time; once that time has passed another plan may take them. {@link #hold} settles a plan
 * (keeps what it cuts, records what it leaves and hands out ids for that), {@link #commitPlan} records it as cut,
 * all at once and only once, and {@link #releasePlan} hands its reservations back.
 */
public final class RemnantStore implements AutoCloseable {
    /** Longest reservation accepted. */
    public static final Duration MAX_TTL = RemnantLeases.MAX_TTL;
    /** Most offcut ids one plan may hold. */
    public static final int MAX_OFFCUTS_PER_PLAN = RackPlans.MAX_OFFCUTS_PER_PLAN;
    /** The environment variable that names the rack when {@code --inventory} is not given. */
    public static final String ENVIRONMENT_VARIABLE = "SHEETWRIGHT_INVENTORY";

    private final RackDb db;
    private final RemnantRecords records;
    private final RemnantLeases leases;
    private final RackPlans plans;
    private final RemnantImport imports;

    private RemnantStore(RackDb db) {
        this.db = db;
        this.records = new RemnantRecords(db);
        this.leases = new RemnantLeases(db);
        this.plans = new RackPlans(db, leases);
        this.imports = new RemnantImport(db);
    }

    /** {@code ~/.sheetwright/remnants.db}. */
    public static Path defaultPath() {
        return Path.of(System.getProperty("user.home"), ".sheetwright", "remnants.db");
    }

    /**
     * Opens the rack at {@code location}, bringing its schema up to date. When {@code mayCreate}, a missing file or
     * an empty database becomes a new rack; otherwise they are refused.
     *
     * @throws RackAccessException if there is no rack and none may be made, the database is another program's, or
     *                             the server cannot be reached (the message says which)
     */
    public static RemnantStore open(RackLocation location, boolean mayCreate) {
        return open(location, mayCreate, Clock.systemUTC());
    }

    /** As {@link #open(RackLocation, boolean)}, reading the time from {@code clock}. */
    public static RemnantStore open(RackLocation location, boolean mayCreate, Clock clock) {
        return open(backend(location), mayCreate, clock, Migrations.ALL, FaultPoint.NONE);
    }

    /** Opens the SQLite rack in {@code file}, creating it on first use. */
    public static RemnantStore open(Path file) {
        return open(new RackLocation.File(file), true);
    }

    /** As {@link #open(Path)}, reading the time from {@code clock} (for reservation expiry and dates). */
    public static RemnantStore open(Path file, Clock clock) {
        return open(new RackLocation.File(file), true, clock);
    }

    static RemnantStore open(RackBackend backend, boolean mayCreate, Clock clock, List<Migration> migrations,
            FaultPoint faults) {
        return new RemnantStore(RackSchema.open(backend, mayCreate, clock, migrations, faults));
    }

    static RackBackend backend(RackLocation location) {
        if (location == null) {
            throw new IllegalArgumentException("inventory: location is null");
        }
        if (location instanceof RackLocation.Server s) {
            return new PostgresBackend(s, System.getenv("PGPASSWORD"));
        }
        return new SqliteBackend((RackLocation.File) location);
    }

    /** Where the rack is. */
    public RackLocation location() {
        return db.location();
    }

    /** The schema version of the open rack. */
    public synchronized int schemaVersion() {
        return db.read(() -> (int) db.number("SELECT COALESCE(MAX(version), 0) FROM schema_version", List.of()));
    }

    // ---------------------------------------------------------------- records

    /** Records a new remnant as {@code available} and returns it with its new id. */
    public synchronized Remnant add(NewRemnant remnant) {
        return records.add(remnant);
    }

    /** The remnant with this id, if there is one. */
    public synchronized Optional<Remnant> get(String id) {
        return records.get(id);
    }

    /** The remnants matching {@code filter}, in {@code sort} order. */
    public synchronized List<Remnant> list(RemnantFilter filter, RemnantSort sort) {
        return records.list(filter, sort);
    }

    /**
     * Deletes a remnant (its id is never issued again).
     *
     * @throws IllegalArgumentException if there is no such remnant
     * @throws RemnantConflictException if a plan holds an unexpired reservation on it
     */
    public void remove(String id) {
        removeAll(List.of(id));
    }

    /** Deletes several remnants at once: all of them, or, if one cannot be removed, none. */
    public synchronized void removeAll(Collection<String> ids) {
        records.removeAll(ids);
    }

    // ---------------------------------------------------------------- reservations

    /** Reserves every free remnant matching {@code filter} for {@code planId}; see the four-argument form. */
    public List<Remnant> reserve(RemnantFilter filter, String planId, Duration ttl) {
        return reserve(filter, planId, ttl, Integer.MAX_VALUE);
    }

    /**
     * Reserves for {@code planId}, until now + {@code ttl}, up to {@code maxCount} free remnants matching
     * {@code filter} (smallest area first). Free means {@code available}, or {@code reserved} with an expired lease.
     * Reservations the plan already holds are renewed to the same expiry. Used remnants are never reserved.
     *
     * @return every remnant now reserved for the plan (earlier ones included), by id
     */
    public synchronized List<Remnant> reserve(RemnantFilter filter, String planId, Duration ttl, int maxCount) {
        return leases.reserve(filter, planId, ttl, maxCount);
    }

    /**
     * Reserves exactly the remnants {@code ids} for {@code planId} until now + {@code ttl}: all of them or none.
     *
     * @throws IllegalArgumentException if an id is malformed or not in the inventory
     * @throws RemnantConflictException if one is used, or reserved by another plan whose lease has not expired
     */
    public synchronized List<Remnant> reserveIds(Collection<String> ids, String planId, Duration ttl) {
        return leases.reserveIds(ids, planId, ttl);
    }

    /** The remnants currently reserved for {@code planId} (expired leases included until someone takes them). */
    public synchronized List<Remnant> reservedFor(String planId) {
        return leases.reservedFor(planId);
    }

    /** Returns every remnant reserved for {@code planId} to {@code available}; returns how many. */
    public synchronized int release(String planId) {
        return leases.release(planId);
    }

    // ---------------------------------------------------------------- plans

    /**
     * Settles a plan once its nest is made, in one transaction: keeps the remnants {@code usedIds} reserved for it
     * (renewed until now + {@code ttl}), returns its other reservations to the rack, records the plan for
     * {@code job} with what it cuts and the {@code offcuts} it will leave, and hands out one new id per offcut (in
     * order), so they can be etched on the sheets before the plan is committed. Ids handed out are never issued
     * again, whether or not the plan is committed.
     *
     * @throws IllegalArgumentException if an id is malformed or not in the inventory
     * @throws RemnantConflictException if the plan was settled before, or a used remnant is no longer reserved by it
     */
    public synchronized PlanHold hold(String planId, String job, Set<String> usedIds, List<NewRemnant> offcuts,
            Duration ttl) {
        return plans.hold(planId, job, usedIds, offcuts, ttl);
    }

    /**
     * Commits a settled plan in one transaction, from what the rack recorded when it was settled: marks the
     * remnants it cuts used, returns its other reservations to the rack, records each of its offcuts as
     * {@code available} at {@code location} under the id held for it, and marks the plan committed. A plan is
     * committed at most once, and never after it was released. If anything is refused or fails, nothing changes.
     *
     * @return the new offcuts' records, in id order
     * @throws IllegalArgumentException if the plan is not in this inventory
     * @throws RemnantConflictException if it was committed or released before, or a remnant it cuts is no longer
     *                                  reserved by it
     */
    public synchronized List<Remnant> commitPlan(String planId, String location) {
        return plans.commit(planId, location);
    }

    /**
     * Hands a settled plan's reservations back to the rack and marks it released, so it can no longer be
     * committed; the offcut ids it held stay unused. Releasing twice is harmless.
     *
     * @return how many remnants went back
     * @throws IllegalArgumentException if the plan is not in this inventory
     * @throws RemnantConflictException if it was committed
     */
    public synchronized int releasePlan(String planId) {
        return plans.release(planId);
    }

    /** The plan {@code planId} as recorded by {@link #hold}, if this inventory has it. */
    public synchronized Optional<PlanRecord> findPlan(String planId) {
        return plans.find(planId);
    }

    // ---------------------------------------------------------------- CSV

    /**
     * Imports remnants from a CSV file (see {@link #exportCsv}). All rows or none: the first bad row aborts the
     * import with a message naming the row (the header is row 1) and the column. Rows with an id keep it (it must
     * not be in use or have been issued before); rows without one get a new id. A {@code reserved} state is
     * imported as {@code available}: reservations do not travel.
     *
     * @return the imported remnants, in file order
     */
    public synchronized List<Remnant> importCsv(Path csv) {
        return imports.importCsv(csv);
    }

    /** Writes every remnant, by id, as CSV with a header row (columns in {@link RemnantCsv#HEADER}). */
    public synchronized void exportCsv(Writer out) {
        RackDb.requireNonNull("out", out);
        RemnantCsv.write(list(RemnantFilter.any().withIncludeUsed(true), RemnantSort.ID), out);
    }

    @Override
    public synchronized void close() {
        db.close();
    }
}
