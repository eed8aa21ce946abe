package dev.sheetwright.inventory;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.SQLException;
import org.junit.jupiter.api.Test;

/** Which server refusals a change runs again for (PostgreSQL documentation, section 13.5). */
class PostgresRetryTest {
    @Test
    void serializationFailuresDeadlocksAndKeysTwoWritersBothChoseAreRunAgain() {
        assertTrue(PostgresBackend.refusedForRace(new SQLException("could not serialize", "40001")));
        assertTrue(PostgresBackend.refusedForRace(new SQLException("deadlock detected", "40P01")));
        assertTrue(PostgresBackend.refusedForRace(new SQLException("duplicate key value", "23505")));
        assertTrue(PostgresBackend.refusedForRace(new SQLException("batch failed", "08000",
                new SQLException("duplicate key value", "23505"))), "a refusal wrapped in another");
    }

    @Test
    void otherRefusalsAreReportedAtOnce() {
        assertFalse(PostgresBackend.refusedForRace(new SQLException("foreign key", "23503")));
        assertFalse(PostgresBackend.refusedForRace(new SQLException("connection refused", "08001")));
        assertFalse(PostgresBackend.refusedForRace(new SQLException("no state")));
    }
}
