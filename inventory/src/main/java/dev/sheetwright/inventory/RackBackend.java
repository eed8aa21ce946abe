package dev.sheetwright.inventory;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;

/**
 * What differs between the database engines a rack can live in; all other SQL is shared (see {@link RackDb}).
 * Package-private.
 */
interface RackBackend {

    /** Where the rack is. */
    RackLocation location();

    /**
     * Connects. When {@code mayCreate} is false and there is no rack file, refuses instead of creating one.
     *
     * @throws RackAccessException naming the location and what failed
     */
    Connection connect(boolean mayCreate);

    /** Prepares a new connection once it is known to hold a rack (or to be about to hold one). */
    void configure(Connection db) throws SQLException;

    /** Starts a changing transaction; every change is all or nothing and serialised with other writers. */
    void begin(Connection db) throws SQLException;

    void commit(Connection db) throws SQLException;

    void rollback(Connection db) throws SQLException;

    /** True when the transaction lost a race with another writer and may simply be run again. */
    boolean retryable(SQLException e);

    /** Called inside the migrating transaction before anything is read, so two first openings do not race. */
    void lockSchema(Connection db) throws SQLException;

    /** The migrations' shared DDL in this engine's types. */
    String ddl(String sql);

    /** Statements run before the migrations: this engine's id counter table, when it needs one. */
    List<String> bootstrap();

    /** The table {@code (name, seq)} that remembers the highest remnant id ever issued. */
    String counterTable();

    /** True when the database's own tables (not this program's) are named like this, e.g. SQLite's. */
    boolean isEngineTable(String name);

    /** A message for an SQL failure on this backend: what happened, with the location. */
    String describe(SQLException e);
}
