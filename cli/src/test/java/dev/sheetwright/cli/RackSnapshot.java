package dev.sheetwright.cli;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

/** Every row of an inventory file (remnants, id counter, plans, held ids), to compare before and after a command. */
final class RackSnapshot {
    private RackSnapshot() {
    }

    static List<String> of(Path file) {
        List<String> rows = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
             Statement s = c.createStatement()) {
            for (String sql : List.of("SELECT * FROM remnant ORDER BY seq",
                    "SELECT name, seq FROM sqlite_sequence ORDER BY name", "SELECT * FROM plan ORDER BY id",
                    "SELECT * FROM plan_offcut_id ORDER BY seq")) {
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
}
