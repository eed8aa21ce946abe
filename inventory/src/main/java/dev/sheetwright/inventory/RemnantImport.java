package dev.sheetwright.inventory;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/** CSV import: every row or none. Package-private; reached through {@link RemnantStore#importCsv}. */
final class RemnantImport {
    private final RackDb db;

    RemnantImport(RackDb db) {
        this.db = db;
    }

    List<Remnant> importCsv(Path csv) {
        RackDb.requireNonNull("csv", csv);
        List<RemnantCsv.Row> rows = RemnantCsv.read(csv, db.clock);
        return db.transaction(() -> {
            long issued = db.highestIssued();
            Set<Long> seen = new TreeSet<>();
            for (RemnantCsv.Row row : rows) {
                if (row.seq() != null) {
                    String id = RemnantId.format(row.seq());
                    if (!seen.add(row.seq())) {
                        throw new IllegalArgumentException(csv + " row " + row.number() + ", column id: " + id
                                + " appears twice in the file");
                    }
                    if (db.get(row.seq()).isPresent()) {
                        throw new IllegalArgumentException(csv + " row " + row.number() + ", column id: " + id
                                + " is already in " + db.location());
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
                    assigned[i] = db.insert(row.remnant(), row.seq(), row.added(), row.state());
                }
            }
            for (int i = 0; i < rows.size(); i++) {
                RemnantCsv.Row row = rows.get(i);
                if (row.seq() == null) {
                    assigned[i] = db.insert(row.remnant(), null, row.added(), row.state());
                }
            }
            List<Remnant> out = new ArrayList<>();
            for (Long seq : assigned) {
                out.add(db.get(seq).orElseThrow());
            }
            return List.copyOf(out);
        });
    }
}
