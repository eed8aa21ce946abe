package dev.sheetwright.nest.testing;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;

/** Outside resources for tests: skipped when absent unless SHEETWRIGHT_REQUIRE_EXTERNAL=1, then failed. */
public final class External {
    public static final Path BENCHMARKS = Path.of("/work/shared/nesting-benchmarks");

    private External() {
    }

    public static Path require(Path file) {
        boolean required = "1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"));
        if (!Files.isReadable(file)) {
            if (required) {
                Assertions.fail("required external file is missing: " + file);
            }
            Assumptions.abort("external file not present, skipped: " + file);
        }
        return file;
    }

    public static Path benchmark(String name) {
        return require(BENCHMARKS.resolve(name));
    }
}
