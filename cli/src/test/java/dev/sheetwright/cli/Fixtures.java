package dev.sheetwright.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/** Finds the repository's fixtures folder from the module's working directory. */
final class Fixtures {

    private Fixtures() {
    }

    static Path path(String name) {
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            Path f = dir.resolve("fixtures").resolve(name);
            if (Files.exists(f)) {
                return f;
            }
        }
        throw new IllegalStateException("fixture not found: " + name);
    }
}
