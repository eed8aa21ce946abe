package dev.sheetwright.inventory;

import java.util.List;

/** The schema history. To change the schema, append a migration with the next version; never edit one. */
final class Migrations {
    private Migrations() {
    }

    static final Migration V1 = new Migration(1, "initial schema", List.of(
            """
            CREATE TABLE remnant (
                seq            INTEGER PRIMARY KEY AUTOINCREMENT,
                material       TEXT    NOT NULL,
                gauge          INTEGER,
                thickness_mm   REAL,
                outline        TEXT    NOT NULL,
                width_mm       REAL    NOT NULL CHECK (width_mm > 0),
                height_mm      REAL    NOT NULL CHECK (height_mm > 0),
                area_mm2       REAL    NOT NULL CHECK (area_mm2 > 0),
                location       TEXT    NOT NULL,
                added          TEXT    NOT NULL,
                source         TEXT    NOT NULL,
                state          TEXT    NOT NULL CHECK (state IN ('available','reserved','used')),
                reserved_by    TEXT,
                reserved_until INTEGER,
                CHECK (gauge IS NOT NULL OR thickness_mm IS NOT NULL),
                CHECK ((state = 'reserved') = (reserved_by IS NOT NULL AND reserved_until IS NOT NULL))
            )""",
            "CREATE INDEX remnant_by_state ON remnant (state, material)",
            "CREATE INDEX remnant_by_plan ON remnant (reserved_by)"));

    /**
     * Plans that nest against the rack: a plan row is made when a nest is settled (its remnants held and ids for
     * its new offcuts handed out) and is marked committed once; {@code plan_offcut_id} holds the ids handed out,
     * so labels etched at nest time match the records made at commit.
     */
    static final Migration V2 = new Migration(2, "plans and offcut ids held by plans", List.of(
            """
            CREATE TABLE plan (
                id         TEXT PRIMARY KEY,
                job        TEXT NOT NULL,
                made       TEXT NOT NULL,
                committed  TEXT
            )""",
            """
            CREATE TABLE plan_offcut_id (
                seq      INTEGER PRIMARY KEY,
                plan_id  TEXT NOT NULL REFERENCES plan (id)
            )""",
            "CREATE INDEX plan_offcut_id_by_plan ON plan_offcut_id (plan_id)"));

    /**
     * What a settled plan cuts and leaves is kept with it, so a commit records what the plan held, not what an edited
     * nest.json says: the remnants it cuts, each offcut's material, thickness, outline and source, and when the plan
     * was released without a commit.
     */
    static final Migration V3 = new Migration(3, "plans keep what they cut and leave; released plans", List.of(
            "ALTER TABLE plan ADD COLUMN remnants_used TEXT",
            "ALTER TABLE plan ADD COLUMN released TEXT",
            "ALTER TABLE plan_offcut_id ADD COLUMN material TEXT",
            "ALTER TABLE plan_offcut_id ADD COLUMN gauge INTEGER",
            "ALTER TABLE plan_offcut_id ADD COLUMN thickness_mm REAL",
            "ALTER TABLE plan_offcut_id ADD COLUMN outline TEXT",
            "ALTER TABLE plan_offcut_id ADD COLUMN source TEXT"));

    /** All migrations, in version order. */
    static final List<Migration> ALL = List.of(V1, V2, V3);
}
