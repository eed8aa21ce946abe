package dev.sheetwright.cli.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Writes plain text files of lines (the G-code programs): ASCII, one line each, ending with a newline. */
public final class TextFiles {

    private TextFiles() {
    }

    public static void write(List<String> lines, Path file) {
        try {
            Files.write(file, lines, StandardCharsets.US_ASCII);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }
}
