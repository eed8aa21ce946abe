package dev.sheetwright.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.logging.Handler;
import java.util.logging.LogRecord;
import java.util.logging.Logger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Writing the PDF report prints nothing of the PDF library's own on stderr (no fallback-font warnings). */
class PdfLogNoiseTest {

    @TempDir
    Path tmp;

    @Test
    void quoteWithReport_stderrHasNoLibraryMessages() throws Exception {
        Path job = Files.writeString(tmp.resolve("job.yaml"), "job: quiet\nunits: in\n"
                + "material: {type: galvanized, gauge: 24}\nfittings:\n"
                + "  - {id: P1, type: pipe, diameter: 8, length: 24}\n");
        List<LogRecord> published = new ArrayList<>();
        Handler recorder = new Handler() {
            @Override
            public void publish(LogRecord r) {
                if (isLoggable(r)) {
                    published.add(r);
                }
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        Logger pdfbox = Logger.getLogger("org.apache.pdfbox");
        pdfbox.addHandler(recorder);
        PrintStream before = System.err;
        ByteArrayOutputStream stderr = new ByteArrayOutputStream();
        CommandRun run;
        try {
            System.setErr(new PrintStream(stderr, true, StandardCharsets.UTF_8));
            run = CommandRun.of("quote", job.toString(), "--time", "1", "-o", tmp.resolve("out").toString());
        } finally {
            System.setErr(before);
            pdfbox.removeHandler(recorder);
        }
        assertEquals(0, run.exitCode(), run::toString);
        assertTrue(Files.size(tmp.resolve("out/report.pdf")) > 0);
        String err = stderr.toString(StandardCharsets.UTF_8);
        assertFalse(err.contains("fallback font"), err);
        assertFalse(err.contains("org.apache.pdfbox"), err);
        assertEquals(List.of(), published.stream().map(LogRecord::getMessage).toList(),
                "no PDF library message reaches a log handler");
    }
}
