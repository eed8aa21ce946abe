package dev.sheetwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheetwright.cli.output.QuoteCsv;
import dev.sheetwright.cli.output.QuoteText;
import dev.sheetwright.dxf.DxfCheck;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The quote files {@code nest} writes for the demo job, checked against nest.json, the DXFs and outside readers. */
class NestQuoteFilesTest {

    private static final double EPS = 1e-6;

    @TempDir
    static Path tmp;

    static Path out;
    static CommandRun run;
    static JsonNode quote;
    static JsonNode nest;

    @BeforeAll
    static void nestTheDemoJobOnce() throws Exception {
        out = tmp.resolve("out");
        run = CommandRun.of("nest", Fixtures.path("demo-bakery.yaml").toString(), "-o", out.toString(),
                "--iterations", "1");
        assertEquals(0, run.exitCode(), run::toString);
        quote = new ObjectMapper().readTree(out.resolve("quote.json").toFile());
        nest = new ObjectMapper().readTree(out.resolve("nest.json").toFile());
    }

    private static int sheets() {
        return nest.get("sheets").size();
    }

    @Test
    void nest_writesTheQuoteFilesAndPrintsTheSummaryOnce() {
        for (String f : List.of("quote.json", "quote.csv", "report.html", "report.pdf")) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        assertTrue(run.out().contains("Quote: stock "), run::toString);
        String interpolated = "is interpolated between";
        assertEquals(1, run.out().split(interpolated, -1).length - 1, "each warning printed once");
        assertTrue(quote.get("warnings").toString().contains(interpolated));
    }

    @Test
    void quoteJson_demoJob_hasTheDocumentedFieldsAndSources() {
        assertEquals("in", quote.get("units").asText());
        assertEquals("lb", quote.get("weightUnit").asText());
        assertEquals("galvanized", quote.get("material").get("type").asText());
        assertEquals(24, quote.get("material").get("gauge").asInt());
        assertEquals(0.0276, quote.get("material").get("thickness").asDouble(), EPS); // [S:SMACNA-GALV]
        for (String k : List.of("sheets", "stockWeight", "partWeight", "scrapWeight", "utilization", "cutLength",
                "pierces", "cutMinutes", "materialCost", "machineCost", "totalCost")) {
            assertTrue(quote.get("totals").has(k), k);
        }
        for (JsonNode r : quote.get("rates")) {
            assertFalse(r.get("source").asText().isBlank(), r::toString);
        }
        // one 48 x 120 in sheet of 24 ga = 40 ft2 x 1.156 lb/ft2 = 46.24 lb [S:LONG p.102] [S:SMACNA-GALV]
        JsonNode line = quote.get("stock").get(0);
        assertEquals("48x120", line.get("name").asText());
        assertEquals(line.get("count").asInt() * 46.24, line.get("weight").asDouble(), 1e-9);
        assertEquals(line.get("count").asInt() * 62.50, line.get("cost").asDouble(), 1e-9);
    }

    @Test
    void quoteTotals_agreeWithNestJson() {
        JsonNode qt = quote.get("totals");
        JsonNode nt = nest.get("totals");
        assertEquals(sheets(), qt.get("sheets").asInt());
        assertEquals(nt.get("stockArea").asDouble(), qt.get("stockArea").asDouble() * 144, 1e-6);
        assertEquals(nt.get("partArea").asDouble(), quote.get("totals").get("partArea").asDouble() * 144, 1e-6);
        assertEquals(nt.get("utilization").asDouble(), qt.get("utilization").asDouble(), 1e-12);
        // weights from the same areas: 1.156 lb/ft2 [S:SMACNA-GALV]
        assertEquals(qt.get("stockArea").asDouble() * 1.156, qt.get("stockWeight").asDouble(), 1e-9);
        assertEquals(qt.get("stockWeight").asDouble() - qt.get("partWeight").asDouble(),
                qt.get("scrapWeight").asDouble(), 1e-9);
    }

    @Test
    @SuppressWarnings("unchecked")
    void quoteCutLengthAndPierces_agreeWithTheOutsideDxfReader() {
        DxfCheck.requireAvailable();
        double cut = 0;
        int contours = 0;
        for (JsonNode s : nest.get("sheets")) {
            DxfCheck.Result r = DxfCheck.run(List.of("--cut-layers", "CUT"), out.resolve(s.get("file").asText()));
            assertEquals(0, r.exitCode(), () -> r.summary() + r.stderr());
            Map<String, Object> f = r.file(0);
            cut += ((Number) f.get("cut_length")).doubleValue();
            contours += ((Number) f.get("outer_contours")).intValue() + ((Number) f.get("holes")).intValue();
        }
        // the quote reads the torch path: each loop is half a kerf into scrap, so an outline's loop is longer than
        // its contour by at most pi x kerf (a half-kerf circle's worth of outside corners) and a hole's is shorter
        JsonNode t = quote.get("totals");
        double kerf = 0.06; // the job's cutting.kerf
        assertEquals(cut, t.get("contourLength").asDouble(), Math.PI * kerf * contours);
        assertEquals(t.get("contourLength").asDouble() + t.get("leadInLength").asDouble(),
                t.get("cutLength").asDouble(), 1e-9);
        assertEquals(contours, t.get("pierces").asInt());
    }

    @Test
    void quoteCsv_parsesBackWithACsvLibrary() throws Exception {
        List<CSVRecord> rows;
        try (Reader in = Files.newBufferedReader(out.resolve("quote.csv"), StandardCharsets.UTF_8);
             CSVParser p = CSVParser.parse(in, CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true)
                     .get())) {
            rows = p.getRecords();
        }
        assertEquals(quote.get("stock").size() + 1, rows.size());
        CSVRecord total = rows.get(rows.size() - 1);
        assertEquals(QuoteCsv.TOTAL, total.get("line"));
        assertEquals(sheets(), Integer.parseInt(total.get("count")));
        assertEquals(quote.get("totals").get("stockWeight").asDouble(), Double.parseDouble(total.get("weight (lb)")),
                0.005);
        assertEquals(quote.get("totals").get("materialCost").asDouble(), Double.parseDouble(total.get("cost (" + quote.get("currency").asText() + ")")),
                0.005);
        CSVRecord first = rows.get(0);
        assertEquals("48x120", first.get("name"));
        assertEquals(quote.get("stock").get(0).get("area").asDouble(), Double.parseDouble(first.get("area (ft2)")),
                0.0005);
    }

    @Test
    void reportHtml_loadsInHeadlessChromium_withOnePicturePerSheet() throws Exception {
        HeadlessChromium.requireAvailable();
        Path page = out.resolve("report.html");
        String html = Files.readString(page, StandardCharsets.UTF_8);
        String noNamespace = html.replace("http://www.w3.org/2000/svg", "");
        assertFalse(noNamespace.contains("http") || html.contains("<script") || html.contains("<link"),
                "self-contained: no scripts, no links, nothing fetched");
        assertTrue(html.contains("@media print") && html.contains("page-break-before"));

        HeadlessChromium.Run r = HeadlessChromium.dumpDom(page);

        assertEquals(0, r.exitCode(), r::stderr);
        String dom = r.stdout();
        assertTrue(dom.contains("</html>"), "the page loaded to the end");
        assertEquals(sheets(), count(dom, "<svg"), "one picture per sheet");
        assertEquals(sheets(), count(dom, "class=\"sheet\""));
        assertFalse(dom.contains("parsererror"), "no XML/SVG parse error marker");
        String weight = QuoteText.num(quote.get("totals").get("stockWeight").asDouble(), 2) + " lb";
        assertTrue(dom.contains(weight), weight);
        assertTrue(dom.contains("Hand-layout dimensions"));
        assertTrue(dom.contains("zinc oxide fume"));
        Path png = tmp.resolve("report.png");
        HeadlessChromium.Run shot = HeadlessChromium.screenshot(page, png, 1100, 1400);
        assertEquals(0, shot.exitCode(), shot::stderr);
        assertTrue(Files.size(png) > 10_000, "a real picture was rendered");
    }

    @Test
    void reportPdf_hasSummaryPagesOnePagePerSheetAndTheTotals() throws Exception {
        try (PDDocument pdf = Loader.loadPDF(out.resolve("report.pdf").toFile())) {
            PDFTextStripper text = new PDFTextStripper();
            int sheetPages = 0;
            int firstSheetPage = -1;
            for (int i = 1; i <= pdf.getNumberOfPages(); i++) {
                text.setStartPage(i);
                text.setEndPage(i);
                String page = text.getText(pdf);
                Matcher m = Pattern.compile("^Sheet (\\d+) of (\\d+):").matcher(page.strip());
                if (m.find()) {
                    sheetPages++;
                    assertEquals(sheetPages, Integer.parseInt(m.group(1)));
                    assertEquals(sheets(), Integer.parseInt(m.group(2)));
                    firstSheetPage = firstSheetPage < 0 ? i : firstSheetPage;
                }
            }
            assertEquals(sheets(), sheetPages, "one page per sheet");
            assertTrue(firstSheetPage > 1, "summary page(s) first");
            assertTrue(pdf.getNumberOfPages() > firstSheetPage + sheets() - 1, "part list and cautions follow");
            text.setStartPage(1);
            text.setEndPage(firstSheetPage - 1);
            String summary = text.getText(pdf);
            JsonNode t = quote.get("totals");
            for (String expected : List.of(QuoteText.num(t.get("stockWeight").asDouble(), 2) + " lb",
                    QuoteText.num(t.get("partWeight").asDouble(), 2) + " lb",
                    QuoteText.num(t.get("cutLength").asDouble(), 1) + " in",
                    String.format(Locale.ROOT, "%.1f %%", 100 * t.get("utilization").asDouble()),
                    QuoteText.minutes(java.util.OptionalDouble.of(t.get("cutMinutes").asDouble())))) {
                assertTrue(summary.contains(expected), () -> expected + " missing from\n" + summary);
            }
            text.setStartPage(pdf.getNumberOfPages());
            text.setEndPage(pdf.getNumberOfPages());
            assertTrue(text.getText(pdf).contains("zinc oxide fume"));
        }
    }

    private static int count(String s, String what) {
        return s.split(Pattern.quote(what), -1).length - 1;
    }
}
