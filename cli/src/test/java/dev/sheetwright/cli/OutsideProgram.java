package dev.sheetwright.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs an outside program that reads our files (GDAL's ogrinfo, LibreCAD, node with gcode-toolpath). Tests call
 * {@link #require} first: they skip when the program is missing, or fail when {@code SHEETWRIGHT_REQUIRE_EXTERNAL=1}
 * (CI installs them, see {@code .ci/run}).
 */
final class OutsideProgram {

    private static final long TIMEOUT_SECONDS = 180;

    /** What the program printed. */
    record Run(int exitCode, String stdout, String stderr) {
        @Override
        public String toString() {
            return "exit " + exitCode + "\n--- stdout\n" + stdout + "--- stderr\n" + stderr;
        }
    }

    private OutsideProgram() {
    }

    /** Skips (or fails, when external programs are required) unless every one of {@code files} exists. */
    static void require(String what, String install, Path... files) {
        for (Path f : files) {
            if (Files.exists(f)) {
                continue;
            }
            String why = what + " is missing (" + f + "); install: " + install;
            if ("1".equals(System.getenv("SHEETWRIGHT_REQUIRE_EXTERNAL"))) {
                Assertions.fail("required (SHEETWRIGHT_REQUIRE_EXTERNAL=1): " + why);
            }
            Assumptions.abort(why);
        }
    }

    /** The repository's root folder: the nearest folder up from the working directory that holds {@code .git}. */
    static Path repoRoot() {
        Path p = Path.of("").toAbsolutePath();
        while (p != null && !Files.exists(p.resolve(".git"))) {
            p = p.getParent();
        }
        if (p == null) {
            throw new IllegalStateException("no .git above " + Path.of("").toAbsolutePath());
        }
        return p;
    }

    static Run run(List<String> command, Map<String, String> env) {
        return run(command, env, TIMEOUT_SECONDS);
    }

    /** Runs the command with no input, waiting at most {@code timeoutSeconds}; fails the test when it overruns. */
    static Run run(List<String> command, Map<String, String> env, long timeoutSeconds) {
        Path out = null;
        Path err = null;
        try {
            out = Files.createTempFile("sheetwright-outside", ".out");
            err = Files.createTempFile("sheetwright-outside", ".err");
            ProcessBuilder pb = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile());
            pb.environment().putAll(env);
            Process p = pb.start();
            p.getOutputStream().close();
            if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                p.waitFor(10, TimeUnit.SECONDS);
                Assertions.fail(command.get(0) + " did not finish within " + timeoutSeconds + " s: " + command);
            }
            return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                    Files.readString(err, StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } finally {
            try {
                if (out != null) {
                    Files.deleteIfExists(out);
                }
                if (err != null) {
                    Files.deleteIfExists(err);
                }
            } catch (IOException ignored) {
                // temp files only
            }
        }
    }
}
