package dev.sheetwright.dxf;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs the shared, independent DXF checker ({@code tools/dxfcheck.py}, ezdxf + shapely under {@code /usr/bin/python3})
 * on files our code wrote, and returns its JSON summary as a {@link Map}.
 *
 * <p>The shared folder is {@code $SHEETWRIGHT_SHARED} if set, else {@code ../shared} next to the repository root
 * (found by walking up from the working directory to the folder holding {@code .git}), else {@code /work/shared}.
 * Call {@link #requireAvailable()} first: when the checker, python or its modules are missing the test is skipped,
 * or fails when {@code SHEETWRIGHT_REQUIRE_EXTERNAL=1} (so CI cannot skip silently). Other modules use it through
 * this module's test jar.
 */
public final class DxfCheck {

    static final String REQUIRE_EXTERNAL = "SHEETWRIGHT_REQUIRE_EXTERNAL";
    static final String SHARED = "SHEETWRIGHT_SHARED";
    static final Path PYTHON = Path.of("/usr/bin/python3");
    private static final long TIMEOUT_SECONDS = 120;

    /** What one run printed: exit status, the parsed JSON summary from stdout, and stderr. */
    public record Result(int exitCode, Map<String, Object> summary, String stderr) {

        /** The summary of the i-th file checked. */
        @SuppressWarnings("unchecked")
        public Map<String, Object> file(int i) {
            return ((List<Map<String, Object>>) summary.get("files")).get(i);
        }
    }

    private static String unavailable; // null when checked and available
    private static boolean checked;

    private DxfCheck() {
    }

    /** Skips the calling test when the checker cannot run, or fails it when external tools are required. */
    public static void requireAvailable() {
        String why = whyUnavailable();
        if (why == null) {
            return;
        }
        if ("1".equals(System.getenv(REQUIRE_EXTERNAL))) {
            Assertions.fail("dxfcheck is required (" + REQUIRE_EXTERNAL + "=1) but cannot run: " + why);
        }
        Assumptions.abort("dxfcheck cannot run, test skipped: " + why);
    }

    public static Path sharedFolder() {
        String env = System.getenv(SHARED);
        if (env != null && !env.isBlank()) {
            return Path.of(env).toAbsolutePath();
        }
        for (Path dir = Path.of("").toAbsolutePath(); dir != null; dir = dir.getParent()) {
            if (Files.exists(dir.resolve(".git"))) {
                Path beside = dir.resolveSibling("shared");
                if (Files.isDirectory(beside)) {
                    return beside;
                }
                break;
            }
        }
        return Path.of("/work/shared");
    }

    static Path script() {
        return sharedFolder().resolve("tools").resolve("dxfcheck.py");
    }

    /** Runs {@code dxfcheck.py [options] files...}. */
    public static Result run(List<String> options, Path... files) {
        List<String> command = new ArrayList<>(List.of(PYTHON.toString(), script().toString()));
        command.addAll(options);
        for (Path f : files) {
            command.add(f.toString());
        }
        Path err = null;
        try {
            err = Files.createTempFile("dxfcheck", ".err");
            Process process = new ProcessBuilder(command).redirectError(err.toFile()).start();
            process.getOutputStream().close();
            String stdout = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!process.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                throw new AssertionError("dxfcheck did not finish in " + TIMEOUT_SECONDS + " s: " + command);
            }
            String stderr = Files.readString(err, StandardCharsets.UTF_8);
            Map<String, Object> summary;
            try {
                summary = new ObjectMapper().readValue(stdout, new TypeReference<Map<String, Object>>() { });
            } catch (IOException e) {
                throw new AssertionError("dxfcheck printed no JSON (exit " + process.exitValue() + "): "
                        + stdout + stderr, e);
            }
            return new Result(process.exitValue(), summary, stderr);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted while running dxfcheck", e);
        } finally {
            if (err != null) {
                try {
                    Files.deleteIfExists(err);
                } catch (IOException ignored) {
                    // a leftover temporary file does not change the result
                }
            }
        }
    }

    private static synchronized String whyUnavailable() {
        if (checked) {
            return unavailable;
        }
        checked = true;
        if (!Files.isExecutable(PYTHON)) {
            unavailable = PYTHON + " not found";
        } else if (!Files.isRegularFile(script())) {
            unavailable = script() + " not found (set " + SHARED + " to the shared folder)";
        } else {
            try {
                Process p = new ProcessBuilder(PYTHON.toString(), "-c", "import ezdxf, shapely")
                        .redirectErrorStream(true).start();
                String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
                if (!p.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
                    p.destroyForcibly();
                    unavailable = "python did not answer";
                } else if (p.exitValue() != 0) {
                    unavailable = "python modules ezdxf/shapely missing: " + out.strip();
                }
            } catch (IOException e) {
                unavailable = "cannot start " + PYTHON + ": " + e.getMessage();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                unavailable = "interrupted";
            }
        }
        return unavailable;
    }
}
