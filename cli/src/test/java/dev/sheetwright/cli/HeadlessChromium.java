package dev.sheetwright.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs Debian's {@code /usr/bin/chromium} headless on a local file, offline, with a fresh profile each time. Tests call
 * {@link #requireAvailable()} first: they skip when chromium is missing, or fail when
 * {@code SHEETWRIGHT_REQUIRE_EXTERNAL=1} (CI installs chromium, see {@code .ci/run}).
 */
final class HeadlessChromium {

    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final long TIMEOUT_SECONDS = 180;

    /** What chromium printed: exit status, stdout (the DOM for {@code --dump-dom}) and stderr. */
    record Run(int exitCode, String stdout, String stderr) {
    }

    private HeadlessChromium() {
    }

    static void requireAvailable() {
        if (Files.isExecutable(CHROMIUM)) {
            return;
        }
        if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
            Assertions.fail("chromium is required (SHEETWRIGHT_REQUIRE_EXTERNAL=1) but " + CHROMIUM + " is missing");
        }
        Assumptions.abort(CHROMIUM + " not found, test skipped (apt-get install chromium)");
    }

    /** The DOM after loading {@code page}. */
    static Run dumpDom(Path page) {
        return run(List.of("--dump-dom", page.toUri().toString()));
    }

    /** A PNG screenshot of {@code page} at the given window size. */
    static Run screenshot(Path page, Path png, int width, int height) {
        return run(List.of("--screenshot=" + png.toAbsolutePath(), "--window-size=" + width + "," + height,
                page.toUri().toString()));
    }

    private static Run run(List<String> args) {
        Path profile = null;
        try {
            profile = Files.createTempDirectory("sheetwright-chromium");
            List<String> command = new ArrayList<>(List.of(CHROMIUM.toString(), "--headless", "--no-sandbox",
                    "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                    "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile));
            command.addAll(args);
            OutsideProgram.Run r = OutsideProgram.run(command, Map.of(), TIMEOUT_SECONDS);
            return new Run(r.exitCode(), r.stdout(), r.stderr());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            delete(profile);
        }
    }

    private static void delete(Path root) {
        if (root == null || !Files.exists(root)) {
            return;
        }
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.deleteIfExists(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                    Files.deleteIfExists(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException ignored) {
            // a leftover temporary profile does not change the result
        }
    }
}
