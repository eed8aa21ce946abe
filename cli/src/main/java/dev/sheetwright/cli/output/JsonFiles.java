package dev.sheetwright.cli.output;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Map;

/** Writes the JSON documents of a run (patterns.json, nest.json, quote.json), indented, one way for all. */
public final class JsonFiles {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JsonFiles() {
    }

    public static void write(Map<String, Object> doc, Path file) {
        try {
            MAPPER.writeValue(file.toFile(), doc);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }
}
