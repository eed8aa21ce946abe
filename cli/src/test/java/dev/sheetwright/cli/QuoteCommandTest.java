package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code sheetwright quote} on small jobs (one 8 in pipe wrap fits one 48 x 120 sheet). */
class QuoteCommandTest {

    private static final double EPS = 1e-9;

    @TempDir
    Path tmp;

    private Path job(String gauge, String quoteSection) throws Exception {
        Path job = tmp.resolve("job.yaml");
        Files.writeString(job, String.join("\n", "job: quote check", "units: in",
                "material: {type: galvanized, gauge: " + gauge + "}",
                "stock: {sheets: [{size: 48x120, cost: 62.50}]}",
                "fittings:", "  - {id: P8, type: pipe, diameter: 8, length: 24}", quoteSection, ""));
        return job;
    }

    private JsonNode quoteJson(Path out) throws Exception {
        return new ObjectMapper().readTree(out.resolve("quote.json").toFile());
    }

    @Test
    void quote_jobPricedByWeightWithMachineRate_printsTableAndWritesFiles() throws Exception {
        // $8.75 per 100 lb on 24 ga: $0.10115 per ft2 [S:LONG p.102, problem 25A] (computed); 40 ft2 -> $4.046
        Path job = job("24", "quote: {currency: usd, price-per-lb: 0.0875, machine-rate: 90}\n"
                + "cutting: {lead-in: 3/16, lead-out: 0}");
        Path out = tmp.resolve("q");

        CommandRun run = CommandRun.of("quote", job.toString(), "-o", out.toString(), "--time", "0");

        assertEquals(0, run.exitCode(), run::toString);
        JsonNode q = quoteJson(out);
        JsonNode t = q.get("totals");
        assertEquals(46.24, t.get("stockWeight").asDouble(), EPS); // 40 ft2 x 1.156 [S:LONG p.102] [S:SMACNA-GALV]
        assertEquals(40 * 0.10115, t.get("materialCost").asDouble(), EPS);
        assertEquals("USD", q.get("currency").asText());
        assertEquals(t.get("cutMinutes").asDouble() / 60 * 90, t.get("machineCost").asDouble(), EPS);
        assertEquals(t.get("materialCost").asDouble() + t.get("machineCost").asDouble(),
                t.get("totalCost").asDouble(), EPS);
        assertEquals(t.get("pierces").asInt() * 0.1875, t.get("leadInLength").asDouble(), EPS);
        assertEquals(t.get("contourLength").asDouble() + t.get("leadInLength").asDouble(),
                t.get("cutLength").asDouble(), EPS);
        assertTrue(run.out().contains("by weight (job)"), run::toString);
        assertTrue(run.out().contains("46.24"), run::toString);
        assertTrue(run.out().contains("USD"), run::toString);
        assertTrue(Files.isRegularFile(out.resolve("report.pdf")));
    }

    @Test
    void quote_shopFile_overridesChartRapidLoadAndRate_andSaysSo() throws Exception {
        Path job = job("24", "");
        Path shop = tmp.resolve("shop.yaml");
        Files.writeString(shop, String.join("\n", "units: in", "currency: USD", "machine-rate: 120",
                "load-minutes: 3", "rapid-speed: {plasma: 1000}",
                "cut-chart:",
                "  - {process: plasma, material: galvanized, gauge: 24, speed: 200, pierce: 0.3, height-sense: 1.5}",
                ""));
        Path out = tmp.resolve("q");

        CommandRun run = CommandRun.of("quote", job.toString(), "--shop", shop.toString(), "-o", out.toString(),
                "--time", "0");

        assertEquals(0, run.exitCode(), run::toString);
        JsonNode q = quoteJson(out);
        for (JsonNode r : q.get("rates")) {
            String key = r.get("key").asText();
            if (List.of("cutSpeed", "pierce", "heightSense", "rapidSpeed", "loadMinutes", "machineRate")
                    .contains(key)) {
                assertEquals("shop", r.get("source").asText(), key);
            }
            if (key.equals("cutSpeed")) {
                assertEquals(200, r.get("value").asDouble(), 1e-9);
            }
        }
        JsonNode by = q.get("totals").get("cutMinutesBy");
        // §9.5 terms with the shop's numbers: cut length / 200 in/min, pierces x 1.8 s, 3 min per sheet
        JsonNode t = q.get("totals");
        assertEquals(t.get("cutLength").asDouble() / 200, by.get("cutting").asDouble(), EPS);
        assertEquals(t.get("pierces").asInt() * 1.8 / 60, by.get("piercing").asDouble(), EPS);
        assertEquals(t.get("rapidLength").asDouble() / 1000, by.get("rapids").asDouble(), EPS);
        assertEquals(3.0, by.get("handling").asDouble(), EPS);
        assertFalse(q.get("warnings").toString().contains("interpolated"), "a shop row at the exact thickness");
    }

    @Test
    void quote_withoutOut_printsOnlyAndWritesNothing() throws Exception {
        Path job = job("26", "");
        CommandRun run = CommandRun.of("quote", job.toString(), "--time", "0");
        assertEquals(0, run.exitCode(), run::toString);
        // 26 ga galvanized 0.906 lb/ft2 [S:SMACNA-GALV]: 40 ft2 -> 36.24 lb (computed)
        assertTrue(run.out().contains("36.24"), run::toString);
        try (var files = Files.list(tmp)) {
            assertEquals(List.of(job), files.toList());
        }
    }

    @Test
    void quote_unknownQuoteKey_exit2NamesFileAndFieldAndWritesNothing() throws Exception {
        Path job = job("24", "quote: {price-per-ton: 900}");
        Path out = tmp.resolve("never");
        CommandRun run = CommandRun.of("quote", job.toString(), "-o", out.toString(), "--time", "0");
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("job.yaml: field 'quote.price-per-ton': unknown field"), run::toString);
        assertFalse(Files.exists(out));
    }

    @Test
    void quote_shopRowWithoutPierce_exit2NamesTheField() throws Exception {
        Path job = job("24", "");
        Path shop = tmp.resolve("shop.yaml");
        Files.writeString(shop, "units: in\ncut-chart:\n  - {process: plasma, material: galvanized, gauge: 24,"
                + " speed: 200, height-sense: 1.5}\n");
        Path out = tmp.resolve("never");
        CommandRun run = CommandRun.of("quote", job.toString(), "--shop", shop.toString(), "-o", out.toString());
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("shop.yaml: field 'cut-chart[1].pierce': is required"), run::toString);
        assertFalse(Files.exists(out));
    }

    @Test
    void quote_bothPricesPerWeight_exit2() throws Exception {
        Path job = job("24", "quote: {price-per-lb: 1, price-per-kg: 2}");
        CommandRun run = CommandRun.of("quote", job.toString(), "--time", "0");
        assertEquals(2, run.exitCode(), run::toString);
        assertTrue(run.err().contains("field 'quote.price-per-kg': give price-per-lb or price-per-kg, not both"),
                run::toString);
    }
}
