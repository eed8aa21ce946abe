package dev.sheetwright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** Test-side reading of a nest's nest.json. */
final class NestDoc {
    private NestDoc() {
    }

    /**
     * The nest.json of output folder {@code out}, after checking that nothing was left unplaced; {@code placed} is
     * how many parts it puts on its sheets, asserted with {@code what} as the message.
     */
    static JsonNode allPlaced(Path out, int placed, String what) throws IOException {
        JsonNode doc = new ObjectMapper().readTree(out.resolve("nest.json").toFile());
        assertEquals(0, doc.get("unplaced").size(), "unplaced pieces");
        int n = 0;
        for (JsonNode sheet : doc.get("sheets")) {
            n += sheet.get("parts").size();
        }
        assertEquals(placed, n, what);
        return doc;
    }
}
