package dev.sheetwright.inventory;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

/** Reads a database file's raw rows (remnants, id counter, schema versions) to compare before and after. */
final class InventorySnapshot {
    private InventorySnapshot() {
    }

    static List<String> of(Path file) {
        List<String> rows = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
             Statement s = c.createStatement()) {
            dump(s, "SELECT * FROM remnant ORDER BY seq", rows);
            dump(s, "SELECT name, seq FROM sqlite_sequence ORDER BY name", rows);
            dump(s, "SELECT * FROM schema_version ORDER BY version", rows);
            dump(s, "SELECT * FROM plan ORDER BY id", rows);
            dump(s, "SELECT * FROM plan_offcut_id ORDER BY seq", rows);
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
        return rows;
    }

    static void execute(Path file, String sql) {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
             Statement s = c.createStatement()) {
            s.execute(sql);
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
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
}
